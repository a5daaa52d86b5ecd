import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { createApiClient, type ApiClient } from '../api/client';
import { saveCase } from '../cases/saveCase';
import { addNote, editNote } from '../notes/addNote';
import { addPhoto } from '../photos/addPhoto';
import { heldBytes } from '../photos/attachmentBytes';
import { addHandover, saveSample } from '../samples/saveSample';
import { mergePulled } from './mergePulled';
import { nextBatch, pushOutbox } from './pushOutbox';
import { PermanentRecordError, recordDelete } from './recordChange';
import { resolveConflict } from './resolveConflict';
import { everythingSynced } from './syncState';
import { createTestServer, type TestServer } from './testServer';
import { uploadAttachments, type ByteSender } from './uploadAttachments';

let db: SitebandDb | undefined;
let count = 0;
afterEach(async () => {
  await db?.delete();
});

async function fresh(): Promise<SitebandDb> {
  db = await openDb(`deletes-test-${++count}-${Date.now()}`);
  return db;
}

function clientFor(server: TestServer): ApiClient {
  const tokens = { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined };
  return createApiClient({ tokens, fetchFn: server.fetch });
}

/** An open case with one note (invented demo data), optionally synced to the server. */
async function caseWithNote(d: SitebandDb, server?: TestServer): Promise<{ caseId: string; noteId: string }> {
  const caseId = crypto.randomUUID();
  await saveCase(d, caseId, {
    siteName: 'Invented demo: tank farm 2', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-03-02T08:30:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  const noteId = await addNote(d, caseId, null, 'Drum 4 bulging', new Date('2026-03-02T09:00:00.000Z'));
  if (server) await pushOutbox(d, clientFor(server), 'tablet-test');
  return { caseId, noteId };
}

async function pull(d: SitebandDb, server: TestServer): Promise<void> {
  const { changes } = (await (await server.fetch('/api/sync/pull?cursor=0')).json()) as { changes: Parameters<typeof mergePulled>[1][] };
  for (const record of changes) await mergePulled(d, record);
}

describe('editing a record on the tablet', () => {
  it('queues an edited note as a whole-record upsert from the version the server confirmed', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { noteId } = await caseWithNote(d, server);
    const note = (await d.notes.get(noteId))!;
    await editNote(d, note, '  Drum 4 bulging, lid seam weeping  ');
    const [entry] = await d.outbox.toArray();
    expect(entry).toMatchObject({ entity: 'note', id: noteId, op: 'upsert', status: 'pending', data: { ...note.data, text: 'Drum 4 bulging, lid seam weeping' } });
    await expect(editNote(d, note, '   ')).rejects.toThrow('A site note needs some text');
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(server.pushes.at(-1)).toEqual([expect.objectContaining({ op: 'upsert', id: noteId, baseVersion: 1 })]);
    expect(server.records.get(noteId)?.record).toMatchObject({ version: 2, data: { text: 'Drum 4 bulging, lid seam weeping' } });
    expect(await d.notes.get(noteId)).toMatchObject({ version: 2, sync: 'server' });
  });
});

describe('deleting a record on the tablet', () => {
  it('drops a record the server never had at once, with its unsent change', async () => {
    const d = await fresh();
    const { noteId } = await caseWithNote(d);
    await recordDelete(d, 'note', noteId);
    expect(await d.notes.get(noteId)).toBeUndefined();
    expect((await d.outbox.toArray()).map((e) => e.entity)).toEqual(['case']);
  });

  it('keeps a synced record, hidden, until the server confirms its delete; the delete carries the base version and no data', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { noteId } = await caseWithNote(d, server);
    await recordDelete(d, 'note', noteId);
    expect(await d.notes.get(noteId)).toMatchObject({ deletePending: true, sync: 'local', version: 1 });
    expect(await d.outbox.toArray()).toEqual([expect.objectContaining({ entity: 'note', id: noteId, op: 'delete', status: 'pending' })]);
    expect(await everythingSynced(d)).toBe(false);

    server.failNext(1);
    await expect(pushOutbox(d, clientFor(server), 'tablet-test')).rejects.toThrow();
    expect(await d.notes.get(noteId)).toMatchObject({ deletePending: true, sync: 'sending' });

    await pushOutbox(d, clientFor(server), 'tablet-test');
    const sent = server.pushes.at(-1)!;
    expect(sent).toEqual([{ changeId: expect.any(String), entity: 'note', op: 'delete', id: noteId, baseVersion: 1 }]);
    expect(server.records.get(noteId)?.record).toMatchObject({ version: 2, deleted: true });
    expect(await d.notes.get(noteId)).toBeUndefined();
    expect(await everythingSynced(d)).toBe(true);
  });

  it('brings a refused delete back with the reason, and a new edit supersedes the refusal', async () => {
    const d = await fresh();
    const server = createTestServer({ rejectIf: (c) => (c.op === 'delete' ? 'Case is submitted: reopen it before changing what belongs to it' : undefined) });
    const { noteId } = await caseWithNote(d, server);
    await recordDelete(d, 'note', noteId);
    await pushOutbox(d, clientFor(server), 'tablet-test');
    const back = (await d.notes.get(noteId))!;
    expect(back.deletePending).toBeUndefined();
    expect(back.rejectedReason).toBe('Case is submitted: reopen it before changing what belongs to it');
    expect(server.records.get(noteId)?.record.deleted).toBe(false);
    await editNote(d, back, 'Drum 4 bulging; checked again');
    expect((await d.outbox.toArray()).map((e) => [e.op, e.status])).toEqual([['upsert', 'pending']]);
    expect((await d.notes.get(noteId))?.rejectedReason).toBeUndefined();
  });

  it('drops an unsent edit of the record it deletes, and queues the delete after a change in flight', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { noteId } = await caseWithNote(d, server);
    await editNote(d, (await d.notes.get(noteId))!, 'edited, never sent');
    await recordDelete(d, 'note', noteId);
    expect((await d.outbox.toArray()).map((e) => e.op)).toEqual(['delete']);

    // A change in flight (its answer lost) stays; the delete waits behind it and takes its version.
    const { noteId: second } = await caseWithNote(d, server);
    await editNote(d, (await d.notes.get(second))!, 'sent, answer lost');
    server.loseNextPushAnswer();
    await expect(pushOutbox(d, clientFor(server), 'tablet-test')).rejects.toThrow();
    await recordDelete(d, 'note', second);
    expect((await d.outbox.where('[entity+id]').equals(['note', second]).sortBy('seq')).map((e) => [e.op, e.status])).toEqual([['upsert', 'sending'], ['delete', 'pending']]);
    expect((await nextBatch(d)).filter((e) => e.id === second).map((e) => e.op)).toEqual(['upsert']);
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(server.records.get(second)?.record).toMatchObject({ version: 3, deleted: true });
    expect(server.records.get(noteId)?.record).toMatchObject({ version: 2, deleted: true });
    expect(await d.notes.count()).toBe(0);
    expect(await d.outbox.count()).toBe(0);
  });

  it('takes the tombstone of a pull as the confirmation of a delete whose answer was lost', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { noteId } = await caseWithNote(d, server);
    await recordDelete(d, 'note', noteId);
    server.loseNextPushAnswer();
    await expect(pushOutbox(d, clientFor(server), 'tablet-test')).rejects.toThrow();
    expect(await d.notes.get(noteId)).toMatchObject({ deletePending: true, sync: 'sending' });
    await pull(d, server);
    expect(await d.notes.get(noteId)).toBeUndefined();
    expect(await d.outbox.count()).toBe(0);
  });

  it('settles a conflict on a delete: "mine" deletes from the server version, "server" brings the record back', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { caseId, noteId } = await caseWithNote(d, server);
    const other = await addNote(d, caseId, null, 'Second note');
    await pushOutbox(d, clientFor(server), 'tablet-test');
    for (const id of [noteId, other]) {
      server.writeAsOtherDevice('note', id, { ...(await d.notes.get(id))!.data, text: 'changed elsewhere' });
      await recordDelete(d, 'note', id);
    }
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect((await d.notes.get(noteId))?.sync).toBe('conflict');
    await resolveConflict(d, 'note', noteId, 'mine');
    await resolveConflict(d, 'note', other, 'server');
    expect(await d.notes.get(other)).toMatchObject({ deletePending: undefined, version: 2, data: { text: 'changed elsewhere' } });
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(server.records.get(noteId)?.record).toMatchObject({ version: 3, deleted: true });
    expect(await d.notes.get(noteId)).toBeUndefined();
    expect(server.records.get(other)?.record.deleted).toBe(false);
  });

  it('never deletes permanent records and writes nothing when asked to', async () => {
    const d = await fresh();
    const { caseId } = await caseWithNote(d);
    const sampleId = crypto.randomUUID();
    await saveSample(d, sampleId, { caseId, label: 'S-1', container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Inspector', collectedAt: '2026-03-02T09:00:00.000Z', sealNumber: null });
    const handover = await addHandover(d, caseId, { sampleId, from: 'R. Inspector', to: 'Courier', at: '2026-03-02T10:00:00.000Z', sealNumber: null, note: null });
    const before = await d.outbox.count();
    await expect(recordDelete(d, 'handover', handover)).rejects.toBeInstanceOf(PermanentRecordError);
    expect(await d.handovers.get(handover)).toBeDefined();
    expect(await d.outbox.count()).toBe(before);
  });

  it('uploads no bytes of a photo being deleted, and the photo leaves only with the server’s confirmation', async () => {
    const d = await fresh();
    const server = createTestServer();
    const { caseId } = await caseWithNote(d, server);
    const photo = await addPhoto(d, { caseId, ownerType: 'case', ownerId: caseId }, { fileName: 'gate.jpg', contentType: 'image/jpeg', bytes: new Uint8Array([1, 2, 3, 4]).buffer });
    await pushOutbox(d, clientFor(server), 'tablet-test');
    await recordDelete(d, 'attachment', photo);
    const sender: ByteSender = { put: (path, bytes, headers) => server.fetch(path, { method: 'PUT', body: bytes, headers }) };
    await uploadAttachments(d, clientFor(server), sender);
    expect(server.uploads.has(photo)).toBe(false);
    expect((await d.photos.get(photo))?.deletePending).toBe(true);
    expect(await heldBytes(d, photo)).toBeDefined();
    await pushOutbox(d, clientFor(server), 'tablet-test');
    expect(await d.photos.get(photo)).toBeUndefined();
    expect(await heldBytes(d, photo), 'the file leaves with its record').toBeUndefined();
    expect(server.records.get(photo)?.record.deleted).toBe(true);
    expect(await everythingSynced(d)).toBe(true);
  });
});
