// Sync fault injection: the PWA's own sync engine (bundled for Node, IndexedDB from fake-indexeddb)
// against the built API as real processes on a throwaway database and S3 fake. In each round the
// tablet records field work offline, then syncs while the API process serving it is killed (SIGKILL
// or SIGTERM) at a seeded-random point — during a push batch, a chunk of an upload, or a pull — or
// while an answer is dropped after the server sent it; then the tablet syncs again. Two API
// processes share the database and bucket: after a kill the other one, already up, serves the
// tablet while the killed one is started again for a later kill (an API boot takes seconds, and
// waiting for it in every round would make the suite several times slower).
// After every round: each record exactly once on the server with the version the tablet's changes
// give it, every file complete with its SHA-256, and on the tablet nothing lost and the outbox empty.
//
// Replay a run with SYNC_FAULTS_SEED=<seed printed at the start>; SYNC_FAULTS_ROUNDS sets the
// number of API kills (default 20); each run also has a quarter as many dropped answers.
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { after, before, test } from 'node:test';
import { join } from 'node:path';
import { loadClient } from './client.mjs';
import { seededRandom, shuffled } from './random.mjs';
import { newInspector, signIn, startStack } from './stack.mjs';

const SEED = Number(process.env.SYNC_FAULTS_SEED ?? Math.floor(Math.random() * 2 ** 31));
const KILL_ROUNDS = Number(process.env.SYNC_FAULTS_ROUNDS ?? 20);
const LOST_ROUNDS = Math.max(4, Math.ceil(KILL_ROUNDS / 4));
console.log(`sync faults: seed ${SEED} (replay with SYNC_FAULTS_SEED=${SEED}), ${KILL_ROUNDS} API kills, ${LOST_ROUNDS} dropped answers`);

const random = seededRandom(SEED);
const between = (low, high) => low + Math.floor(random() * (high - low + 1));
const pick = (items) => items[Math.floor(random() * items.length)];
const sha256 = (bytes) => createHash('sha256').update(new Uint8Array(bytes)).digest('hex');

const TABLES = { case: 'cases', sample: 'samples', handover: 'handovers', note: 'site_notes', attachment: 'attachments', scan: 'scans', escalation: 'escalations' };
const LOCAL = { case: 'cases', sample: 'samples', handover: 'handovers', note: 'notes', attachment: 'photos', scan: 'scans', escalation: 'escalations' };

let client;
let stack;
let session;
/** The API process the tablet talks to, and the restart of the last killed one. */
let serving;
let restarting = Promise.resolve();
let db;
let engine;
/** What the tablet made: id → { entity, version it must reach on the server, file hash, a checked field }. */
const made = new Map();
/** The armed fault of the round: which request, which number of it, what happens. */
let trap = null;
const requests = { push: 0, upload: 0, pull: 0 };

function kindOf(path, method = 'GET') {
  if (path.startsWith('/api/sync/push')) return 'push';
  if (path.startsWith('/api/sync/pull')) return 'pull';
  if (method === 'PUT' && /^\/api\/attachments\/[^/]+\/content$/.test(path)) return 'upload';
  return 'other';
}

/** The tablet's network: the real one to the API, with this round's fault. */
async function network(path, init = {}) {
  const url = `${serving.baseUrl}${path}`;
  const kind = kindOf(path, init.method);
  if (kind !== 'other') requests[kind] += 1;
  if (trap && !trap.fired && kind === trap.kind && requests[kind] === trap.nth) {
    trap.fired = true;
    if (trap.mode === 'drop') {
      // The server gets the request, commits and answers; the answer never reaches the tablet.
      const response = await fetch(url, init);
      await response.arrayBuffer();
      throw new TypeError(`fetch failed: the answer (${response.status}) was dropped on the way back`);
    }
    const target = serving;
    setTimeout(() => target.signal(trap.mode), trap.delayMs);
  }
  return fetch(url, init);
}

function fixture(name) {
  const bytes = readFileSync(join(import.meta.dirname, '../../fixtures/spectra', name));
  return { name, bytes: bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) };
}

