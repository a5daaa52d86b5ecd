import { readCaseArchive } from '@siteband/shared';
import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { createApiClient, type ApiClient } from '../api/client';
import { exportCaseArchive } from '../caseArchive/exportCaseArchive';
import { saveCase } from '../cases/saveCase';
import { handleRequest } from '../identify/handleRequest';
import type { ScanFile } from '../identify/protocol';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS, type ScanSettings } from '../identify/scanSettings';
import { fixtureScan } from '../identify/testFixtures';
import { addNote } from '../notes/addNote';
import { addPhoto } from '../photos/addPhoto';
import { addHandover, saveSample } from '../samples/saveSample';
import { saveScan } from '../scans/saveScan';
import { deleteBlockOnTablet, DeleteHeldError, deleteUnheld } from './deleteHeld';
import { pushOutbox } from './pushOutbox';
import { recordDelete } from './recordChange';
import { everythingSynced } from './syncState';
import { createTestServer, type TestServer } from './testServer';
import { uploadAttachments, type ByteSender } from './uploadAttachments';

let db: SitebandDb | undefined;
let count = 0;
afterEach(async () => {
  await db?.delete();
});

function clientFor(server: TestServer): ApiClient {
  const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
  return createApiClient({ tokens, fetchFn: server.fetch });
}

async function sync(d: SitebandDb, server: TestServer): Promise<void> {
  await pushOutbox(d, clientFor(server), 'tablet-test');
  const sender: ByteSender = { put: (path, bytes, headers) => server.fetch(path, { method: 'PUT', body: bytes, headers }) };
  await uploadAttachments(d, clientFor(server), sender);
}

const raman: ScanSettings = { ...DEFAULT_SCAN_SETTINGS, technique: 'raman', atr: false, excitationNm: 785 };

