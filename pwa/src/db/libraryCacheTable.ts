/**
 * The last compound library the server sent, kept so the tablet ranks and shows the same library
 * offline. One row under a fixed key: a newer answer replaces the older one whole.
 */
export const LIBRARY_CACHE_KEY = 'current';

/** One row of the `libraryCache` table: the server's answer as it came, and when it arrived. */
export interface LibraryCacheRow {
  key: typeof LIBRARY_CACHE_KEY;
  /** The body of GET /api/library, validated again when read. */
  library: unknown;
  /** Epoch milliseconds. */
  receivedAt: number;
}

/** Dexie index spec of the table: primary key only, nothing is searched. */
export const libraryCacheSchema = 'key';
