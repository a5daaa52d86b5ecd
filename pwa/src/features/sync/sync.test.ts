import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import type { CaseData } from '../../db/casesTable';
import { createApiClient, type ApiClient } from '../api/client';
import { saveCase } from '../cases/saveCase';
import { addPhoto, setPhotoCaption } from '../photos/addPhoto';
import { heldBytes } from '../photos/attachmentBytes';
import { saveSample } from '../samples/saveSample';
import { mergePulled } from './mergePulled';
import { nextBatch, pushOutbox } from './pushOutbox';
import { resolveConflict } from './resolveConflict';
import { createSyncEngine } from './syncEngine';
import { everythingSynced } from './syncState';
import { createTestServer, type TestServer } from './testServer';
import { CHUNK_BYTES, PARALLEL_UPLOADS, type ByteSender } from './uploadAttachments';

let db: SitebandDb | undefined;
let count = 0;
afterEach(async () => {
  await db?.delete();
});

async function fresh(): Promise<SitebandDb> {
  db = await openDb(`sync-test-${++count}-${Date.now()}`);
  return db;
}

function caseData(over: Partial<CaseData> = {}): CaseData {
  return {
    siteName: 'Dockside shed 4', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-03-02T08:30:00.000Z', weatherNotes: null, accessNotes: null, status: 'open', ...over,
  };
}

