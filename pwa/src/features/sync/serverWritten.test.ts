import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import type { ServerRecord } from '../../db/captureRecord';
import { inspectorNextStatus } from '../cases/saveCase';
import { clearCaptureDataIfSynced } from './clearCaptureData';
import { mergePulled } from './mergePulled';

const opened: SitebandDb[] = [];
let count = 0;
afterEach(async () => {
  for (const d of opened.splice(0)) await d.delete();
});

async function fresh(name = `server-written-${++count}-${Date.now()}`): Promise<SitebandDb> {
  const d = await openDb(name);
  opened.push(d);
  return d;
}

function pulled(entity: string, data: Record<string, unknown>, over: Partial<ServerRecord> = {}): ServerRecord {
  return { entity, id: crypto.randomUUID(), version: 1, syncSeq: 1, deleted: false, createdAt: '2026-12-01T10:00:00.000Z', updatedAt: '2026-12-01T10:00:00.000Z', data, ...over };
}

const caseId = '6f0c0a3e-3d0b-4b8e-9a51-0a6c7f7b2f10';
const scanA = '8b4e2f1d-8a3c-4e55-9d1e-3c2b1a0f9e8d';
const scanB = 'c1d2e3f4-a5b6-4c7d-8e9f-0a1b2c3d4e5f';

function decision(revision: number, over: Record<string, unknown>) {
  return pulled('decision', {
    caseId, scanId: null, kind: 'accept', compoundId: null, compoundName: null, reason: null, comment: null,
    revision, decidedBy: 'sup-1', decidedByName: 'Dana Reviewer', decidedAt: `2026-12-01T1${revision}:00:00.000Z`, ...over,
  });
}

function escalationRecord(version: number, server: Record<string, unknown>, id = 'e0e0e0e0-1111-4222-8333-444455556666') {
  return pulled(
    'escalation',
    { caseId, scanId: scanA, raisedAt: '2026-12-01T09:00:00.000Z', reason: 'Chlorine: toxic by inhalation', hazardClasses: ['acute-toxicity-inhalation'], raisedBy: 'insp-1', ...server },
    { id, version },
  );
}