/** A photo-sized file: a JPEG signature and seeded noise (an invented picture, not a real one). */
function photoBytes(size) {
  const bytes = new Uint8Array(size);
  for (let i = 0; i < size; i += 1) bytes[i] = Math.floor(random() * 256);
  bytes.set([0xff, 0xd8, 0xff, 0xe0]);
  return bytes.buffer;
}

let scanFiles;
function outcomeFor(file, settings) {
  const response = client.handleRequest({ id: 1, kind: 'identify', file, scan: settings, processing: client.DEFAULT_PROCESSING });
  if (!response.ok) throw new Error(`identification failed: ${JSON.stringify(response)}`);
  return response.outcome;
}

function note(entity, id, extra = {}) {
  made.set(id, { entity, version: 1, ...extra });
}

/** Field work recorded offline: a case (new or an earlier one edited), samples, notes, hand-overs, photos, scans. */
async function recordWork(round) {
  const cases = [...made].filter(([, r]) => r.entity === 'case');
  let caseId;
  if (cases.length === 0 || random() < 0.4) {
    caseId = crypto.randomUUID();
    await client.saveCase(db, caseId, { siteName: `Invented site ${round}`, address: null, latitude: null, longitude: null, locationAccuracyM: null, locationEnteredByHand: false, startedAt: '2026-11-30T08:00:00.000Z', weatherNotes: `round ${round}`, accessNotes: null, status: 'open' });
    note('case', caseId, { check: `round ${round}` });
  } else {
    [caseId] = pick(cases);
    const row = await db.cases.get(caseId);
    await client.saveCase(db, caseId, { ...row.data, weatherNotes: `edited in round ${round}` });
    const record = made.get(caseId);
    record.version += 1;
    record.check = `edited in round ${round}`;
  }
  for (let s = between(1, 3); s > 0; s -= 1) {
    const sampleId = crypto.randomUUID();
    await client.saveSample(db, sampleId, { caseId, label: `R${round}-S${s}`, container: 'glass jar', description: null, locationOnSite: null, observations: { state: 'powder' }, collectedBy: 'Invented Inspector', collectedAt: '2026-11-30T08:10:00.000Z', sealNumber: `SEAL-${round}-${s}` });
    note('sample', sampleId);
    if (random() < 0.5) note('handover', await client.addHandover(db, caseId, { sampleId, from: 'Invented Inspector', to: 'Invented Courier', at: '2026-11-30T09:00:00.000Z', sealNumber: `SEAL-${round}-${s}`, note: null }));
    for (let p = between(0, 2); p > 0; p -= 1) {
      const bytes = photoBytes(between(20_000, 3 * client.CHUNK_BYTES + 5_000));
      note('attachment', await client.addPhoto(db, { caseId, ownerType: 'sample', ownerId: sampleId }, { fileName: `r${round}-${s}-${p}.jpg`, contentType: 'image/jpeg', bytes }), { sha256: sha256(bytes) });
    }
    if (random() < 0.4) {
      const { file, settings, outcome } = pick(scanFiles);
      const saved = await client.saveScan(db, { caseId, sampleId, settings, file, outcome, check: null, recordedAt: '2026-11-30T08:20:00.000Z', acknowledgedAt: '2026-11-30T08:21:00.000Z' });
      note('scan', saved.scanId);
      note('attachment', saved.attachmentId, { sha256: sha256(file.bytes) });
      if (saved.escalationId) note('escalation', saved.escalationId);
    }
  }
  // Now and then a long day of site notes, so the push takes several batches.
  const notes = random() < 0.2 ? between(client.MAX_BATCH, client.MAX_BATCH + 40) : between(1, 20);
  for (let n = 0; n < notes; n += 1) {
    const text = `Round ${round} note ${n}: drum label faded, bung intact`;
    note('note', await client.addNote(db, caseId, null, text, new Date('2026-11-30T10:00:00.000Z')), { check: text });
  }
}

/** How many requests of each kind a clean sync of the outbox would make: the range a fault is drawn from. */
async function plannedRequests() {
  const outbox = await db.outbox.count();
  const photos = await db.photos.filter((p) => p.uploadedAt === null).toArray();
  return {
    push: Math.ceil(outbox / client.MAX_BATCH),
    upload: photos.reduce((sum, p) => sum + Math.ceil(p.data.size / client.CHUNK_BYTES), 0),
    pull: 1,
  };
}

