import { createHash } from 'node:crypto';
import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import type { InstrumentCheckRow } from '../../db/instrumentChecksTable';
import type { PhotoRow } from '../../db/photosTable';
import { createApiClient } from '../api/client';
import { saveCase } from '../cases/saveCase';
import { handleRequest } from '../identify/handleRequest';
import type { ScanFile } from '../identify/protocol';
import { DEFAULT_PROCESSING, DEFAULT_SCAN_SETTINGS, type ScanSettings } from '../identify/scanSettings';
import { fixtureScan, identify } from '../identify/testFixtures';
import { saveSample } from '../samples/saveSample';
import { heldBytes } from '../photos/attachmentBytes';
import { mergePulled } from '../sync/mergePulled';
import { createSyncEngine } from '../sync/syncEngine';
import { everythingSynced } from '../sync/syncState';
import { createTestServer } from '../sync/testServer';
import { identificationChanged, processingSettingsOf, saveScanEdit, scanSettingsOf, storedRawFile } from './editScan';
import { saveScan, type NewScan } from './saveScan';

let db: SitebandDb | undefined;
let count = 0;
afterEach(async () => {
  await db?.delete();
});

const raman: ScanSettings = { ...DEFAULT_SCAN_SETTINGS, technique: 'raman', atr: false, excitationNm: 785 };
const ir: ScanSettings = DEFAULT_SCAN_SETTINGS;