describe('pulling what supervisors and safety officers wrote', () => {
  it('keeps review decisions and escalation notes, removes tombstones and skips malformed records', async () => {
    const d = await fresh();
    const accept = decision(1, { scanId: scanA, kind: 'accept' });
    const replace = decision(2, { scanId: scanB, kind: 'replace', compoundId: 'ammonia', compoundName: 'Ammonia', reason: 'The N–H bands fit better' });
    const note = pulled('escalationNote', { escalationId: 'e1', caseId, text: 'Fire service on its way', authorId: 'so-1', authorName: 'Sam Safety', at: '2026-12-01T09:30:00.000Z' });
    expect(await mergePulled(d, accept)).toBe('stored');
    expect(await mergePulled(d, replace)).toBe('stored');
    expect(await mergePulled(d, note)).toBe('stored');
    expect(await d.decisions.get(replace.id)).toMatchObject({ caseId, scanId: scanB, kind: 'replace', compoundName: 'Ammonia', revision: 2, decidedByName: 'Dana Reviewer' });
    expect(await d.escalationNotes.where('caseId').equals(caseId).toArray()).toMatchObject([{ escalationId: 'e1', text: 'Fire service on its way', authorName: 'Sam Safety' }]);

    expect(await mergePulled(d, { ...accept, deleted: true, version: 2 })).toBe('stored');
    expect(await d.decisions.get(accept.id)).toBeUndefined();
    expect(await mergePulled(d, decision(3, { kind: 'approve' }))).toBe('skipped');
    expect(await mergePulled(d, pulled('escalationNote', { caseId, text: 'no escalation named' }))).toBe('skipped');
    expect(await d.decisions.count()).toBe(1);
  });

  it("adds the safety officer's acknowledgement to the tablet's escalation, whether or not the version moved", async () => {
    const d = await fresh();
    const raised = escalationRecord(1, { status: 'raised', acknowledgedByName: null, acknowledgedAt: null, actionTaken: null, ppeLevel: null });
    expect(await mergePulled(d, raised)).toBe('stored');
    expect((await d.escalations.get(raised.id))?.serverState).toMatchObject({ status: 'raised', acknowledgedByName: null });

    const acknowledged = escalationRecord(2, {
      status: 'acknowledged', acknowledgedBy: 'so-1', acknowledgedByName: 'Sam Safety', acknowledgedAt: '2026-12-01T09:20:00.000Z',
      actionTaken: 'ppe_required', ppeLevel: 'B', ackComment: 'Level B until the lab result', closedBy: null, closedAt: null, closeComment: null,
    });
    expect(await mergePulled(d, acknowledged)).toBe('stored');
    const row = await d.escalations.get(raised.id);
    expect(row?.serverState).toEqual({
      status: 'acknowledged', acknowledgedByName: 'Sam Safety', acknowledgedAt: '2026-12-01T09:20:00.000Z', actionTaken: 'ppe_required',
      ppeLevel: 'B', ackComment: 'Level B until the lab result', closedAt: null, closeComment: null,
    });
    // The tablet's own fields stay what it sends; the server's are kept beside them.
    expect(row?.data).toEqual({ caseId, scanId: scanA, raisedAt: '2026-12-01T09:00:00.000Z', reason: 'Chlorine: toxic by inhalation', hazardClasses: ['acute-toxicity-inhalation'] });
    expect(row).toMatchObject({ version: 2, sync: 'server', caseId });

    // Closed at the same version (a server-only write): the state still arrives.
    const closed = escalationRecord(2, { ...acknowledged.data, status: 'closed', closedAt: '2026-12-01T11:00:00.000Z', closeComment: 'Area cleared' });
    expect(await mergePulled(d, closed)).toBe('same');
    expect((await d.escalations.get(raised.id))?.serverState).toMatchObject({ status: 'closed', closeComment: 'Area cleared', acknowledgedByName: 'Sam Safety' });
  });

  it('clears decisions and notes with the rest of the field records at sign-out', async () => {
    const d = await fresh();
    await mergePulled(d, decision(1, { kind: 'return', comment: 'Photograph the seal' }));
    await mergePulled(d, pulled('escalationNote', { escalationId: 'e1', caseId, text: 'Noted', authorId: 'so-1', authorName: 'Sam Safety', at: '2026-12-01T09:30:00.000Z' }));
    await clearCaptureDataIfSynced(d);
    expect(await d.decisions.count()).toBe(0);
    expect(await d.escalationNotes.count()).toBe(0);
  });

  it('version 7 starts the pull over, so records skipped before are fetched again', async () => {
    const name = `server-written-upgrade-${Date.now()}`;
    // The database as version 5 left it, with a pull cursor past records it could not keep.
    const old = new Dexie(name);
    old.version(5).stores({ session: 'key', syncMeta: 'key', cases: 'id, caseId, editedAt', escalations: 'id, caseId, editedAt' });
    await old.open();
    await old.table('syncMeta').put({ key: 'pullCursor', value: '812' });
    await old.table('syncMeta').put({ key: 'clientId', value: 'tablet-1' });
    old.close();

    const d = await fresh(name);
    expect(d.verno).toBeGreaterThanOrEqual(7);
    expect(await d.syncMeta.get('pullCursor')).toBeUndefined();
    expect(await d.syncMeta.get('clientId')).toEqual({ key: 'clientId', value: 'tablet-1' });
    expect(await d.decisions.count()).toBe(0);
  });
});

describe("the inspector's view of a review", () => {
  it('lets the inspector submit an open case, take back a submitted one and reopen a returned one, nothing else', () => {
    expect(inspectorNextStatus('open')).toBe('submitted');
    expect(inspectorNextStatus('submitted')).toBe('open');
    expect(inspectorNextStatus('returned')).toBe('open');
    expect(inspectorNextStatus('in_review')).toBeNull();
    expect(inspectorNextStatus('accepted')).toBeNull();
  });
});
