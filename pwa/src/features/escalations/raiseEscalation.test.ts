import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { saveCase } from '../cases/saveCase';
import { raiseEscalation } from './raiseEscalation';

let db: SitebandDb | undefined;
afterEach(async () => {
  await db?.delete();
});

/** A fresh database holding one open case (invented demo scenario). */
async function withCase(): Promise<{ d: SitebandDb; caseId: string }> {
  const d = await openDb(`raise-test-${Date.now()}-${Math.random()}`);
  db = d;
  const caseId = crypto.randomUUID();
  await saveCase(d, caseId, {
    siteName: 'Canal lock 3 (demo)', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-04-09T07:15:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  return { d, caseId };
}

describe('raising an escalation by hand', () => {
  it('stores the escalation with its change for the server, trimmed and with each hazard class once', async () => {
    const { d, caseId } = await withCase();
    const at = new Date('2026-04-09T08:00:00.000Z');
    const id = await raiseEscalation(d, caseId, { reason: '  Drum bulging, hissing at the bung  ', hazardClasses: ['flammable-gas', 'flammable-gas'] }, at);
    expect((await d.escalations.get(id))?.data).toEqual({
      caseId, scanId: null, raisedAt: '2026-04-09T08:00:00.000Z', reason: 'Drum bulging, hissing at the bung', hazardClasses: ['flammable-gas'],
    });
    const change = (await d.outbox.toArray()).find((e) => e.entity === 'escalation');
    expect(change).toMatchObject({ id, op: 'upsert', status: 'pending', data: { reason: 'Drum bulging, hissing at the bung' } });
  });

  it('refuses an empty reason, an over-long one and an unknown hazard class, storing nothing', async () => {
    const { d, caseId } = await withCase();
    await expect(raiseEscalation(d, caseId, { reason: '   ', hazardClasses: [] })).rejects.toThrow(/needs a reason/);
    await expect(raiseEscalation(d, caseId, { reason: 'x'.repeat(2001), hazardClasses: [] })).rejects.toThrow(/at most 2000/);
    await expect(raiseEscalation(d, caseId, { reason: 'Fumes', hazardClasses: ['spooky'] })).rejects.toThrow(/Unknown hazard class: spooky/);
    expect(await d.escalations.count()).toBe(0);
  });
});
