import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from './db';
import { readSessionRow, SESSION_ROW_KEY } from './sessionTable';

let opened: SitebandDb[] = [];
const freshName = () => `siteband-session-row-${Math.random().toString(36).slice(2)}`;

afterEach(async () => {
  await Promise.all(opened.map((db) => db.delete()));
  opened = [];
});

const session = {
  user: { id: 'u-3', email: 'field.one@example.test', displayName: 'Field One', role: 'inspector' as const },
  accessToken: 'access-3',
  refreshToken: 'refresh-3',
  accessTokenExpiresAt: 9_000,
  confirmedAt: 1_000,
};

describe('readSessionRow', () => {
  it('finds no session on a first visit and creates no database, so Dexie later builds it from version 1 up', async () => {
    const name = freshName();
    expect(await readSessionRow(name)).toBeUndefined();
    expect((await indexedDB.databases()).map((d) => d.name)).not.toContain(name);

    const db = await openDb(name);
    opened.push(db);
    expect(db.tables.map((table) => table.name)).toContain('cases');
    await db.session.put({ key: SESSION_ROW_KEY, ...session });
    expect(await readSessionRow(name)).toEqual({ key: SESSION_ROW_KEY, ...session });
  });

  it('does not hold the database open: Dexie can still open and use it while the row is read', async () => {
    const name = freshName();
    const first = await openDb(name);
    opened.push(first);
    await first.session.put({ key: SESSION_ROW_KEY, ...session });
    first.close();
    const [row, db] = await Promise.all([readSessionRow(name), openDb(name)]);
    opened.push(db);
    expect(row?.refreshToken).toBe('refresh-3');
    expect(await db.session.get(SESSION_ROW_KEY)).toMatchObject({ refreshToken: 'refresh-3' });
  });
});
