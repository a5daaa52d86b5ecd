import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { sessionRowStorage } from '../../db/sessionTable';
import { createSessionStore } from './sessionStore';
import type { AuthResponse } from './types';

const auth: AuthResponse = {
  accessToken: 'access-1',
  refreshToken: 'refresh-1',
  accessTokenExpiresIn: 900,
  user: { id: 'u-7', email: 'lab.lead@example.test', displayName: 'Lab Lead', role: 'supervisor' },
};

let databases: SitebandDb[] = [];
let counter = 0;

async function freshDb(): Promise<SitebandDb> {
  counter += 1;
  const db = await openDb(`siteband-test-${counter}-${Math.random().toString(36).slice(2)}`);
  databases.push(db);
  return db;
}

afterEach(async () => {
  await Promise.all(databases.map((db) => db.delete()));
  databases = [];
});

describe('session store', () => {
  it('persists a sign-in so a second store over the same database (a reload) sees it', async () => {
    const db = await freshDb();
    const now = Date.UTC(2026, 0, 10, 12);
    const saved = await createSessionStore(sessionRowStorage(db)).save(auth, now);
    expect(saved).toEqual({
      user: auth.user,
      accessToken: 'access-1',
      refreshToken: 'refresh-1',
      accessTokenExpiresAt: now + 900_000,
      confirmedAt: now,
    });

    const afterReload = createSessionStore(sessionRowStorage(db));
    expect(afterReload.current()).toBeUndefined();
    expect(await afterReload.load()).toEqual(saved);
    expect(afterReload.current()).toEqual(saved);
  });

  it('moves the confirmation time and user on confirm, and keeps the tokens', async () => {
    const db = await freshDb();
    const store = createSessionStore(sessionRowStorage(db));
    await store.save(auth, 1_000);
    const renamed = { ...auth.user, displayName: 'Lab Lead (night shift)' };
    await store.confirm(renamed, 5_000);
    const reloaded = createSessionStore(sessionRowStorage(db));
    const stored = await reloaded.load();
    expect(stored?.confirmedAt).toBe(5_000);
    expect(stored?.user.displayName).toBe('Lab Lead (night shift)');
    expect(stored?.refreshToken).toBe('refresh-1');
  });

  it('confirm without a session stores nothing', async () => {
    const db = await freshDb();
    const store = createSessionStore(sessionRowStorage(db));
    await store.confirm(auth.user, 5_000);
    expect(await db.session.count()).toBe(0);
  });

  it('clears from memory and from the database, and tells subscribers', async () => {
    const db = await freshDb();
    const store = createSessionStore(sessionRowStorage(db));
    const seen: (string | undefined)[] = [];
    const unsubscribe = store.subscribe(() => seen.push(store.current()?.accessToken));
    await store.save(auth);
    await store.clear();
    unsubscribe();
    await store.save(auth);
    expect(seen).toEqual(['access-1', undefined]);
    await store.clear();
    expect(await createSessionStore(sessionRowStorage(db)).load()).toBeUndefined();
  });

  it('refuses an answer without tokens and keeps the previous session', async () => {
    const db = await freshDb();
    const store = createSessionStore(sessionRowStorage(db));
    await store.save(auth, 1_000);
    const broken = { ...auth, refreshToken: '' };
    await expect(store.save(broken, 2_000)).rejects.toThrow(/without tokens/);
    expect(store.current()?.refreshToken).toBe('refresh-1');
    expect((await createSessionStore(sessionRowStorage(db)).load())?.confirmedAt).toBe(1_000);
  });
});
