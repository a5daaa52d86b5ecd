#!/usr/bin/env node
// Sync speed: 500 scans (4,096 points each, one photo each) recorded offline by the PWA's own sync
// engine (bundled for Node, fake-indexeddb), then synced on loopback to the built API with MariaDB
// and the S3 fake, all started here on a throwaway database (PORT+960, S3_PORT+960) and removed
// afterwards. Prints the time, records/s and MB/s, split by push, uploads and pull; the issue's
// target is under 30 s. Needs the API built (`npm run build`).
import { fileURLToPath } from 'node:url';
import { loadClient } from '../sync-harness/client.mjs';
import { seededRandom } from '../sync-harness/random.mjs';
import { newInspector, signIn, startStack } from '../sync-harness/stack.mjs';

const SCANS = 500;
const POINTS = 4096;
const SAMPLES = 50;
const DISTINCT_SPECTRA = 10;
const PHOTO_BYTES = 250_000;

/** An invented IR absorbance scan: seeded Lorentzian bands on a sloping baseline with noise; no measurement. */
function syntheticScanCsv(random) {
  const bands = Array.from({ length: 6 + Math.floor(random() * 6) }, () => ({ centre: 650 + random() * 3300, height: 0.1 + random() * 0.6, halfWidth: 4 + random() * 10 }));
  const rows = ['# Synthetic (invented) IR absorbance scan for the sync bench; no measurement', 'Wavenumber (cm-1),Absorbance'];
  for (let i = 0; i < POINTS; i += 1) {
    const x = 4000 - (i * 3400) / (POINTS - 1);
    const signal = bands.reduce((sum, b) => sum + b.height / (1 + ((x - b.centre) / b.halfWidth) ** 2), 0);
    rows.push(`${x.toFixed(3)},${(signal + 0.03 + 0.000004 * (x - 600) + 0.004 * (random() - 0.5)).toFixed(5)}`);
  }
  const bytes = new TextEncoder().encode(`${rows.join('\n')}\n`);
  return bytes.buffer;
}

/** Photo-sized bytes behind a JPEG signature (invented, as a compressed tablet photo would weigh). */
function photoBytes(random) {
  const bytes = new Uint8Array(PHOTO_BYTES);
  for (let i = 0; i < bytes.length; i += 1) bytes[i] = Math.floor(random() * 256);
  bytes.set([0xff, 0xd8, 0xff, 0xe0]);
  return bytes.buffer;
}

const mb = (bytes) => bytes / 1e6;
const seconds = (ms) => (ms / 1000).toFixed(2);