async function syncUntilDone(label) {
  for (let attempt = 1; attempt <= 6; attempt += 1) {
    const status = await engine.syncNow();
    if (status.lastError === null && (await client.everythingSynced(db))) return attempt;
  }
  const outbox = await db.outbox.toArray();
  assert.fail(`${label}: still not synced after 6 attempts: ${engine.status().lastError}; outbox ${JSON.stringify(outbox.slice(0, 3).map((e) => [e.entity, e.status, e.lastError]))}`);
}

const rows = (statement, values) => stack.query(statement, values);

/** Every record exactly once, at the version its changes give it; files complete and verified; nothing lost or waiting on the tablet. */
async function checkEverything(label) {
  assert.equal(await db.outbox.count(), 0, `${label}: the outbox is empty`);
  for (const [entity, table] of Object.entries(TABLES)) {
    const expected = [...made].filter(([, r]) => r.entity === entity);
    const owned = entity === 'case' ? 'inspectorId = ?' : 'caseId IN (SELECT id FROM cases WHERE inspectorId = ?)';
    const server = new Map((await rows(`SELECT id, version, deletedAt IS NOT NULL FROM ${table} WHERE ${owned}`, [session.userId])).map(([id, version, deleted]) => [id, { version, deleted: Boolean(deleted) }]));
    assert.equal(server.size, expected.length, `${label}: ${table} holds ${server.size} rows, the tablet made ${expected.length}`);
    const local = await db[LOCAL[entity]].toArray();
    assert.equal(local.length, expected.length, `${label}: the tablet keeps ${local.length} ${entity} rows of ${expected.length}`);
    const localById = new Map(local.map((row) => [row.id, row]));
    for (const [id, record] of expected) {
      assert.deepEqual(server.get(id), { version: record.version, deleted: false }, `${label}: ${entity} ${id} on the server`);
      const row = localById.get(id);
      assert.ok(row, `${label}: ${entity} ${id} is still on the tablet`);
      assert.equal(row.sync, 'server', `${label}: ${entity} ${id} shows on server`);
      assert.equal(row.version, record.version, `${label}: ${entity} ${id} version on the tablet`);
    }
  }
  // Exactly once: each applied change raised a version by one, and nothing else was applied.
  const applied = new Map((await rows(`SELECT recordId, COUNT(*) FROM sync_changes WHERE status = 'applied' AND userId = ? GROUP BY recordId`, [session.userId])).map(([id, n]) => [id, Number(n)]));
  for (const [id, record] of made) assert.equal(applied.get(id), record.version, `${label}: ${record.entity} ${id} applied changes`);
  assert.equal(applied.size, made.size, `${label}: applied changes touched only the tablet's records`);
  assert.deepEqual(await rows(`SELECT status, reason FROM sync_changes WHERE status <> 'applied' AND userId = ? LIMIT 3`, [session.userId]), [], `${label}: no change was refused or in conflict`);
  for (const [id, sha, received, size, uploaded] of await rows('SELECT id, sha256, receivedBytes, size, uploadedAt IS NOT NULL AND storageKey IS NOT NULL FROM attachments WHERE caseId IN (SELECT id FROM cases WHERE inspectorId = ?)', [session.userId])) {
    assert.equal(sha, made.get(id).sha256, `${label}: attachment ${id} declared hash`);
    assert.equal(received, size, `${label}: attachment ${id} received every byte`);
    assert.equal(Number(uploaded), 1, `${label}: attachment ${id} stored and verified`);
  }
  for (const [id, record] of made) {
    if (record.check === undefined) continue;
    const row = await db[LOCAL[record.entity]].get(id);
    assert.equal(record.entity === 'case' ? row.data.weatherNotes : row.data.text, record.check, `${label}: ${record.entity} ${id} keeps what was written`);
  }
}