function sampleData(caseId: string, label: string) {
  return { caseId, label, container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Inspector', collectedAt: '2026-03-02T09:00:00.000Z', sealNumber: null };
}

/** The real API client over the test server's fetch, with a fixed token. */
function clientFor(server: TestServer): ApiClient {
  const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
  return createApiClient({ tokens, fetchFn: server.fetch });
}

function senderFor(server: TestServer): ByteSender {
  return { put: (path, bytes, headers) => server.fetch(path, { method: 'PUT', body: bytes, headers }) };
}

describe('recording a change', () => {
  it('writes the record and its outbox entry together, and a failed transaction leaves neither', async () => {
    const d = await fresh();
    const id = crypto.randomUUID();
    await saveCase(d, id, caseData());
    expect((await d.cases.get(id))?.sync).toBe('local');
    const [entry] = await d.outbox.toArray();
    expect(entry).toMatchObject({ entity: 'case', id, op: 'upsert', status: 'pending', baseVersion: null });
    expect(entry.data).toMatchObject({ siteName: 'Dockside shed 4' });

    // A sample whose outbox write fails (duplicate changeId forced by a unique index) must not be stored either.
    const sampleId = crypto.randomUUID();
    const realUuid = crypto.randomUUID.bind(crypto);
    crypto.randomUUID = () => entry.changeId as ReturnType<typeof realUuid>;
    try {
      await expect(saveSample(d, sampleId, sampleData(id, 'S-1'))).rejects.toThrow();
    } finally {
      crypto.randomUUID = realUuid;
    }
    expect(await d.samples.get(sampleId)).toBeUndefined();
    expect(await d.outbox.count()).toBe(1);
  });

  it('folds an edit into the change not yet sent and refuses a case without a site name', async () => {
    const d = await fresh();
    const id = crypto.randomUUID();
    await saveCase(d, id, caseData());
    await saveCase(d, id, caseData({ siteName: 'Dockside shed 5' }));
    const entries = await d.outbox.toArray();
    expect(entries).toHaveLength(1);
    expect(entries[0].data.siteName).toBe('Dockside shed 5');
    await expect(saveCase(d, crypto.randomUUID(), caseData({ siteName: '  ' }))).rejects.toThrow(/siteName/);
    expect(await d.cases.count()).toBe(1);
  });
});

describe('pushing the outbox', () => {
  it('queues a status move as a change of its own, after the records made before it', async () => {
    const d = await fresh();
    // As on the server: only an open case takes samples.
    let caseStatus: unknown = null;
    const server = createTestServer({
      rejectIf: (change) => {
        if (change.entity === 'case') caseStatus = change.data?.status;
        return change.entity === 'sample' && caseStatus !== 'open' ? 'the case is not open' : undefined;
      },
    });
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    await saveSample(d, crypto.randomUUID(), sampleData(caseId, 'S-1'));
    await saveCase(d, caseId, caseData({ status: 'submitted' }));
    await saveCase(d, caseId, caseData({ status: 'submitted', weatherNotes: 'Drizzle' }));
    expect((await d.outbox.orderBy('seq').toArray()).map((e) => [e.entity, e.data.status ?? null])).toEqual([
      ['case', 'open'],
      ['sample', null],
      ['case', 'submitted'],
    ]);
    expect(await pushOutbox(d, clientFor(server), 'tablet-test')).toBe(3);
    expect(server.pushes.map((batch) => batch.map((c) => c.entity))).toEqual([['case', 'sample'], ['case']]);
    expect(server.pushes[1][0]).toMatchObject({ baseVersion: 1, data: { status: 'submitted', weatherNotes: 'Drizzle' } });
    expect(await d.outbox.count()).toBe(0);
    expect(await d.cases.get(caseId)).toMatchObject({ version: 2, sync: 'server' });
  });

  it('sends at most 200 changes per batch, parents first, and marks every record on server', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    for (let i = 0; i < 250; i += 1) await saveSample(d, crypto.randomUUID(), sampleData(caseId, `S-${i}`));
    expect(await pushOutbox(d, clientFor(server), 'tablet-test')).toBe(251);
    expect(server.pushes.map((b) => b.length)).toEqual([200, 51]);
    expect(server.pushes[0][0]).toMatchObject({ entity: 'case', id: caseId });
    expect(await d.outbox.count()).toBe(0);
    expect(new Set((await d.samples.toArray()).map((s) => s.sync))).toEqual(new Set(['server']));
    expect((await d.cases.get(caseId))?.version).toBe(1);
  }, 60_000);

  it('readies the next batch while the server works on one, and sends the batches one after the other', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    for (let i = 0; i < 250; i += 1) await saveSample(d, crypto.randomUUID(), sampleData(caseId, `S-${i}`));
    const sending = () => d.outbox.where('status').equals('sending').count();
    let inFlight = 0;
    let mostInFlight = 0;
    let sendingWhileFirstInFlight = -1;
    const fetchFn: typeof fetch = async (input, init) => {
      if (!String(input).startsWith('/api/sync/push')) return server.fetch(input, init);
      inFlight += 1;
      mostInFlight = Math.max(mostInFlight, inFlight);
      try {
        if (server.pushes.length === 0) {
          // The first answer is held (at most 5 s) until the tablet has readied the second batch beside it.
          for (let k = 0; k < 500 && (await sending()) < 251; k += 1) await new Promise((resolve) => setTimeout(resolve, 10));
          sendingWhileFirstInFlight = await sending();
        }
        return await server.fetch(input, init);
      } finally {
        inFlight -= 1;
      }
    };
    const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
    expect(await pushOutbox(d, createApiClient({ tokens, fetchFn }), 'tablet-test')).toBe(251);
    expect(sendingWhileFirstInFlight).toBe(251);
    expect(mostInFlight).toBe(1);
    expect(server.pushes.map((b) => b.length)).toEqual([200, 51]);
    expect(await d.outbox.count()).toBe(0);
  }, 60_000);

  it('readies no change beside a batch in flight that came after a waiting change of one of its records', async () => {
    const d = await fresh();
    const caseId = crypto.randomUUID();
    const [first, second] = [crypto.randomUUID(), crypto.randomUUID()];
    await saveCase(d, caseId, caseData());
    await saveSample(d, first, sampleData(caseId, 'S-1'));
    await saveCase(d, caseId, caseData({ status: 'submitted' }));
    await saveSample(d, second, sampleData(caseId, 'S-2'));
    const [opening] = await d.outbox.orderBy('seq').toArray();
    const inFlight = { records: new Set([`case:${caseId}`]), changeIds: new Set([opening.changeId]) };
    // S-2 came after the submit, which waits for the case's change in flight: it waits too.
    expect((await nextBatch(d, 200, inFlight)).map((e) => e.id)).toEqual([first]);
    expect((await nextBatch(d)).map((e) => e.id)).toEqual([caseId, first, second]);
  });

  it('re-sends the same changeIds after a lost answer, so the server writes each record once', async () => {
    const d = await fresh();
    const server = createTestServer();
    const api = clientFor(server);
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    await saveSample(d, crypto.randomUUID(), sampleData(caseId, 'S-1'));
    server.loseNextPushAnswer();
    await expect(pushOutbox(d, api, 'tablet-test')).rejects.toThrow(/No connection/);
    expect((await d.cases.get(caseId))?.sync).toBe('sending');
    const sentFirst = server.pushes[0].map((c) => c.changeId);

    await pushOutbox(d, api, 'tablet-test');
    expect(server.pushes[1].map((c) => c.changeId)).toEqual(sentFirst);
    expect([...server.writes.values()]).toEqual([1, 1]);
    expect(await d.outbox.count()).toBe(0);
    expect((await d.cases.get(caseId))?.sync).toBe('server');
  });

  it('keeps a rejected record with its reason and sends the next edit as a new change', async () => {
    const d = await fresh();
    const server = createTestServer({ rejectIf: (c) => (c.data?.label === 'bad' ? 'label must not be "bad"' : undefined) });
    const caseId = crypto.randomUUID();
    const sampleId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    await saveSample(d, sampleId, sampleData(caseId, 'bad'));
    await pushOutbox(d, clientFor(server), 'tablet-test');
    const sample = await d.samples.get(sampleId);
    expect(sample).toMatchObject({ sync: 'local', rejectedReason: 'label must not be "bad"' });
    expect(sample?.data.label).toBe('bad');
    expect(await everythingSynced(d)).toBe(false);

    await saveSample(d, sampleId, sampleData(caseId, 'S-1'));
    await pushOutbox(d, clientFor(server), 'tablet-test');
    const fixed = await d.samples.get(sampleId);
    expect(fixed).toMatchObject({ sync: 'server', version: 1 });
    expect(fixed?.rejectedReason).toBeUndefined();
    expect(await everythingSynced(d)).toBe(true);
  });

  it('splits a batch the server refuses as too large, rejects only the oversized change with the reason and sends the rest', async () => {
    const d = await fresh();
    const server = createTestServer({ maxPushChars: 20_000 });
    const caseId = crypto.randomUUID();
    const big = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    await saveSample(d, crypto.randomUUID(), sampleData(caseId, 'S-1'));
    await saveSample(d, big, { ...sampleData(caseId, 'S-2'), description: 'x'.repeat(30_000) });
    await saveSample(d, crypto.randomUUID(), sampleData(caseId, 'S-3'));
    expect(await pushOutbox(d, clientFor(server), 'tablet-test')).toBe(4);
    expect(server.writes.size).toBe(3);
    expect(server.records.has(big)).toBe(false);
    expect(await d.samples.get(big)).toMatchObject({ sync: 'local', rejectedReason: 'request entity too large' });
    expect((await d.samples.get(big))?.data.description).toHaveLength(30_000);
    expect((await d.outbox.toArray()).map((e) => [e.id, e.status])).toEqual([[big, 'rejected']]);
    expect(await everythingSynced(d)).toBe(false);
    // The whole batch, its second half, then the change alone; nothing more until the inspector changes it.
    expect(server.pushes.map((b) => b.length)).toEqual([4, 2, 2, 1, 1]);
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(server.pushes).toHaveLength(5);
  });

  it('stops when the answer leaves changes out, keeping them sending for a later cycle', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    await saveSample(d, crypto.randomUUID(), sampleData(caseId, 'S-1'));
    const dropLast: typeof fetch = async (input, init) => {
      const response = await server.fetch(input, init);
      const body = (await response.json()) as { results: unknown[] };
      return new Response(JSON.stringify({ results: body.results.slice(0, -1) }), { status: 200, headers: { 'Content-Type': 'application/json' } });
    };
    const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
    await expect(pushOutbox(d, createApiClient({ tokens, fetchFn: dropLast }), 'tablet-test')).rejects.toThrow('The server answered 1 of 2 changes');
    expect(server.pushes).toHaveLength(1);
    expect((await d.outbox.toArray()).map((e) => e.status)).toEqual(['sending']);
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(await everythingSynced(d)).toBe(true);
  });

  it('keeps a batch sending through a server fault (503) and re-sends it unchanged on the retry', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    server.answerNext(1, 503);
    const engine = createSyncEngine({ db: d, api: clientFor(server), sender: senderFor(server), clientId: 'tablet-test', schedule: () => () => undefined, backoff: { random: () => 0 } });
    expect(await engine.syncNow()).toMatchObject({ failures: 1, lastError: 'answered 503 for the test' });
    expect(await d.outbox.toArray()).toEqual([expect.objectContaining({ status: 'sending', lastError: 'answered 503 for the test' })]);
    expect(await engine.syncNow()).toMatchObject({ failures: 0, lastError: null });
    expect(server.writes.get(caseId)).toBe(1);
    expect(await everythingSynced(d)).toBe(true);
  });

  it('keeps both versions on a conflict; "keep mine" re-sends on the server version, "take the server\'s" adopts it', async () => {
    const d = await fresh();
    const server = createTestServer();
    const api = clientFor(server);
    const mine = crypto.randomUUID();
    const theirs = crypto.randomUUID();
    await saveCase(d, mine, caseData());
    await saveCase(d, theirs, caseData({ siteName: 'Yard B' }));
    await pushOutbox(d, api, 'tablet-test');
    server.writeAsOtherDevice('case', mine, caseData({ siteName: 'Renamed elsewhere' }));
    server.writeAsOtherDevice('case', theirs, caseData({ siteName: 'Yard B (gate 2)' }));
    await saveCase(d, mine, caseData({ siteName: 'Dockside shed 4, north door' }));
    await saveCase(d, theirs, caseData({ siteName: 'Yard B east' }));
    await pushOutbox(d, api, 'tablet-test');

    const conflicted = await d.cases.get(mine);
    expect(conflicted?.sync).toBe('conflict');
    expect(conflicted?.data.siteName).toBe('Dockside shed 4, north door');
    expect(conflicted?.conflictServer).toMatchObject({ version: 2, data: { siteName: 'Renamed elsewhere' } });

    await resolveConflict(d, 'case', mine, 'mine');
    await resolveConflict(d, 'case', theirs, 'server');
    const [next] = await nextBatch(d);
    await pushOutbox(d, api, 'tablet-test');
    expect(server.pushes.at(-1)).toEqual([expect.objectContaining({ id: mine, baseVersion: 2, changeId: next.changeId })]);
    expect(server.records.get(mine)?.record).toMatchObject({ version: 3, data: { siteName: 'Dockside shed 4, north door' } });
    const taken = await d.cases.get(theirs);
    expect(taken).toMatchObject({ sync: 'server', version: 2, data: { siteName: 'Yard B (gate 2)' } });
    // The server's own field is not taken over: a later push must not carry it.
    expect(taken?.data).not.toHaveProperty('inspectorId');
  });
});