/** A fresh database holding one open case with one sample (invented demo scenario). */
async function withSample(): Promise<{ d: SitebandDb; caseId: string; sampleId: string }> {
  const d = await openDb(`scan-test-${++count}-${Date.now()}`);
  db = d;
  const caseId = crypto.randomUUID();
  const sampleId = crypto.randomUUID();
  await saveCase(d, caseId, {
    siteName: 'Canal lock store', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-04-01T07:00:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  await saveSample(d, sampleId, { caseId, label: 'S-1', container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Inspector', collectedAt: '2026-04-01T07:10:00.000Z', sealNumber: null });
  return { d, caseId, sampleId };
}

function newScan(caseId: string, sampleId: string, file: ScanFile, settings: ScanSettings, check: InstrumentCheckRow | null = null): NewScan {
  return { caseId, sampleId, settings, file, outcome: identify(file, settings), check, recordedAt: '2026-04-01T07:20:00.000Z', acknowledgedAt: '2026-04-01T07:21:00.000Z' };
}

describe('saving a scan', () => {
  it('writes the scan, its raw file and the escalation with their changes, parents first', async () => {
    const { d, caseId, sampleId } = await withSample();
    const file = fixtureScan('synthetic-raman-ammonium-nitrate-785.csv');
    const saved = await saveScan(d, newScan(caseId, sampleId, file, raman));
    const expectedHash = createHash('sha256').update(new Uint8Array(file.bytes)).digest('hex');

    const scan = await d.scans.get(saved.scanId);
    expect(scan).toMatchObject({ caseId, sync: 'local', data: { sampleId, technique: 'raman', excitationNm: 785, rawAttachmentId: saved.attachmentId, rawSha256: expectedHash, instrumentCheckId: null } });
    const raw = (await d.photos.get(saved.attachmentId)) as PhotoRow;
    expect(raw.data).toEqual({ ownerType: 'scan', ownerId: saved.scanId, kind: 'raw-scan', fileName: file.name, contentType: 'text/csv', size: file.bytes.byteLength, sha256: expectedHash });
    expect(raw.bytesHeld).toBe(true);
    expect(new Uint8Array((await heldBytes(d, raw.id))!)).toEqual(new Uint8Array(file.bytes));

    expect(saved.escalationId).not.toBeNull();
    const escalation = await d.escalations.get(saved.escalationId!);
    expect(escalation?.data).toMatchObject({ caseId, scanId: saved.scanId, raisedAt: '2026-04-01T07:21:00.000Z' });
    expect(escalation?.data.hazardClasses.length).toBeGreaterThan(0);
    expect(escalation?.data.reason).toMatch(/\S/);

    const entities = (await d.outbox.orderBy('seq').toArray()).map((e) => `${e.entity}:${e.id}`);
    expect(entities.slice(-3)).toEqual([`scan:${saved.scanId}`, `attachment:${saved.attachmentId}`, `escalation:${saved.escalationId}`]);
  });

  it('stores the result with how it was reached, in the form the server compares', async () => {
    const { d, caseId, sampleId } = await withSample();
    const input = newScan(caseId, sampleId, fixtureScan('synthetic-ir-ethanol-liquid.csv'), ir);
    const { scanId, escalationId } = await saveScan(d, input);
    const result = (await d.scans.get(scanId))!.data.result as Record<string, unknown> & { processing: { atr: { enabled: boolean } }; candidates: { name: string }[] };
    expect(result.codeVersion).toBe(input.outcome.result.parameters.methodVersion);
    expect(result.libraryVersion).toEqual(input.outcome.result.libraryVersion);
    expect(result.parameters).toEqual(input.outcome.result.parameters);
    expect(result.quality).toEqual(input.outcome.processed.quality);
    expect(result.processing.atr.enabled).toBe(true);
    expect(result.candidates[0]!.name).toBe('Ethanol');
    // The server refuses JSON fields over 200 000 characters (PROTOCOL.md, entity scan).
    expect(JSON.stringify(result).length).toBeLessThan(200_000);
    expect(escalationId).toBeNull();
    expect(await d.escalations.count()).toBe(0);
  });

  it('leaves nothing behind when one write of the set fails', async () => {
    const { d, caseId, sampleId } = await withSample();
    const before = await d.outbox.count();
    d.escalations.hook('creating', () => {
      throw new Error('storage full');
    });
    await expect(saveScan(d, newScan(caseId, sampleId, fixtureScan('synthetic-raman-ammonium-nitrate-785.csv'), raman))).rejects.toThrow(/storage full/);
    expect(await d.scans.count()).toBe(0);
    expect(await d.photos.count()).toBe(0);
    expect(await d.outbox.count()).toBe(before);
  });

  it('refuses an empty file and a result computed with other settings, writing nothing', async () => {
    const { d, caseId, sampleId } = await withSample();
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const input = newScan(caseId, sampleId, file, ir);
    await expect(saveScan(d, { ...input, file: { name: 'blank.csv', bytes: new ArrayBuffer(0) } })).rejects.toThrow(/blank.csv is empty/);
    await expect(saveScan(d, { ...input, settings: { ...ir, phase: 'gas' } })).rejects.toThrow(/other scan settings/);
    expect(await d.scans.count()).toBe(0);
  });

  it('attaches the passing check in force as one instrumentCheck record per case, sent before the scan', async () => {
    const { d, caseId, sampleId } = await withSample();
    const check: InstrumentCheckRow = {
      id: 4, technique: 'ir', standardId: 'ir-polystyrene-ep-ft', standardName: 'Polystyrene film', pass: true, reason: 'all bands in tolerance', fileName: 'ps.csv', checkedAt: Date.parse('2026-04-01T06:50:00.000Z'),
      bands: [{ expectedCm1: 1601.2, foundCm1: 1601.5, offsetCm1: 0.3, toleranceCm1: 1, toleranceSource: 'synthetic test value', status: 'pass' }],
    };
    const file = fixtureScan('synthetic-ir-ethanol-liquid.csv');
    const first = await saveScan(d, newScan(caseId, sampleId, file, ir, check));
    const second = await saveScan(d, newScan(caseId, sampleId, file, ir, check));
    expect(first.instrumentCheckId).not.toBeNull();
    expect(second.instrumentCheckId).toBe(first.instrumentCheckId);
    expect((await d.caseChecks.get(first.instrumentCheckId!))?.data).toMatchObject({ caseId, standardId: 'ir-polystyrene-ep-ft', passed: true, performedAt: '2026-04-01T06:50:00.000Z' });
    const order = (await d.outbox.orderBy('seq').toArray()).map((e) => e.entity);
    expect(order.indexOf('instrumentCheck')).toBeLessThan(order.indexOf('scan'));
    expect(order.filter((e) => e === 'instrumentCheck')).toHaveLength(1);
    const failed = await saveScan(d, newScan(caseId, sampleId, file, ir, { ...check, id: 5, pass: false }));
    expect(failed.instrumentCheckId).toBeNull();
  });

  it('syncs the scan and uploads its raw file through the attachment upload; a pulled recomputation is kept', async () => {
    const { d, caseId, sampleId } = await withSample();
    const server = createTestServer();
    const file = fixtureScan('synthetic-raman-ammonium-nitrate-785.csv');
    const saved = await saveScan(d, newScan(caseId, sampleId, file, raman));
    const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
    const engine = createSyncEngine({
      db: d, api: createApiClient({ tokens, fetchFn: server.fetch }), clientId: 'tablet-test', schedule: () => () => undefined,
      sender: { put: (path, bytes, headers) => server.fetch(path, { method: 'PUT', body: bytes, headers }) },
    });
    expect(await engine.syncNow()).toMatchObject({ failures: 0 });
    expect(server.uploads.get(saved.attachmentId)).toEqual(new Uint8Array(file.bytes));
    expect(server.records.get(saved.escalationId!)?.record.entity).toBe('escalation');
    expect(await d.scans.get(saved.scanId)).toMatchObject({ sync: 'server', version: 1 });
    expect(await everythingSynced(d)).toBe(true);

    const onServer = server.records.get(saved.scanId)!.record;
    const recomputed = { ...onServer, syncSeq: onServer.syncSeq + 10, data: { ...onServer.data, caseId, resultMismatch: false, serverRecomputedAt: '2026-04-01T08:00:00.000Z', serverRecomputeError: null, mismatch: { differences: [] } } };
    expect(await mergePulled(d, recomputed)).toBe('same');
    expect((await d.scans.get(saved.scanId))?.serverCheck).toEqual({ resultMismatch: false, serverRecomputedAt: '2026-04-01T08:00:00.000Z', serverRecomputeError: null, differences: [] });
  }, 60_000);
});

describe('changing a saved scan', () => {
  /** A saved scan, with its raw file as the tablet keeps it, and the outbox emptied as if it had synced. */
  async function savedScan(name: string, settings: ScanSettings) {
    const { d, caseId, sampleId } = await withSample();
    const saved = await saveScan(d, newScan(caseId, sampleId, fixtureScan(name), settings));
    await d.outbox.clear();
    const scan = (await d.scans.get(saved.scanId))!;
    const raw = (await d.photos.get(saved.attachmentId))!;
    return { d, caseId, saved, scan, raw, rawBefore: new Uint8Array((await heldBytes(d, raw.id))!).slice() };
  }

  it('re-runs the identification from the stored raw file with the new phase and stores the new result, acknowledged anew', async () => {
    const { d, saved, scan, raw, rawBefore } = await savedScan('synthetic-ir-ethanol-liquid.csv', ir);
    await d.scans.update(scan.id, { serverCheck: { resultMismatch: false, serverRecomputedAt: '2026-04-01T08:00:00.000Z', serverRecomputeError: null, differences: [] } });
    const settings = { ...scanSettingsOf(scan.data), phase: 'gas' as const };
    expect(scanSettingsOf(scan.data)).toEqual(ir);
    expect(identificationChanged(scan.data, settings)).toBe(true);
    expect(identificationChanged(scan.data, { ...ir, excitationNm: 1064 })).toBe(false);
    await expect(saveScanEdit(d, { scan, settings, reidentified: null, check: 'keep' })).rejects.toThrow(/must run again from the raw file/);
    expect(await d.outbox.count()).toBe(0);

    const processing = processingSettingsOf(scan.data, settings.technique);
    expect(processing.baselineLambda).toBe((scan.data.result.processing as { baseline: { lambda: number } }).baseline.lambda);
    const outcome = identify((await storedRawFile(d, raw))!, settings, processing);
    expect(outcome.result.phase).toBe('gas');
    await saveScanEdit(d, { scan, settings, reidentified: { outcome, acknowledgedAt: '2026-04-01T09:00:00.000Z' }, check: 'keep' });

    const after = (await d.scans.get(saved.scanId))!;
    expect(after.data).toMatchObject({ technique: 'ir', phase: 'gas', excitationNm: null, recordedAt: scan.data.recordedAt, rawSha256: scan.data.rawSha256, rawAttachmentId: raw.id, inspectorAcknowledgedAt: '2026-04-01T09:00:00.000Z' });
    const result = after.data.result as { phase: string; processing: { phase: string; technique: string }; codeVersion: string };
    expect(result.phase).toBe('gas');
    expect(result.processing).toMatchObject({ technique: 'ir', phase: 'gas' });
    expect(result.codeVersion).toBe(outcome.result.parameters.methodVersion);
    // The server's check of the old result no longer stands for the new one.
    expect(after.serverCheck).toBeUndefined();
    // The raw file is kept byte for byte and not queued again.
    const rawAfter = (await d.photos.get(raw.id))!;
    expect(new Uint8Array((await heldBytes(d, rawAfter.id))!)).toEqual(rawBefore);
    expect(rawAfter.data).toEqual(raw.data);
    const outbox = await d.outbox.toArray();
    expect(outbox.map((e) => [e.entity, e.id, e.op, e.status])).toEqual([['scan', saved.scanId, 'upsert', 'pending']]);
    expect(outbox[0].data).toEqual(after.data);
  });

  it('keeps the old values when the raw file cannot be read as the new technique', async () => {
    const { d, saved, scan, raw } = await savedScan('synthetic-ir-ethanol-liquid.csv', ir);
    const response = handleRequest({ id: 2, kind: 'identify', file: (await storedRawFile(d, raw))!, scan: raman, processing: processingSettingsOf(scan.data, 'raman') });
    expect(response).toMatchObject({ ok: false, error: { code: 'import' } });
    expect(!response.ok && response.error.message).toMatch(/IR/);
    expect(processingSettingsOf(scan.data, 'raman')).toEqual(DEFAULT_PROCESSING);
    expect((await d.scans.get(saved.scanId))!.data).toEqual(scan.data);
    expect(await d.outbox.count()).toBe(0);
  });

  it('raises an escalation when the new result requires one, once, by the capture rule', async () => {
    const { d, caseId, saved, scan, raw } = await savedScan('synthetic-raman-ammonium-nitrate-785.csv', { ...raman, phase: 'gas' });
    expect(saved.escalationId).toBeNull();
    const condensed = identify((await storedRawFile(d, raw))!, raman);
    expect(condensed.result.escalation.required).toBe(true);
    const first = await saveScanEdit(d, { scan, settings: raman, reidentified: { outcome: condensed, acknowledgedAt: '2026-04-01T09:10:00.000Z' }, check: 'keep' });
    expect(first.escalationId).not.toBeNull();
    expect((await d.escalations.get(first.escalationId!))?.data).toMatchObject({ caseId, scanId: saved.scanId, raisedAt: '2026-04-01T09:10:00.000Z' });
    const order = (await d.outbox.orderBy('seq').toArray()).map((e) => e.entity);
    expect(order).toEqual(['scan', 'escalation']);
    // Edited again with the same finding: the escalation already raised stands, no second one.
    const again = await saveScanEdit(d, { scan: (await d.scans.get(saved.scanId))!, settings: raman, reidentified: { outcome: condensed, acknowledgedAt: '2026-04-01T09:20:00.000Z' }, check: 'keep' });
    expect(again.escalationId).toBeNull();
    expect(await d.escalations.count()).toBe(1);
  });

  it('changes the instrument check alone without running the identification again', async () => {
    const { d, saved, scan } = await savedScan('synthetic-ir-ethanol-liquid.csv', ir);
    const check: InstrumentCheckRow = {
      id: 9, technique: 'ir', standardId: 'ir-polystyrene-ep-ft', standardName: 'Polystyrene film', pass: true, reason: 'all bands in tolerance', fileName: 'ps.csv', checkedAt: Date.parse('2026-04-01T06:55:00.000Z'),
      bands: [{ expectedCm1: 1601.2, foundCm1: 1601.4, offsetCm1: 0.2, toleranceCm1: 1, toleranceSource: 'synthetic test value', status: 'pass' }],
    };
    const { instrumentCheckId } = await saveScanEdit(d, { scan, settings: scanSettingsOf(scan.data), reidentified: null, check });
    const after = (await d.scans.get(saved.scanId))!;
    expect(after.data).toEqual({ ...scan.data, instrumentCheckId });
    expect(instrumentCheckId).not.toBeNull();
    expect((await d.outbox.orderBy('seq').toArray()).map((e) => e.entity)).toEqual(['instrumentCheck', 'scan']);
  });
});
