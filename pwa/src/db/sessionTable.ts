import type { EntityTable } from 'dexie';
import type { StoredSession } from '../features/session/types';
import type { SitebandDb } from './db';
import { DB_NAME } from './dbName';

/**
 * The tablet holds at most one signed-in person at a time, so the table has one row under a
 * fixed key; it lives in IndexedDB (not memory) so a reload or an offline restart keeps it.
 */
export const SESSION_ROW_KEY = 'current';
const SESSION_TABLE = 'session';

/** One row of the `session` table. */
export interface SessionRow extends StoredSession {
  key: typeof SESSION_ROW_KEY;
}

/** Dexie index spec of the table: primary key only, nothing is searched. */
export const sessionSchema = 'key';

/**
 * Reads the session row straight from IndexedDB, without Dexie and without opening the schema of
 * every table: the first screen needs only this row. A database that does not exist yet (a first
 * visit) is not created, and gives no session; the connection closes as soon as the row is read,
 * or when Dexie asks to upgrade the database.
 */
export function readSessionRow(dbName: string = DB_NAME): Promise<SessionRow | undefined> {
  return new Promise((resolve, reject) => {
    const open = indexedDB.open(dbName);
    let absent = false;
    // Only a database that does not exist asks for an upgrade here: abort it, so none is created.
    open.onupgradeneeded = () => {
      absent = true;
      open.transaction?.abort();
    };
    open.onerror = (event) => {
      if (absent) {
        event.preventDefault();
        resolve(undefined);
      } else reject(open.error);
    };
    open.onsuccess = () => {
      const db = open.result;
      db.onversionchange = () => db.close();
      if (!db.objectStoreNames.contains(SESSION_TABLE)) {
        db.close();
        resolve(undefined);
        return;
      }
      const tx = db.transaction(SESSION_TABLE, 'readonly');
      const get = tx.objectStore(SESSION_TABLE).get(SESSION_ROW_KEY);
      tx.oncomplete = () => {
        db.close();
        resolve(get.result as SessionRow | undefined);
      };
      tx.onabort = () => {
        db.close();
        reject(tx.error);
      };
    };
  });
}

/** Where the session store reads the row at start and writes it afterwards. */
export interface SessionRowStorage {
  /** The stored row, read without opening Dexie. */
  read(): Promise<SessionRow | undefined>;
  /** Dexie's table, for writes; opened on the first one. */
  table(): Promise<EntityTable<SessionRow, 'key'>>;
}

/** The session row of this database, once it is open (tests, and whoever already holds the database). */
export function sessionRowStorage(db: SitebandDb): SessionRowStorage {
  return { read: () => readSessionRow(db.name), table: async () => db.session };
}
