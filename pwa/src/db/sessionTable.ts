import type { StoredSession } from '../features/session/types';

/**
 * The tablet holds at most one signed-in person at a time, so the table has one row under a
 * fixed key; it lives in IndexedDB (not memory) so a reload or an offline restart keeps it.
 */
export const SESSION_ROW_KEY = 'current';

/** One row of the `session` table. */
export interface SessionRow extends StoredSession {
  key: typeof SESSION_ROW_KEY;
}

/** Dexie index spec of the table: primary key only, nothing is searched. */
export const sessionSchema = 'key';
