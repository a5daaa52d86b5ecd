import { loadLibrary, validateLibrary, type Library } from '@siteband/shared';
import { ApiError } from '../api/apiError';
import type { ApiClient } from '../api/client';
import { fetchLibrary } from './libraryApi';
import type { LibraryCache } from './libraryCache';

/** Where the library on screen came from. */
export type LibrarySource = 'server' | 'tablet' | 'bundled';

/** The library the screens show, with its origin. */
export interface LibraryView {
  readonly library: Library;
  readonly source: LibrarySource;
  /** When the server sent it (server and tablet copies), epoch ms. */
  readonly receivedAt: number | null;
  /** Why the server's library is not the one shown, when the server answered but could not be used. */
  readonly problem: string | null;
}

export interface ReadLibraryOptions {
  client: ApiClient;
  cache: LibraryCache;
  online: boolean;
  now?: () => number;
  signal?: AbortSignal;
}

/**
 * The server's library when it can be reached (kept on the tablet for later), else the tablet's
 * copy, else the library bundled with the app: the screens always have a library to show.
 */
export async function readLibrary({ client, cache, online, now = Date.now, signal }: ReadLibraryOptions): Promise<LibraryView> {
  let problem: string | null = null;
  if (online) {
    try {
      const body = await fetchLibrary(client, signal);
      const library = validateLibrary(body);
      const receivedAt = now();
      await cache.save(body, receivedAt);
      return { library, source: 'server', receivedAt, problem: null };
    } catch (error) {
      if (signal?.aborted) throw error;
      // No connection is ordinary in the field; a refused or unreadable answer is worth saying.
      if (!(error instanceof ApiError && error.kind === 'network')) problem = error instanceof Error ? error.message : String(error);
    }
  }
  const kept = await cache.load();
  if (kept) return { library: kept.library, source: 'tablet', receivedAt: kept.receivedAt, problem };
  return { library: loadLibrary(), source: 'bundled', receivedAt: null, problem };
}
