import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { saveCase } from '../cases/saveCase';
import { clearCaptureDataIfSynced, UnsyncedWorkError } from './clearCaptureData';
import { applyResult } from './applyResult';

let db: SitebandDb | undefined;
afterEach(async () => {
  await db?.delete();
});

const data = {
  siteName: 'Rail yard C', address: null, latitude: null, longitude: null, locationAccuracyM: null,
  locationEnteredByHand: false, startedAt: '2026-04-10T07:00:00.000Z', weatherNotes: null, accessNotes: null, status: 'open' as const,
};

describe('clearCaptureDataIfSynced', () => {
  it('refuses and keeps everything while a change waits, and clears once the server applied it', async () => {
    db = await openDb(`clear-test-${Date.now()}`);
    const id = crypto.randomUUID();
    await saveCase(db, id, data);
    await expect(clearCaptureDataIfSynced(db)).rejects.toBeInstanceOf(UnsyncedWorkError);
    expect(await db.cases.count()).toBe(1);
    expect(await db.outbox.count()).toBe(1);

    const [entry] = await db.outbox.toArray();
    await applyResult(db, entry, { changeId: entry.changeId, status: 'applied', version: 1 });
    await clearCaptureDataIfSynced(db);
    expect(await db.cases.count()).toBe(0);
  });
});