describe('merging a pull', () => {
  it('stores server records, and turns a newer server version of a locally edited record into a conflict', async () => {
    const d = await fresh();
    const id = crypto.randomUUID();
    const record = { entity: 'case', id, version: 1, syncSeq: 5, deleted: false, createdAt: '', updatedAt: '', data: { ...caseData(), inspectorId: 'u-1' } };
    expect(await mergePulled(d, record)).toBe('stored');
    expect(await d.cases.get(id)).toMatchObject({ sync: 'server', version: 1 });
    expect(await mergePulled(d, record)).toBe('same');

    await saveCase(d, id, caseData({ weatherNotes: 'Rain' }));
    const newer = { ...record, version: 2, syncSeq: 9, data: { ...record.data, weatherNotes: 'Dry' } };
    expect(await mergePulled(d, newer)).toBe('conflict');
    const row = await d.cases.get(id);
    expect(row?.data.weatherNotes).toBe('Rain');
    expect(row).toMatchObject({ sync: 'conflict', conflictServer: { version: 2 } });
    expect(await mergePulled(d, { ...record, entity: 'review' })).toBe('skipped');
  });
});

describe('photos and the engine', () => {
  it('sends a caption edit as a change of the metadata only: the bytes are uploaded once', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    const bytes = new Uint8Array(5000).map((_, i) => (i * 13) % 251);
    const photoId = await addPhoto(d, { caseId, ownerType: 'case', ownerId: caseId }, { fileName: 'gate.jpg', contentType: 'image/jpeg', bytes: bytes.buffer, caption: '  Gate B, padlock cut \n' });
    const [added] = (await d.outbox.toArray()).filter((e) => e.id === photoId);
    expect(added.data).toMatchObject({ kind: 'photo', caption: 'Gate B, padlock cut', sha256: expect.stringMatching(/^[0-9a-f]{64}$/) });
    const sender = senderFor(server);
    let puts = 0;
    const counting: ByteSender = { put: (path, body, headers) => ((puts += 1), sender.put(path, body, headers)) };
    const engine = createSyncEngine({ db: d, api: clientFor(server), sender: counting, clientId: 'tablet-test', schedule: () => () => undefined, backoff: { random: () => 0 } });
    expect((await engine.syncNow()).failures).toBe(0);
    expect(puts).toBe(1);
    const uploaded = (await d.photos.get(photoId))!;
    expect(uploaded).toMatchObject({ sync: 'server', version: 1, uploadedAt: expect.any(String) });

    await setPhotoCaption(d, uploaded, 'Gate B, padlock cut; chain left on site');
    const [edit] = await d.outbox.toArray();
    expect(edit).toMatchObject({ entity: 'attachment', op: 'upsert', id: photoId, status: 'pending', data: { ...uploaded.data, caption: 'Gate B, padlock cut; chain left on site' } });
    const edited = (await d.photos.get(photoId))!;
    expect(edited).toMatchObject({ sync: 'local', uploadedAt: uploaded.uploadedAt, receivedBytes: uploaded.receivedBytes });
    expect(new Uint8Array((await heldBytes(d, photoId))!)).toEqual(bytes);
    expect((await engine.syncNow()).failures).toBe(0);
    expect(puts).toBe(1);
    expect(server.records.get(photoId)?.record).toMatchObject({ version: 2, data: { caption: 'Gate B, padlock cut; chain left on site', sha256: uploaded.data.sha256 } });
    expect(await everythingSynced(d)).toBe(true);

    // An empty caption is none; one too long is refused on the tablet with the reason, and nothing is queued.
    await setPhotoCaption(d, (await d.photos.get(photoId))!, '   ');
    expect((await d.photos.get(photoId))?.data.caption).toBeNull();
    await d.outbox.clear();
    await expect(setPhotoCaption(d, (await d.photos.get(photoId))!, 'x'.repeat(501))).rejects.toThrow('caption must be at most 500 characters; this one has 501');
    expect(await d.outbox.count()).toBe(0);
    expect((await d.photos.get(photoId))?.data.caption).toBeNull();
  }, 60_000);

  it('uploads photo bytes in chunks, resumes from the server offset, and the hash matches', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    const bytes = new Uint8Array(CHUNK_BYTES + 1000).map((_, i) => (i * 7) % 251);
    const photoId = await addPhoto(d, { caseId, ownerType: 'case', ownerId: caseId }, { fileName: 'door.jpg', contentType: 'image/jpeg', bytes: bytes.buffer });
    // The tablet believes it sent less than the server holds: the 409 answer leads to the status route.
    const sender = senderFor(server);
    let puts = 0;
    const flaky: ByteSender = {
      async put(path, body, headers) {
        puts += 1;
        if (puts === 2) throw new TypeError('Failed to fetch');
        return sender.put(path, body, headers);
      },
    };
    const engine = createSyncEngine({ db: d, api: clientFor(server), sender: flaky, clientId: 'tablet-test', schedule: () => () => undefined, backoff: { random: () => 0 } });
    expect((await engine.syncNow()).failures).toBe(1);
    expect((await d.photos.get(photoId))?.sync).toBe('sending');
    const status = await engine.syncNow();
    expect(status).toMatchObject({ failures: 0, lastError: null });
    expect(server.uploads.get(photoId)).toEqual(bytes);
    expect(await d.photos.get(photoId)).toMatchObject({ sync: 'server', uploadedAt: expect.any(String) });
    expect(await everythingSynced(d)).toBe(true);
  }, 60_000);

  it('keeps a file the server refuses with the reason, never re-sends it, and goes on with the others and the pull', async () => {
    const d = await fresh();
    const server = createTestServer({ maxFileBytes: 50_000 });
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    const owner = { caseId, ownerType: 'case' as const, ownerId: caseId };
    const large = await addPhoto(d, owner, { fileName: 'wide.jpg', contentType: 'image/jpeg', bytes: new Uint8Array(60_000).fill(7).buffer });
    const small = await addPhoto(d, owner, { fileName: 'door.jpg', contentType: 'image/jpeg', bytes: new Uint8Array(1_000).fill(9).buffer });
    let puts = 0;
    const sender = senderFor(server);
    const counting: ByteSender = { put: (path, body, headers) => ((puts += 1), sender.put(path, body, headers)) };
    const engine = createSyncEngine({ db: d, api: clientFor(server), sender: counting, clientId: 'tablet-test', schedule: () => () => undefined });
    expect(await engine.syncNow()).toMatchObject({ failures: 0, lastError: null });
    expect(await d.photos.get(small)).toMatchObject({ sync: 'server' });
    expect(await d.photos.get(large)).toMatchObject({ sync: 'local', uploadRefused: 'The file is larger than 50000 bytes', rejectedReason: 'The file is larger than 50000 bytes' });
    expect((await heldBytes(d, large))?.byteLength).toBe(60_000);
    expect(await d.syncMeta.get('pullCursor')).toBeDefined();
    expect(await everythingSynced(d)).toBe(false);
    const sent = puts;
    await engine.syncNow();
    expect(puts).toBe(sent);
  });

  it('sends a few files at once, never more than PARALLEL_UPLOADS, and every one arrives whole', async () => {
    const d = await fresh();
    const server = createTestServer();
    const caseId = crypto.randomUUID();
    await saveCase(d, caseId, caseData());
    const owner = { caseId, ownerType: 'case' as const, ownerId: caseId };
    const photos = new Map<string, Uint8Array>();
    for (let k = 0; k < PARALLEL_UPLOADS * 2 + 1; k += 1) {
      const bytes = new Uint8Array(2_000 + k).fill(k + 1);
      photos.set(await addPhoto(d, owner, { fileName: `bay-${k}.jpg`, contentType: 'image/jpeg', bytes: bytes.buffer }), bytes);
    }
    const sender = senderFor(server);
    let inFlight = 0;
    let most = 0;
    const counting: ByteSender = {
      async put(path, body, headers) {
        inFlight += 1;
        most = Math.max(most, inFlight);
        try {
          return await sender.put(path, body, headers);
        } finally {
          inFlight -= 1;
        }
      },
    };
    const engine = createSyncEngine({ db: d, api: clientFor(server), sender: counting, clientId: 'tablet-test', schedule: () => () => undefined });
    expect(await engine.syncNow()).toMatchObject({ failures: 0, lastError: null });
    expect(most).toBeGreaterThan(1);
    expect(most).toBeLessThanOrEqual(PARALLEL_UPLOADS);
    for (const [id, bytes] of photos) expect(server.uploads.get(id)).toEqual(bytes);
    expect(await everythingSynced(d)).toBe(true);
  });

  it('schedules a retry with backoff after a failed cycle', async () => {
    const d = await fresh();
    const server = createTestServer();
    await saveCase(d, crypto.randomUUID(), caseData());
    server.failNext(2);
    const delays: number[] = [];
    let retry: (() => void) | undefined;
    const engine = createSyncEngine({
      db: d, api: clientFor(server), sender: senderFor(server), clientId: 'tablet-test', now: () => 0,
      backoff: { random: () => 0 },
      schedule: (run, delay) => {
        delays.push(delay);
        retry = run;
        return () => undefined;
      },
    });
    await engine.syncNow();
    await engine.syncNow();
    expect(delays).toEqual([1000, 2000]);
    expect(engine.status()).toMatchObject({ failures: 2, retryAt: 2000 });
    retry?.();
    await engine.syncNow();
    expect(engine.status()).toMatchObject({ failures: 0, retryAt: null });
    expect(await everythingSynced(d)).toBe(true);
  });
});
