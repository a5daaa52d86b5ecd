import { openDb } from '../../db/db';
import { createLibraryCache, type LibraryCache } from './libraryCache';

let cache: Promise<LibraryCache> | undefined;

/** The app's library cache, on the tablet's database (opened once, on first use). */
export function appLibraryCache(): Promise<LibraryCache> {
  cache ??= openDb().then((db) => createLibraryCache(db.libraryCache));
  return cache;
}