export async function runSyncBench() {
  const random = seededRandom(20261201);
  const client = await loadClient();
  const stack = await startStack({ name: 'bench', offset: 960 });
  let db;
  try {
    const session = await signIn(stack.baseUrl, await newInspector(stack.baseUrl, 'bench'));
    const spent = { push: 0, upload: 0, pull: 0, other: 0 };
    // CPU seconds per phase, server (the API process) and tablet (this process): the phases run one after
    // the other, so each is read when the first request of the next kind starts.
    const cpu = { push: { server: 0, tablet: 0 }, upload: { server: 0, tablet: 0 }, pull: { server: 0, tablet: 0 }, other: { server: 0, tablet: 0 } };
    const cpuNow = () => {
      const tablet = process.cpuUsage();
      return { server: stack.apis[0].cpuSeconds(), tablet: (tablet.user + tablet.system) / 1e6, at: performance.now() };
    };
    // Wall time per phase, the tablet's own work between requests included (requests overlap when files go in parallel).
    const wall = { push: 0, upload: 0, pull: 0, other: 0 };
    let phase = { kind: null, from: null };
    const enterPhase = (kind) => {
      if (kind === phase.kind) return;
      const now = cpuNow();
      if (phase.kind) {
        cpu[phase.kind].server += now.server - phase.from.server;
        cpu[phase.kind].tablet += now.tablet - phase.from.tablet;
        wall[phase.kind] += now.at - phase.from.at;
      }
      phase = { kind, from: now };
    };
    const sent = { push: 0, upload: 0, pull: 0, other: 0 };
    const counted = { push: 0, upload: 0, pull: 0, other: 0 };
    const network = async (path, init = {}) => {
      const kind = path.startsWith('/api/sync/push') ? 'push' : path.startsWith('/api/sync/pull') ? 'pull' : init.method === 'PUT' ? 'upload' : 'other';
      enterPhase(kind);
      const started = performance.now();
      const response = await fetch(`${stack.baseUrl}${path}`, init);
      const body = await response.arrayBuffer();
      spent[kind] += performance.now() - started;
      counted[kind] += 1;
      sent[kind] += typeof init.body === 'string' ? Buffer.byteLength(init.body) : (init.body?.byteLength ?? 0);
      return new Response(body, { status: response.status, statusText: response.statusText, headers: response.headers });
    };
    db = await client.openDb('sync-bench');
    const api = client.createApiClient({ tokens: session.tokens, fetchFn: network });
    const sender = client.createByteSender(() => session.tokens.current().accessToken, network);
    const engine = client.createSyncEngine({ db, api, sender, clientId: 'sync-bench', schedule: () => () => undefined });

    // Offline: a case, its samples, and per scan its raw file, result and one photo.
    const queueStarted = performance.now();
    const settings = { ...client.DEFAULT_SCAN_SETTINGS, atr: false };
    const spectra = Array.from({ length: DISTINCT_SPECTRA }, (_, k) => {
      const file = { name: `bench-scan-${k}.csv`, bytes: syntheticScanCsv(random) };
      const response = client.handleRequest({ id: k, kind: 'identify', file, scan: settings, processing: client.DEFAULT_PROCESSING });
      if (!response.ok) throw new Error(`identification of the bench scan failed: ${JSON.stringify(response)}`);
      return { file, outcome: response.outcome };
    });
    const caseId = crypto.randomUUID();
    await client.saveCase(db, caseId, { siteName: 'Invented bench warehouse', address: null, latitude: null, longitude: null, locationAccuracyM: null, locationEnteredByHand: false, startedAt: '2026-11-30T07:00:00.000Z', weatherNotes: null, accessNotes: null, status: 'open' });
    const sampleIds = [];
    for (let s = 0; s < SAMPLES; s += 1) {
      const sampleId = crypto.randomUUID();
      sampleIds.push(sampleId);
      await client.saveSample(db, sampleId, { caseId, label: `B-${s + 1}`, container: 'drum', description: null, locationOnSite: null, observations: {}, collectedBy: 'Invented Inspector', collectedAt: '2026-11-30T07:10:00.000Z', sealNumber: null });
    }
    let fileBytes = 0;
    for (let n = 0; n < SCANS; n += 1) {
      const { file, outcome } = spectra[n % DISTINCT_SPECTRA];
      const sampleId = sampleIds[n % SAMPLES];
      const saved = await client.saveScan(db, { caseId, sampleId, settings, file, outcome, check: null, recordedAt: '2026-11-30T07:20:00.000Z', acknowledgedAt: '2026-11-30T07:21:00.000Z' });
      const photo = photoBytes(random);
      await client.addPhoto(db, { caseId, ownerType: 'scan', ownerId: saved.scanId }, { fileName: `scan-${n + 1}.jpg`, contentType: 'image/jpeg', bytes: photo });
      fileBytes += file.bytes.byteLength + photo.byteLength;
    }
    const records = await db.outbox.count();
    const queuedMs = performance.now() - queueStarted;

    const cpuAtStart = cpuNow();
    const started = performance.now();
    const status = await engine.syncNow();
    const totalMs = performance.now() - started;
    enterPhase(null);
    if (status.lastError !== null || !(await client.everythingSynced(db))) throw new Error(`the bench sync did not finish: ${status.lastError}`);
    const [[serverRows]] = await stack.query('SELECT COUNT(*) FROM attachments WHERE uploadedAt IS NOT NULL AND caseId = ?', [caseId]);
    // The server's recomputation of every scan runs after the answers; wait for it (bounded) to report when it ended.
    const recomputeUntil = performance.now() + 600_000;
    let recomputed = 0;
    while (performance.now() < recomputeUntil) {
      [[recomputed]] = await stack.query('SELECT COUNT(*) FROM scans WHERE caseId = ? AND (serverRecomputedAt IS NOT NULL OR serverRecomputeError IS NOT NULL)', [caseId]);
      if (Number(recomputed) >= SCANS) break;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    const recomputedMs = performance.now() - started;
    const serverCpu = cpuNow().server - cpuAtStart.server;

    console.log(`queued offline: ${records} records (1 case, ${SAMPLES} samples, ${SCANS} scans of ${POINTS} points, ${2 * SCANS} files: raw + photo) in ${seconds(queuedMs)} s (not counted below)`);
    console.log(`sync total: ${seconds(totalMs)} s (target < 30 s) for ${records} records and ${mb(fileBytes).toFixed(1)} MB of files; ${serverRows} files verified on the server`);
    console.log(`  throughput: ${(records / (totalMs / 1000)).toFixed(0)} records/s, ${(mb(fileBytes + sent.push) / (totalMs / 1000)).toFixed(1)} MB/s (files + push bodies)`);
    const cpuOf = (kind) => `${seconds(wall[kind])} s wall; CPU server ${cpu[kind].server.toFixed(1)} s, tablet ${cpu[kind].tablet.toFixed(1)} s`;
    console.log(`  push:    ${seconds(spent.push)} s in requests, ${counted.push} batches, ${mb(sent.push).toFixed(1)} MB of JSON, ${(records / (wall.push / 1000)).toFixed(0)} records/s; ${cpuOf('push')}`);
    console.log(`  uploads: ${seconds(spent.upload)} s in requests, ${counted.upload} chunks, ${(mb(sent.upload) / (wall.upload / 1000)).toFixed(1)} MB/s; ${cpuOf('upload')}`);
    console.log(`  pull:    ${seconds(spent.pull)} s in requests, ${counted.pull} pages; ${cpuOf('pull')}; other requests ${seconds(spent.other)} s`);
    console.log(`  server recomputation: ${recomputed} of ${SCANS} scans done ${seconds(recomputedMs)} s after the sync started; server CPU from the start until then ${serverCpu.toFixed(1)} s`);
    console.log(`  ratio total / 30 s target: ${(totalMs / 30_000).toFixed(2)}`);
  } finally {
    await db?.delete();
    await stack.close();
  }
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await runSyncBench();
