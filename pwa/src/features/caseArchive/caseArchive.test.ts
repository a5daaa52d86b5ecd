import { readCaseArchive } from '@siteband/shared';
import { unzipSync, zipSync, type Zippable } from 'fflate';
import { afterEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { saveCase } from '../cases/saveCase';
import { addPhoto } from '../photos/addPhoto';
import { heldBytes } from '../photos/attachmentBytes';
import { saveSample } from '../samples/saveSample';
import { exportCaseArchive, archiveFileName } from './exportCaseArchive';
import { importCaseArchive } from './importCaseArchive';

const dbs: SitebandDb[] = [];
let count = 0;
afterEach(async () => {
  await Promise.all(dbs.splice(0).map((db) => db.delete()));
});
async function fresh(): Promise<SitebandDb> {
  const db = await openDb(`case-archive-test-${++count}-${Date.now()}`);
  dbs.push(db);
  return db;
}

// Invented demo people and site.
const inspector = { id: '7c1e0f3a-5b2d-4e6f-8a9b-0c1d2e3f4a5b', email: 'inspector@demo.test', displayName: 'Demo Inspector' };
const caseId = '8d2f1a4b-6c3e-4f7a-9b0c-1d2e3f4a5b6c';
const sampleId = '9e3a2b5c-7d4f-4a8b-8c1d-2e3f4a5b6c7d';
const photoBytes = Uint8Array.from({ length: 2048 }, (_, i) => (i * 31) % 256).buffer;

async function fieldDay(db: SitebandDb): Promise<string> {
  await saveCase(db, caseId, {
    siteName: 'Quay 7 drum store', address: null, latitude: null, longitude: null, locationAccuracyM: null,
    locationEnteredByHand: false, startedAt: '2026-11-30T08:15:00.000Z', weatherNotes: null, accessNotes: null, status: 'open',
  });
  await saveSample(db, sampleId, { caseId, label: 'S-01', container: null, description: null, locationOnSite: null, observations: {}, collectedBy: 'R. Ashdown', collectedAt: '2026-11-30T08:40:00.000Z', sealNumber: null });
  return addPhoto(db, { caseId, ownerType: 'sample', ownerId: sampleId }, { fileName: 'bay3.jpg', contentType: 'image/jpeg', bytes: photoBytes, caption: 'Split sack, bay 3' });
}

describe('case archives on the tablet', () => {
  it('names the file after the site and the day', () => {
    expect(archiveFileName('Quay 7 — Drum Störe!', new Date('2026-11-30T23:00:00Z'))).toBe('quay-7-drum-store-2026-11-30.zip');
    expect(archiveFileName('***', new Date('2026-11-30T10:00:00Z'))).toBe('case-2026-11-30.zip');
  });

  it('exports a case offline and imports it on another tablet with the same ids, changes and bytes; a second import adds nothing', async () => {
    const a = await fresh();
    const photoId = await fieldDay(a);
    const exported = await exportCaseArchive(a, caseId, inspector, new Date('2026-11-30T17:00:00Z'));
    expect(exported.fileName).toBe('quay-7-drum-store-2026-11-30.zip');
    const { manifest } = await readCaseArchive(exported.bytes);
    expect(manifest.records.map((r) => r.entity)).toEqual(['case', 'sample', 'attachment']);
    // The unsent changes were fixed for delivery: each travels with its changeId, and a later edit gets a change of its own.
    const sent = await a.outbox.toArray();
    expect(sent.map((e) => e.status)).toEqual(['sending', 'sending', 'sending']);
    expect(manifest.records.map((r) => r.changeId)).toEqual(sent.map((e) => e.changeId));

    const b = await fresh();
    const first = await importCaseArchive(b, exported.bytes, inspector.id);
    expect(first).toMatchObject({ ok: true, caseId, siteName: 'Quay 7 drum store', files: 1 });
    expect(first.ok && first.records.map((r) => r.outcome)).toEqual(['imported', 'imported', 'imported']);
    expect((await b.outbox.toArray()).map((e) => e.changeId)).toEqual(sent.map((e) => e.changeId));
    expect((await b.samples.get(sampleId))?.data).toEqual((await a.samples.get(sampleId))?.data);
    expect((await b.photos.get(photoId))?.data).toMatchObject({ caption: 'Split sack, bay 3' });
    const photo = await b.photos.get(photoId);
    expect(photo?.bytesHeld).toBe(true);
    expect(new Uint8Array((await heldBytes(b, photoId))!)).toEqual(new Uint8Array(photoBytes));
    expect(photo?.data.sha256).toBe((await a.photos.get(photoId))?.data.sha256);

    const again = await importCaseArchive(b, exported.bytes, inspector.id);
    expect(again.ok && again.records.map((r) => r.outcome)).toEqual(['unchanged', 'unchanged', 'unchanged']);
    expect(await b.outbox.count()).toBe(3);
    expect(await b.samples.count()).toBe(1);
    // Once the server confirmed them (version 1), the file's unconfirmed copies are still the same records.
    await b.samples.update(sampleId, { version: 1 });
    const confirmed = await importCaseArchive(b, exported.bytes, inspector.id);
    expect(confirmed.ok && confirmed.records[1].outcome).toBe('unchanged');
  });

  it('keeps the tablet’s own copy of a record that differs from the file', async () => {
    const a = await fresh();
    await fieldDay(a);
    const exported = await exportCaseArchive(a, caseId, inspector);
    const b = await fresh();
    await importCaseArchive(b, exported.bytes, inspector.id);
    const sample = (await b.samples.get(sampleId))!;
    await saveSample(b, sampleId, { ...sample.data, label: 'S-01 relabelled' });
    const again = await importCaseArchive(b, exported.bytes, inspector.id);
    expect(again.ok && again.records.map((r) => r.outcome)).toEqual(['unchanged', 'keptLocal', 'unchanged']);
    expect((await b.samples.get(sampleId))?.data.label).toBe('S-01 relabelled');
  });

  it('refuses another inspector’s archive and a tampered one, adding nothing', async () => {
    const a = await fresh();
    const photoId = await fieldDay(a);
    const exported = await exportCaseArchive(a, caseId, inspector);
    const b = await fresh();
    const other = await importCaseArchive(b, exported.bytes, '0f0e0d0c-0b0a-4908-8706-050403020100');
    expect(other).toEqual({ ok: false, reason: expect.stringContaining('inspector@demo.test') });
    const entries = unzipSync(exported.bytes);
    entries[`files/${photoId}`] = entries[`files/${photoId}`].slice();
    entries[`files/${photoId}`][5] ^= 1;
    const tampered = await importCaseArchive(b, zipSync(entries as Zippable), inspector.id);
    expect(tampered).toEqual({ ok: false, reason: expect.stringContaining(`files/${photoId}`) });
    expect(await b.cases.count()).toBe(0);
    expect(await b.outbox.count()).toBe(0);
  });
});
