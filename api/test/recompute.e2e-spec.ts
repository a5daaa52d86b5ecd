import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { identifySpectrum, importSpectrum, scanResultRecord, type ProcessOptions } from '@siteband/shared';
import { fileKey } from '../src/attachments/attachment-storage-keys';
import { ScanRecomputeQueue } from '../src/scans/scan-recompute.queue';
import { ScanRecomputeService } from '../src/scans/scan-recompute.service';
import { ObjectStorageService } from '../src/storage/object-storage.service';
import { demo, pullAll, push, sha256, upsert, uploadWhole } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

const FIXTURE = 'synthetic-ir-ethanol-liquid.csv';
const fixtureBytes = readFileSync(join(__dirname, '..', '..', 'fixtures', 'spectra', FIXTURE));

/** The result a tablet stores for the fixture: the shared identification run on the device, in the sync form. */
function tabletResult(process: Partial<ProcessOptions> = {}): Record<string, unknown> {
  const spectrum = importSpectrum(new Uint8Array(fixtureBytes), { fileName: FIXTURE, technique: 'ir' });
  const { processed, result } = identifySpectrum(spectrum, { process: { technique: 'ir', phase: 'condensed', ...process } });
  return scanResultRecord(result, processed);
}

/** The processing settings (not outcomes) two stored results were computed with differently. */
function compareProcessing(a: Record<string, unknown>, b: Record<string, unknown>): string[] {
  const left = a.processing as Record<string, Record<string, unknown>>;
  const right = b.processing as Record<string, Record<string, unknown>>;
  return Object.keys(left).flatMap((step) =>
    typeof left[step] === 'object' && left[step] !== null ? Object.keys(left[step]).filter((k) => JSON.stringify(left[step][k]) !== JSON.stringify(right[step]?.[k])).map((k) => `${step}.${k}`) : [],
  );
}

