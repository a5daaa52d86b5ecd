import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { handleRequest } from './handleRequest';
import { checkRow, latestInstrumentCheck, saveInstrumentCheck } from './instrumentChecks';
import { openDb, type SitebandDb } from '../../db/db';
import { fixtureScan } from './testFixtures';

let db: SitebandDb;
let n = 0;

beforeEach(async () => {
  db = await openDb(`checks-test-${++n}`);
});
afterEach(async () => {
  await db.delete();
});

function check(file: string) {
  const response = handleRequest({ id: 1, kind: 'instrument-check', file: fixtureScan(file), standardId: 'ir-polystyrene-ep-ft' });
  if (!response.ok || response.kind !== 'instrument-check') throw new Error('expected a check');
  return response.check;
}

describe('instrument checks on the tablet', () => {
  it('keeps every check and reads the latest one of the technique, failed or passed', async () => {
    const passed = check('synthetic-ir-polystyrene-film.csv');
    const failed = check('synthetic-ir-ethanol-liquid.csv');
    expect(await latestInstrumentCheck(db.instrumentChecks, 'ir')).toBeUndefined();
    await saveInstrumentCheck(db.instrumentChecks, checkRow(passed, 'ir', 'film.csv', 1_000));
    await saveInstrumentCheck(db.instrumentChecks, checkRow(failed, 'ir', 'wrong.csv', 3_000));
    expect(await latestInstrumentCheck(db.instrumentChecks, 'ir')).toMatchObject({ pass: false, fileName: 'wrong.csv', checkedAt: 3_000 });
    await saveInstrumentCheck(db.instrumentChecks, checkRow(passed, 'ir', 'film-again.csv', 5_000));
    const latest = await latestInstrumentCheck(db.instrumentChecks, 'ir');
    expect(latest).toMatchObject({ pass: true, fileName: 'film-again.csv', standardId: 'ir-polystyrene-ep-ft' });
    expect(latest!.bands).toHaveLength(7);
    expect(latest!.bands[0]!.toleranceSource).toMatch(/Ph\. Eur/);
    expect(await latestInstrumentCheck(db.instrumentChecks, 'raman')).toBeUndefined();
    expect(await db.instrumentChecks.count()).toBe(3);
  });

  it('opens a version-1 database and adds the table without touching the session', async () => {
    const { default: Dexie } = await import('dexie');
    const name = `checks-upgrade-${++n}`;
    const old = new Dexie(name);
    old.version(1).stores({ session: 'key' });
    await old.table('session').put({ key: 'current', refreshToken: 'kept' });
    old.close();
    const upgraded = await openDb(name);
    expect(await upgraded.session.get('current')).toMatchObject({ refreshToken: 'kept' });
    expect(await upgraded.instrumentChecks.count()).toBe(0);
    await upgraded.delete();
  });
});
