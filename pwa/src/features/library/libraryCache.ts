import type { EntityTable } from 'dexie';
import { validateLibrary, type Library } from '@siteband/shared';
import { LIBRARY_CACHE_KEY, type LibraryCacheRow } from '../../db/libraryCacheTable';

/** A library kept on the tablet, with when the server sent it. */
export interface CachedLibrary {
  readonly library: Library;
  readonly receivedAt: number;
}

/** The tablet's copy of the server's library. */
export interface LibraryCache {
  /** The kept library, or undefined when there is none or it no longer validates. */
  load(): Promise<CachedLibrary | undefined>;
  save(body: unknown, receivedAt: number): Promise<void>;
}

/** Keeps the server's library in the `libraryCache` table. */
export function createLibraryCache(table: EntityTable<LibraryCacheRow, 'key'>): LibraryCache {
  return {
    async load() {
      const row = await table.get(LIBRARY_CACHE_KEY);
      if (!row) return undefined;
      try {
        return { library: validateLibrary(row.library), receivedAt: row.receivedAt };
      } catch {
        // A copy from an older app version may not fit today's rules: the bundled library stands in.
        return undefined;
      }
    },
    async save(body, receivedAt) {
      await table.put({ key: LIBRARY_CACHE_KEY, library: body, receivedAt });
    },
  };
}