describe('Server recomputation of synced scans (e2e, MariaDB + S3 fake)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;
  let supervisor: string;
  let queue: ScanRecomputeQueue;
  let caseId: string;
  let sampleId: string;
  const computed = tabletResult();

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
    queue = t.app.get(ScanRecomputeQueue);
    caseId = randomUUID();
    sampleId = randomUUID();
    const results = await push(t, inspector, [upsert('case', caseId, demo.case()), upsert('sample', sampleId, demo.sample(caseId))]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied']);
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  const irScan = (overrides: Record<string, unknown> = {}) =>
    demo.scan(sampleId, { technique: 'ir', excitationNm: null, parsedSummary: { points: 851 }, result: computed, ...overrides });
  const rawFile = (scanId: string, bytes: Buffer) => ({
    ownerType: 'scan',
    ownerId: scanId,
    kind: 'raw-scan',
    fileName: FIXTURE,
    contentType: 'text/csv',
    size: bytes.length,
    sha256: sha256(bytes),
  });

  /** The scan as the supervisor's case view shows it, once every queued recomputation has run. */
  async function scanView(scanId: string): Promise<Record<string, unknown>> {
    await queue.idle();
    const response = await t.http().get(`/api/cases/${caseId}`).set('Authorization', `Bearer ${supervisor}`).expect(200);
    const scan = (response.body.scans as Record<string, unknown>[]).find((s) => s.id === scanId);
    if (!scan) throw new Error(`scan ${scanId} is not in the case view`);
    return scan;
  }

  /** Pushes a scan linked to its raw file, then the attachment, then uploads the bytes (scan row first). */
  async function scanThenUpload(result: Record<string, unknown>, bytes: Buffer = fixtureBytes): Promise<string> {
    const scanId = randomUUID();
    const attachmentId = randomUUID();
    const results = await push(t, inspector, [
      upsert('scan', scanId, irScan({ rawAttachmentId: attachmentId, rawSha256: sha256(bytes), result })),
      upsert('attachment', attachmentId, rawFile(scanId, bytes)),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied']);
    await uploadWhole(t, inspector, attachmentId, bytes, 'text/csv').expect(200);
    return scanId;
  }

  it('stores a server result equal to the tablet’s when both ran the same code on the same file', async () => {
    const scanId = await scanThenUpload(computed);
    const scan = await scanView(scanId);
    expect(scan.serverResult).toEqual(scan.result);
    expect(scan.serverResult).toEqual(computed);
    expect(scan.resultMismatch).toBe(false);
    expect(scan.serverRecomputeError).toBeNull();
    expect(scan.serverRecomputedAt).toEqual(expect.stringMatching(/^\d{4}-\d\d-\d\dT/));
    expect(scan.mismatch).toMatchObject({ parametersFrom: 'tablet', differences: [], processing: [], candidates: null, scores: [], peaks: null });

    // Pulls carry it too (a new sequence number for the same version).
    const pulled = (await pullAll(t, supervisor)).changes.find((c) => c.entity === 'scan' && c.id === scanId);
    expect(pulled?.version).toBe(1);
    expect(pulled?.data).toMatchObject({ serverResult: computed, resultMismatch: false, serverRecomputeError: null });

    // The audit trail records the server's own write, with no actor, beside the tablet's create.
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    const audit = await t.http().get('/api/audit').query({ entity: 'scan', entityId: scanId }).set('Authorization', `Bearer ${admin}`).expect(200);
    expect(audit.body.items.map((e: Record<string, unknown>) => e.action)).toEqual(['recompute', 'create']);
    expect(audit.body.items[0]).toMatchObject({ actorId: null, actorRole: null, caseId, before: { serverRecomputedAt: null }, after: { resultMismatch: false, serverRecomputeError: null } });
  });

  it('flags a tablet result with another top candidate, describing the difference and keeping the tablet’s result', async () => {
    const candidates = computed.candidates as Record<string, unknown>[];
    const tampered = { ...computed, candidates: [candidates[1], candidates[0], ...candidates.slice(2)] };
    const scanId = await scanThenUpload(tampered);
    const scan = await scanView(scanId);
    expect(scan.result).toEqual(tampered);
    expect(scan.serverResult).toEqual(computed);
    expect(scan.resultMismatch).toBe(true);
    const ids = candidates.slice(0, 5).map((c) => c.id);
    expect(scan.mismatch).toMatchObject({
      candidates: { tablet: [ids[1], ids[0], ...ids.slice(2)], server: ids },
      // The same compounds with the same band agreements, only in another order.
      scores: [],
      peaks: null,
      libraryVersion: null,
      methodVersion: null,
    });
    expect((scan.mismatch as { differences: string[] }).differences).toEqual([
      `Top likely compounds differ: tablet ${[ids[1], ids[0], ...ids.slice(2)].join(', ')}; server ${ids.join(', ')}`,
    ]);
  });

  it('reports another method version, changed band agreements and moved peaks as such', async () => {
    const peaks = computed.peaks as { x: number }[];
    const candidates = computed.candidates as { id: string; score: number }[];
    const tampered = {
      ...computed,
      parameters: { ...(computed.parameters as object), methodVersion: '0.9.0' },
      candidates: [{ ...candidates[0], score: candidates[0].score - 0.01 }, ...candidates.slice(1)],
      peaks: peaks.map((p, i) => (i === 0 ? { ...p, x: p.x + 0.5 } : p)),
    };
    const scan = await scanView(await scanThenUpload(tampered));
    expect(scan.resultMismatch).toBe(true);
    expect(scan.mismatch).toMatchObject({
      libraryVersion: null,
      methodVersion: { tablet: '0.9.0', server: (computed.parameters as { methodVersion: string }).methodVersion },
      candidates: null,
      scores: [{ id: candidates[0].id, tablet: candidates[0].score - 0.01, server: candidates[0].score }],
      peaks: { tabletCount: peaks.length, serverCount: peaks.length, moved: [{ tabletCm1: peaks[0].x + 0.5, serverCm1: peaks[0].x }] },
    });
    expect((scan.mismatch as { differences: string[] }).differences).toHaveLength(3);
  });

  it('reports a tablet ranked against another library as such, not as a mismatch of the identification', async () => {
    const candidates = computed.candidates as Record<string, unknown>[];
    // Another library ranks other compounds; the peaks, from the same file and settings, agree.
    const otherLibrary = { ...computed, libraryVersion: { version: 'older-library', date: '2026-10-01', contentHash: 'sha256:0ld' }, candidates: candidates.slice(2) };
    const scan = await scanView(await scanThenUpload(otherLibrary));
    const server = computed.libraryVersion as { version: string; contentHash: string };
    expect(scan.resultMismatch).toBe(false);
    expect(scan.mismatch).toMatchObject({
      libraryVersion: { tablet: 'older-library (sha256:0ld)', server: `${server.version} (${server.contentHash})` },
      differences: [],
      candidates: null,
      peaks: null,
    });
    expect((scan.mismatch as { notes: string[] }).notes).toContain(
      `Compound library differs: tablet older-library (sha256:0ld), server ${server.version} (${server.contentHash}); the likely compounds were ranked against different libraries and are not compared`,
    );
  });

  describe('with the tablet’s tuned processing settings', () => {
    const tunedSettings: Partial<ProcessOptions> = { baseline: { method: 'airpls', lambda: 1e5 }, smoothing: { windowSize: 15, polynomial: 2 }, peaks: { thresholdSigma: 3.5 } };
    const tuned = tabletResult(tunedSettings);

    it('recomputes with those settings and finds no mismatch', async () => {
      // The settings change the answer: run with the defaults, this result would be flagged.
      expect(compareProcessing(tuned, computed)).toEqual(expect.arrayContaining(['baseline.method', 'smoothing.windowSize', 'peaks.thresholdSigma']));
      expect(tuned.peaks).not.toEqual(computed.peaks);
      const scan = await scanView(await scanThenUpload(tuned));
      expect(scan.serverRecomputeError).toBeNull();
      expect(scan.resultMismatch).toBe(false);
      expect(scan.serverResult).toEqual(tuned);
      expect(scan.mismatch).toMatchObject({ parametersFrom: 'tablet', differences: [], processing: [], notes: [] });
    });

    it('flags a raw file other than the one the result came from', async () => {
      const other = readFileSync(join(__dirname, '..', '..', 'fixtures', 'spectra', 'synthetic-ir-polystyrene-film.csv'));
      const scan = await scanView(await scanThenUpload(tuned, other));
      expect(scan.serverRecomputeError).toBeNull();
      expect(scan.result).toEqual(tuned);
      expect(scan.resultMismatch).toBe(true);
      expect((scan.serverResult as { processing: { smoothing: unknown } }).processing.smoothing).toEqual({ windowSize: 15, polynomial: 2 });
      const differences = (scan.mismatch as { differences: string[] }).differences;
      expect(differences.some((d) => d.startsWith('Top likely compounds differ') || d.startsWith('Peak count differs') || d.includes('peak position'))).toBe(true);
    });
  });

  it('gives a scan whose recorded processing cannot be run again a clear state, audited, without failing the push', async () => {
    const unknownSetting = { ...computed, processing: { ...(computed.processing as object), resampling: 'spline' } };
    const scanId = await scanThenUpload(unknownSetting);
    const scan = await scanView(scanId);
    expect(scan).toMatchObject({
      serverResult: null,
      resultMismatch: null,
      mismatch: null,
      serverRecomputeError: "Cannot reproduce the tablet's processing: recorded processing: unknown setting resampling",
    });
    // A standing answer: not tried again at start-up.
    expect(scan.serverRecomputedAt).toEqual(expect.stringMatching(/^\d{4}-\d\d-\d\dT/));
    expect(scan.result).toEqual(unknownSetting);
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    const audit = await t.http().get('/api/audit').query({ entity: 'scan', entityId: scanId }).set('Authorization', `Bearer ${admin}`).expect(200);
    expect(audit.body.items[0]).toMatchObject({ action: 'recompute', after: { resultMismatch: null, serverRecomputeError: scan.serverRecomputeError } });

    const processing = JSON.parse(JSON.stringify(computed.processing));
    processing.smoothing.windowSize = 4001;
    const outOfBounds = await scanView(await scanThenUpload({ ...computed, processing }));
    expect(outOfBounds.serverRecomputeError).toBe(
      "Cannot reproduce the tablet's processing: recorded processing: smoothing.windowSize must be an odd whole number from 5 to 51, got 4001",
    );
  });

  it('uses the pipeline defaults when the tablet recorded no processing settings, and says so', async () => {
    const { processing: _processing, ...withoutProcessing } = computed;
    const scan = await scanView(await scanThenUpload(withoutProcessing));
    expect(scan.resultMismatch).toBe(false);
    expect(scan.mismatch).toMatchObject({ parametersFrom: 'defaults', differences: [] });
    expect((scan.mismatch as { notes: string[] }).notes).toContain('The tablet recorded no processing settings: the server used the pipeline defaults');
  });

  it('recomputes when the upload finished before the scan was linked to its raw file', async () => {
    const scanId = randomUUID();
    const attachmentId = randomUUID();
    await push(t, inspector, [upsert('scan', scanId, irScan({ result: null })), upsert('attachment', attachmentId, rawFile(scanId, fixtureBytes))]);
    await uploadWhole(t, inspector, attachmentId, fixtureBytes, 'text/csv').expect(200);
    expect((await scanView(scanId)).serverRecomputedAt).toBeNull();

    const [linked] = await push(t, inspector, [upsert('scan', scanId, irScan({ rawAttachmentId: attachmentId, rawSha256: sha256(fixtureBytes) }), 1)]);
    expect(linked.status).toBe('applied');
    const scan = await scanView(scanId);
    expect(scan.serverResult).toEqual(computed);
    expect(scan.resultMismatch).toBe(false);
  });

  it('keeps the recomputation through an acknowledgement, and clears and redoes it when the result changes', async () => {
    const scanId = await scanThenUpload(computed);
    const first = await scanView(scanId);
    const base = { rawAttachmentId: first.rawAttachmentId, rawSha256: first.rawSha256 };
    await push(t, inspector, [upsert('scan', scanId, irScan({ ...base, inspectorAcknowledgedAt: '2026-11-30T09:30:00.000Z' }), 1)]);
    const acknowledged = await scanView(scanId);
    expect(acknowledged.serverRecomputedAt).toBe(first.serverRecomputedAt);
    expect(acknowledged.serverResult).toEqual(computed);

    const candidates = computed.candidates as Record<string, unknown>[];
    await push(t, inspector, [upsert('scan', scanId, irScan({ ...base, result: { ...computed, candidates: candidates.slice(1) } }), 2)]);
    const changed = await scanView(scanId);
    expect(changed.resultMismatch).toBe(true);
    expect(changed.serverResult).toEqual(computed);
  });

  it('recomputes a scan whose phase was changed and identified again on the tablet, and agrees with it', async () => {
    const scanId = await scanThenUpload(computed);
    const first = await scanView(scanId);
    expect(first.resultMismatch).toBe(false);
    const base = { rawAttachmentId: first.rawAttachmentId, rawSha256: first.rawSha256 };
    // The tablet's edit: gas phase, the identification run again from the same raw file, acknowledged anew.
    const gas = tabletResult({ phase: 'gas' });
    const [edit] = await push(t, inspector, [upsert('scan', scanId, irScan({ ...base, phase: 'gas', result: gas, inspectorAcknowledgedAt: '2026-11-30T10:05:00.000Z' }), 1)]);
    expect(edit).toMatchObject({ status: 'applied', version: 2 });
    const edited = await scanView(scanId);
    expect(edited.serverRecomputedAt).not.toBe(first.serverRecomputedAt);
    expect(edited.serverRecomputeError).toBeNull();
    expect(edited.serverResult).toEqual(gas);
    expect(edited.resultMismatch).toBe(false);
    expect(edited.mismatch).toMatchObject({ parametersFrom: 'tablet', differences: [] });

    // A phase changed without identifying again leaves a result the server cannot reproduce as the scan now says: named, not a mismatch.
    await push(t, inspector, [upsert('scan', scanId, irScan({ ...base, phase: 'condensed', result: gas }), 2)]);
    const stale = await scanView(scanId);
    expect(stale.resultMismatch).toBeNull();
    expect(stale.serverRecomputeError).toMatch(/^Cannot reproduce the tablet's processing: .*phase/);
  });

  it('records an unreadable raw file on the scan while the push is answered 200', async () => {
    const bytes = Buffer.from('this file holds no spectrum at all\n');
    const scanId = randomUUID();
    const attachmentId = randomUUID();
    await push(t, inspector, [upsert('scan', scanId, irScan({ result: null })), upsert('attachment', attachmentId, rawFile(scanId, bytes))]);
    await uploadWhole(t, inspector, attachmentId, bytes, 'text/csv').expect(200);
    const response = await t
      .http()
      .post('/api/sync/push')
      .set('Authorization', `Bearer ${inspector}`)
      .send({ clientId: 'e2e-tablet', batchId: randomUUID(), changes: [upsert('scan', scanId, irScan({ rawAttachmentId: attachmentId, rawSha256: sha256(bytes) }), 1)] });
    expect(response.status).toBe(200);
    expect(response.body.results[0].status).toBe('applied');
    const scan = await scanView(scanId);
    expect(scan.serverRecomputeError).toEqual(expect.stringMatching(/^Could not identify the raw file: .+/));
    expect(scan).toMatchObject({ serverResult: null, resultMismatch: null, mismatch: null, serverRecomputedAt: null });
    expect(scan.result).toEqual(computed);
  });

  it('re-running changes nothing, and a pending scan is picked up again as at start-up', async () => {
    const scanId = await scanThenUpload(computed);
    await queue.idle();
    const read = async () => (await t.dataSource.query('SELECT serverResult, mismatch, serverRecomputedAt, syncSeq FROM scans WHERE id = ?', [scanId]))[0];
    const before = await read();
    await t.app.get(ScanRecomputeService).run(scanId);
    expect(await read()).toEqual(before);

    // As if the server stopped before storing it: start-up finds the scan again and stores the same result.
    await t.dataSource.query('UPDATE scans SET serverResult = NULL, resultMismatch = NULL, mismatch = NULL, serverRecomputedAt = NULL WHERE id = ?', [scanId]);
    expect(await queue.enqueuePending()).toBeGreaterThanOrEqual(1);
    const again = await scanView(scanId);
    expect(again.serverResult).toEqual(computed);
    expect(again.resultMismatch).toBe(false);
  });

  it('records a damaged or missing stored raw file as a failure instead of throwing', async () => {
    const scanId = await scanThenUpload(computed);
    const scan = await scanView(scanId);
    const storage = t.app.get(ObjectStorageService);
    const key = fileKey(caseId, scan.rawAttachmentId as string);
    const damaged = Buffer.from(fixtureBytes);
    damaged[100] ^= 0x01;
    await storage.put(key, damaged, 'text/csv');
    // As a start-up re-run would see it: not yet recomputed.
    await t.dataSource.query('UPDATE scans SET serverRecomputedAt = NULL WHERE id = ?', [scanId]);
    await t.app.get(ScanRecomputeService).run(scanId);
    expect((await scanView(scanId)).serverRecomputeError).toBe(
      `Could not read the raw file from object storage: the stored file no longer has SHA-256 ${sha256(fixtureBytes)}`,
    );

    await storage.deletePrefix(key);
    await t.app.get(ScanRecomputeService).run(scanId);
    const failed = await scanView(scanId);
    expect(failed.serverRecomputeError).toEqual(expect.stringMatching(/^Could not read the raw file from object storage: .+/));
    expect(failed.serverRecomputeError).not.toContain('SHA-256');
    expect(failed.serverResult).toBeNull();
  });

  it('does not let a failure replace a recomputation that still stands', async () => {
    const scanId = await scanThenUpload(computed);
    const scan = await scanView(scanId);
    await t.app.get(ObjectStorageService).deletePrefix(fileKey(caseId, scan.rawAttachmentId as string));
    await t.app.get(ScanRecomputeService).run(scanId);
    const after = await scanView(scanId);
    expect(after).toMatchObject({ serverResult: computed, resultMismatch: false, serverRecomputeError: null, serverRecomputedAt: scan.serverRecomputedAt });
  });
});