before(async () => {
  client = await loadClient();
  const ir = fixture('synthetic-ir-polystyrene-film.csv');
  const raman = fixture('synthetic-raman-ammonium-nitrate-785.csv');
  const irSettings = { ...client.DEFAULT_SCAN_SETTINGS, atr: false };
  const ramanSettings = { ...client.DEFAULT_SCAN_SETTINGS, technique: 'raman', atr: false, excitationNm: 785 };
  scanFiles = [
    { file: ir, settings: irSettings, outcome: outcomeFor(ir, irSettings) },
    { file: raman, settings: ramanSettings, outcome: outcomeFor(raman, ramanSettings) },
  ];
  stack = await startStack({ name: 'faults', offset: 950, count: 2 });
  [serving] = stack.apis;
  session = await signIn(stack.baseUrl, await newInspector(stack.baseUrl, 'faults'));
  db = await client.openDb(`sync-faults-${SEED}`);
  const api = client.createApiClient({ tokens: session.tokens, fetchFn: network });
  const sender = client.createByteSender(() => session.tokens.current().accessToken, network);
  // Retries come from the test ("sync again"), not from timers.
  engine = client.createSyncEngine({ db, api, sender, clientId: `faults-${SEED}`, schedule: () => () => undefined });
});

after(async () => {
  engine?.stop();
  await restarting.catch(() => undefined);
  await db?.delete();
  await stack?.close();
});

test(`every record exactly once through ${KILL_ROUNDS} API kills and ${LOST_ROUNDS} dropped answers (seed ${SEED})`, async () => {
  const plan = shuffled([...Array(KILL_ROUNDS).fill('kill'), ...Array(LOST_ROUNDS).fill('drop')], random);
  const seen = { push: 0, upload: 0, pull: 0, SIGKILL: 0, SIGTERM: 0, drop: 0, failedCycles: 0 };
  for (const [index, fault] of plan.entries()) {
    const round = index + 1;
    await recordWork(round);
    const planned = await plannedRequests();
    const kinds = Object.keys(planned).filter((kind) => planned[kind] > 0);
    const kind = pick(kinds);
    // SIGTERM shuts down gracefully: requests in flight, and often the rest of the cycle on kept-alive connections, still finish.
    const mode = fault === 'drop' ? 'drop' : pick(['SIGKILL', 'SIGKILL', 'SIGTERM']);
    // A push batch takes the server a while to apply: a kill up to 400 ms in lands inside it; a chunk is quicker.
    trap = { kind, nth: between(1, planned[kind]), mode, delayMs: between(0, kind === 'push' ? 400 : 40), fired: false };
    requests.push = requests.upload = requests.pull = 0;
    const label = `round ${round} (${mode} at ${kind} #${trap.nth} of ${planned[kind]}, +${trap.delayMs} ms)`;

    const first = await engine.syncNow();
    assert.ok(trap.fired, `${label}: the fault was reached`);
    if (first.lastError !== null) seen.failedCycles += 1;
    if (mode !== 'drop') {
      const killed = serving;
      await killed.exited();
      await restarting;
      serving = stack.apis.find((api) => api !== killed);
      restarting = killed.start();
      // Awaited before the next switch (and in after()); marked handled now so a failed start is reported there.
      restarting.catch(() => undefined);
    }
    trap = null;
    await syncUntilDone(label);
    await checkEverything(label);
    seen[kind] += 1;
    seen[mode] += 1;
  }
  // The stored files themselves, read back from object storage through the API.
  for (const [id, record] of made) {
    if (record.entity !== 'attachment') continue;
    const response = await fetch(`${serving.baseUrl}/api/attachments/${id}/content`, { headers: { Authorization: `Bearer ${session.tokens.current().accessToken}` } });
    assert.equal(response.status, 200, `attachment ${id} can be read back`);
    assert.equal(sha256(await response.arrayBuffer()), record.sha256, `attachment ${id} stored byte for byte`);
  }
  await restarting;
  const starts = stack.apis.reduce((sum, api) => sum + api.starts(), 0);
  console.log(`sync faults: ${plan.length} rounds, ${made.size} records; faults at push ${seen.push}, upload ${seen.upload}, pull ${seen.pull}; SIGKILL ${seen.SIGKILL}, SIGTERM ${seen.SIGTERM}, dropped answers ${seen.drop}; ${seen.failedCycles} cycles cut short; API processes started ${starts} times`);
  assert.equal(starts, KILL_ROUNDS + 2, 'each kill was followed by a new start of the killed process');
});