/** An open case with one sample (invented demo scenario). */
async function visit(): Promise<{ d: SitebandDb; caseId: string; sampleId: string }> {
  const d = await openDb(`delete-held-test-${++count}-${Date.now()}`);
  db = d;
  const caseId = crypto.randomUUID();
  const sampleId = crypto.randomUUID();
  await saveCase(d, caseId, {
    siteName: 'Invented demo: boatyard shed', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-05-04T07:00:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  await saveSample(d, sampleId, { caseId, label: 'S-1', container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Inspector', collectedAt: '2026-05-04T07:10:00.000Z', sealNumber: null });
  return { d, caseId, sampleId };
}

/** Saves a scan of the fixture file the way the scan screen does (identified, acknowledged). */
async function scanOf(d: SitebandDb, caseId: string, sampleId: string, fixture: string, settings: ScanSettings = DEFAULT_SCAN_SETTINGS) {
  const file: ScanFile = fixtureScan(fixture);
  const response = handleRequest({ id: 1, kind: 'identify', file, scan: settings, processing: DEFAULT_PROCESSING });
  if (!response.ok || response.kind !== 'identify') throw new Error(`expected an identify answer, got ${JSON.stringify(response)}`);
  return saveScan(d, { caseId, sampleId, settings, file, outcome: response.outcome, check: null, recordedAt: '2026-05-04T07:20:00.000Z', acknowledgedAt: '2026-05-04T07:21:00.000Z' });
}

describe('what holds a case, a sample or a scan on the tablet', () => {
  it('refuses a sample with a hand-over and a scan, naming both and the hand-over as permanent, and writes nothing', async () => {
    const { d, caseId, sampleId } = await visit();
    await addHandover(d, caseId, { sampleId, from: 'R. Inspector', to: 'Courier', at: '2026-05-04T08:00:00.000Z', sealNumber: null, note: null });
    await scanOf(d, caseId, sampleId, 'synthetic-ir-ethanol-liquid.csv');
    const before = await d.outbox.toArray();
    const block = await deleteBlockOnTablet(d, 'sample', sampleId);
    expect(block).toEqual({ held: [{ kind: 'handover', count: 1 }, { kind: 'scan', count: 1 }], permanent: ['handover'] });
    const failure = await deleteUnheld(d, 'sample', sampleId).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(DeleteHeldError);
    expect((failure as DeleteHeldError).block).toEqual(block);
    expect(await d.outbox.toArray()).toEqual(before);
    expect((await d.samples.get(sampleId))?.deletePending).toBeUndefined();
  });

  it('refuses a scan with an escalation or a review decision, both permanent', async () => {
    const { d, caseId, sampleId } = await visit();
    const hazardous = await scanOf(d, caseId, sampleId, 'synthetic-raman-ammonium-nitrate-785.csv', raman);
    expect(hazardous.escalationId).not.toBeNull();
    expect(await deleteBlockOnTablet(d, 'scan', hazardous.scanId)).toEqual({ held: [{ kind: 'escalation', count: 1 }], permanent: ['escalation'] });

    const reviewed = await scanOf(d, caseId, sampleId, 'synthetic-ir-ethanol-liquid.csv');
    expect(await deleteBlockOnTablet(d, 'scan', reviewed.scanId)).toBeNull();
    // As a pull stores a supervisor's decision on the scan.
    await d.decisions.add({
      id: crypto.randomUUID(), caseId, scanId: reviewed.scanId, kind: 'needs_lab', compoundId: null, compoundName: null, reason: null, comment: null,
      revision: 1, decidedBy: crypto.randomUUID(), decidedByName: 'Demo Supervisor', decidedAt: '2026-05-05T09:00:00.000Z', version: 1,
    });
    await expect(deleteUnheld(d, 'scan', reviewed.scanId)).rejects.toBeInstanceOf(DeleteHeldError);
    expect(await deleteBlockOnTablet(d, 'scan', reviewed.scanId)).toEqual({ held: [{ kind: 'decision', count: 1 }], permanent: ['decision'] });
  });

  it('counts only live rows: a case holds its notes and photos until they are deleted, and none of it is permanent', async () => {
    const { d, caseId, sampleId } = await visit();
    const note = await addNote(d, caseId, sampleId, 'Bilge smell, no sniffing', new Date('2026-05-04T07:30:00.000Z'));
    await addPhoto(d, { caseId, ownerType: 'sample', ownerId: sampleId }, { fileName: 'hull.jpg', contentType: 'image/jpeg', bytes: new Uint8Array([1, 2, 3]).buffer });
    expect(await deleteBlockOnTablet(d, 'case', caseId)).toEqual({
      held: [{ kind: 'sample', count: 1 }, { kind: 'siteNote', count: 1 }, { kind: 'photo', count: 1 }],
      permanent: [],
    });
    expect(await deleteBlockOnTablet(d, 'sample', sampleId)).toEqual({ held: [{ kind: 'siteNote', count: 1 }, { kind: 'photo', count: 1 }], permanent: [] });
    const server = createTestServer();
    await sync(d, server);
    await recordDelete(d, 'note', note);
    expect((await d.notes.get(note))?.deletePending).toBe(true);
    expect(await deleteBlockOnTablet(d, 'sample', sampleId)).toEqual({ held: [{ kind: 'photo', count: 1 }], permanent: [] });
  });
});

describe('deleting a case, a sample and a scan on the tablet', () => {
  it('drops a scan the server never had together with its raw file, then the emptied sample and case', async () => {
    const { d, caseId, sampleId } = await visit();
    const { scanId, attachmentId } = await scanOf(d, caseId, sampleId, 'synthetic-ir-ethanol-liquid.csv');
    await deleteUnheld(d, 'scan', scanId);
    expect(await d.scans.get(scanId)).toBeUndefined();
    // The server never had the scan, so it would refuse its raw file: both go, nothing is queued for them.
    expect(await d.photos.get(attachmentId)).toBeUndefined();
    expect((await d.outbox.toArray()).map((e) => e.entity)).toEqual(['case', 'sample']);
    await deleteUnheld(d, 'sample', sampleId);
    await deleteUnheld(d, 'case', caseId);
    expect(await d.cases.count()).toBe(0);
    expect(await d.outbox.count()).toBe(0);
  });

  it('keeps a synced scan’s raw file as a permanent record: the scan and sample go after the server confirms, the case stays held', async () => {
    const { d, caseId, sampleId } = await visit();
    const server = createTestServer();
    const { scanId, attachmentId } = await scanOf(d, caseId, sampleId, 'synthetic-ir-ethanol-liquid.csv');
    await sync(d, server);
    expect(await everythingSynced(d)).toBe(true);

    await deleteUnheld(d, 'scan', scanId);
    expect(await d.scans.get(scanId)).toMatchObject({ deletePending: true, version: 1 });
    // The sample no longer counts the scan on its way out.
    expect(await deleteBlockOnTablet(d, 'sample', sampleId)).toBeNull();
    await deleteUnheld(d, 'sample', sampleId);
    expect(await d.samples.get(sampleId)).toMatchObject({ deletePending: true });
    expect((await d.outbox.toArray()).map((e) => [e.entity, e.op, e.id])).toEqual([['scan', 'delete', scanId], ['sample', 'delete', sampleId]]);
    const raw = await d.photos.get(attachmentId);
    expect(raw).toMatchObject({ sync: 'server', data: { kind: 'raw-scan', ownerId: scanId } });
    expect(raw?.deletePending).toBeUndefined();
    expect(await deleteBlockOnTablet(d, 'case', caseId)).toEqual({ held: [{ kind: 'rawScanFile', count: 1 }], permanent: ['rawScanFile'] });

    await sync(d, server);
    expect(server.records.get(scanId)?.record.deleted).toBe(true);
    expect(server.records.get(sampleId)?.record.deleted).toBe(true);
    expect(server.records.get(attachmentId)?.record.deleted).toBe(false);
    expect(await d.scans.get(scanId)).toBeUndefined();
    expect(await d.samples.get(sampleId)).toBeUndefined();
    expect(await d.photos.get(attachmentId)).toBeDefined();
    expect(await everythingSynced(d)).toBe(true);

    // The case still exports, carrying the permanent raw file without the deleted scan and sample.
    const archive = await readCaseArchive((await exportCaseArchive(d, caseId, { id: crypto.randomUUID(), email: 'inspector@demo.test', displayName: 'Demo Inspector' })).bytes);
    expect(archive.manifest.records.map((r) => [r.entity, r.id])).toEqual([['case', caseId], ['attachment', attachmentId]]);
    expect(archive.files.has(attachmentId)).toBe(true);
  });
});
