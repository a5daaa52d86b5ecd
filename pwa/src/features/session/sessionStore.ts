import { SESSION_ROW_KEY, type SessionRowStorage } from '../../db/sessionTable';
import type { AuthResponse, SessionUser, StoredSession } from './types';

/** Holds the signed-in session in memory for synchronous reads and in IndexedDB for reloads. */
export interface SessionStore {
  /** Reads the stored session from the database into memory. */
  load(): Promise<StoredSession | undefined>;
  /** The session in memory (undefined when signed out). */
  current(): StoredSession | undefined;
  /** Stores the tokens and user of a sign-in or refresh; the server has just accepted them. */
  save(auth: AuthResponse, now?: number): Promise<StoredSession>;
  /** Records that the server accepted the session again, with its latest view of the user. */
  confirm(user: SessionUser, now?: number): Promise<void>;
  /** Forgets the session on this tablet. */
  clear(): Promise<void>;
  /** Calls the listener after every change; returns the unsubscribe function. */
  subscribe(listener: () => void): () => void;
}

/** Builds a session store over the `session` table: read without Dexie at start, written through it. */
export function createSessionStore(storage: SessionRowStorage): SessionStore {
  let session: StoredSession | undefined;
  const listeners = new Set<() => void>();

  // Memory changes only after the database write succeeded, so memory never claims more than disk holds.
  async function write(next: StoredSession | undefined): Promise<void> {
    const table = await storage.table();
    if (next) await table.put({ key: SESSION_ROW_KEY, ...next });
    else await table.delete(SESSION_ROW_KEY);
    session = next;
    listeners.forEach((listener) => listener());
  }

  return {
    async load() {
      const row = await storage.read();
      if (row) {
        const { key: _key, ...stored } = row;
        session = stored;
      } else {
        session = undefined;
      }
      listeners.forEach((listener) => listener());
      return session;
    },
    current: () => session,
    async save(auth, now = Date.now()) {
      if (!auth.accessToken || !auth.refreshToken || !auth.user) {
        throw new TypeError('The server answered without tokens or user; the session was not changed');
      }
      const next: StoredSession = {
        user: auth.user,
        accessToken: auth.accessToken,
        refreshToken: auth.refreshToken,
        accessTokenExpiresAt: now + auth.accessTokenExpiresIn * 1000,
        confirmedAt: now,
      };
      await write(next);
      return next;
    },
    async confirm(user, now = Date.now()) {
      if (!session) return;
      await write({ ...session, user, confirmedAt: now });
    },
    clear: () => write(undefined),
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
