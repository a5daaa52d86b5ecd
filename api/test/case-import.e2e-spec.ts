import { randomBytes, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildCaseArchive, DEFAULT_CASE_ARCHIVE_LIMITS, type ArchiveRecord, type CaseArchiveInput } from '@siteband/shared';
import { strFromU8, strToU8, unzipSync, zipSync, type Zippable } from 'fflate';
import { demo, pullAll, push, sha256, upsert } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

/** An invented field day: a case with a sample, hand-over, instrument check, an IR scan with its raw file, a photo, a note and an escalation. */
function fieldDay(inspector: { id: string; email: string; displayName: string }) {
  const ids = { case: randomUUID(), sample: randomUUID(), handover: randomUUID(), check: randomUUID(), scan: randomUUID(), raw: randomUUID(), photo: randomUUID(), note: randomUUID(), escalation: randomUUID() };
  const raw = readFileSync(join(__dirname, '../../fixtures/spectra/synthetic-ir-ethanol-liquid.csv'));
  const photo = randomBytes(3000);
  const record = (entity: ArchiveRecord['entity'], id: string, data: Record<string, unknown>): ArchiveRecord => ({ entity, id, version: null, pending: true, changeId: null, data });
  const input: CaseArchiveInput = {
    exportedAt: new Date('2026-11-30T17:00:00Z'),
    exportedBy: inspector,
    appVersion: '0.1.0',
    codeVersion: '1.1.0',
    caseId: ids.case,
    records: [
      record('case', ids.case, demo.case()),
      record('sample', ids.sample, demo.sample(ids.case)),
      record('handover', ids.handover, demo.handover(ids.sample)),
      record('instrumentCheck', ids.check, demo.instrumentCheck(ids.case)),
      record('scan', ids.scan, demo.scan(ids.sample, { technique: 'ir', excitationNm: null, instrumentCheckId: ids.check, rawAttachmentId: ids.raw, rawSha256: sha256(raw) })),
      record('attachment', ids.raw, { ownerType: 'scan', ownerId: ids.scan, kind: 'raw-scan', fileName: 'synthetic-ir-ethanol-liquid.csv', contentType: 'text/csv', size: raw.length, sha256: sha256(raw) }),
      record('attachment', ids.photo, demo.photo('sample', ids.sample, photo)),
      record('note', ids.note, demo.note(ids.case, ids.sample)),
      record('escalation', ids.escalation, { caseId: ids.case, scanId: ids.scan, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'Invented test escalation', hazardClasses: ['flammable'] }),
    ],
    files: new Map([
      [ids.raw, new Uint8Array(raw)],
      [ids.photo, new Uint8Array(photo)],
    ]),
  };
  return { ids, raw, photo, input };
}

describe('Case archive import (e2e, MariaDB + S3 fake)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: { accessToken: string; user: { id: string; email: string; displayName: string } };
  let supervisor: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    const { accessToken } = await signIn(t, DEMO.inspector);
    const me = await t.http().get('/api/me').set('Authorization', `Bearer ${accessToken}`).expect(200);
    inspector = { accessToken, user: { id: me.body.id, email: me.body.email, displayName: me.body.displayName } };
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  const send = (archive: Uint8Array | Buffer, token = inspector.accessToken, name = 'quay7-2026-11-30.zip') =>
    t.http().post('/api/cases/import').set('Authorization', `Bearer ${token}`).attach('file', Buffer.from(archive), { filename: name, contentType: 'application/zip' });

  const caseDetail = (id: string) => t.http().get(`/api/cases/${id}`).set('Authorization', `Bearer ${inspector.accessToken}`);

  it('imports a whole case with its files; the same archive again changes nothing', async () => {
    const { ids, raw, photo, input } = fieldDay(inspector.user);
    const archive = await buildCaseArchive(input);

    const first = await send(archive).expect(200);
    expect(first.body.caseId).toBe(ids.case);
    expect(first.body.records.map((r: { outcome: string }) => r.outcome)).toEqual(Array(9).fill('imported'));
    expect(first.body.records.map((r: { version: number }) => r.version)).toEqual(Array(9).fill(1));
    expect(first.body.files).toEqual([
      { attachmentId: ids.raw, outcome: 'stored' },
      { attachmentId: ids.photo, outcome: 'stored' },
    ]);

    const second = await send(archive).expect(200);
    expect(second.body.records.map((r: { outcome: string }) => r.outcome)).toEqual(Array(9).fill('unchanged'));
    expect(second.body.files.map((f: { outcome: string }) => f.outcome)).toEqual(['unchanged', 'unchanged']);

    // Every record once, at version 1 (nothing rewritten by the second import); the files byte-for-byte.
    const { changes } = await pullAll(t, inspector.accessToken);
    const mine = changes.filter((c) => (Object.values(ids) as string[]).includes(c.id));
    expect(mine).toHaveLength(9);
    expect(new Set(mine.map((c) => c.id)).size).toBe(9);
    expect(mine.every((c) => c.version === 1)).toBe(true);
    const rows = await t.dataSource.query('SELECT COUNT(*) AS n FROM samples WHERE id = ?', [ids.sample]);
    expect(Number(rows[0].n)).toBe(1);
    for (const [id, bytes] of [
      [ids.raw, raw],
      [ids.photo, photo],
    ] as const) {
      const content = await t.http().get(`/api/attachments/${id}/content`).set('Authorization', `Bearer ${inspector.accessToken}`).buffer(true).parse((res, done) => {
        const parts: Buffer[] = [];
        res.on('data', (part: Buffer) => parts.push(part));
        res.on('end', () => done(null, Buffer.concat(parts)));
      });
      expect(content.status).toBe(200);
      expect(sha256(content.body as Buffer)).toBe(sha256(bytes));
    }
    const detail = await caseDetail(ids.case).expect(200);
    expect(JSON.stringify(detail.body)).toContain(ids.escalation);
  });

  it('carries photo captions, and imports archives made before captions with none', async () => {
    const captioned = fieldDay(inspector.user);
    const photo = captioned.input.records.find((r) => r.id === captioned.ids.photo)!;
    photo.data = { ...photo.data, caption: 'Split sack, bay 3' };
    await send(await buildCaseArchive(captioned.input)).expect(200);
    // fieldDay's own photo record has no caption field, as every archive written before captions.
    const old = fieldDay(inspector.user);
    expect(Object.keys(old.input.records.find((r) => r.id === old.ids.photo)!.data)).not.toContain('caption');
    await send(await buildCaseArchive(old.input)).expect(200);
    const caption = async (id: string) => (await t.dataSource.query('SELECT caption FROM attachments WHERE id = ?', [id]))[0].caption;
    expect(await caption(captioned.ids.photo)).toBe('Split sack, bay 3');
    expect(await caption(old.ids.photo)).toBeNull();
  });

  it('applies a record under the tablet’s own changeId, so the tablet’s later sync of it is a duplicate', async () => {
    const { ids, input } = fieldDay(inspector.user);
    const caseChange = randomUUID();
    input.records = [{ ...input.records[0], changeId: caseChange }, ...input.records.slice(1)];
    await send(await buildCaseArchive(input)).expect(200);
    const [late] = await push(t, inspector.accessToken, [{ changeId: caseChange, entity: 'case', op: 'upsert', id: ids.case, baseVersion: null, data: demo.case() }]);
    expect(late).toMatchObject({ status: 'duplicate', firstStatus: 'applied', version: 1 });
  });

  it('leaves records the tablet had on the server as they are, and reports a conflict when the server moved on', async () => {
    const { ids, input } = fieldDay(inspector.user);
    await send(await buildCaseArchive(input)).expect(200);
    // Meanwhile the case is edited on the server (version 2); the archive was made from version 1 with an edit of its own.
    const [edit] = await push(t, inspector.accessToken, [upsert('case', ids.case, demo.case({ accessNotes: 'Gate C from now on' }), 1)]);
    expect(edit.status).toBe('applied');
    const later = fieldDay(inspector.user).input;
    later.caseId = ids.case;
    const synced = input.records.map((r) => ({ ...r, version: 1, pending: false }));
    later.records = [{ ...synced[0], pending: true, data: demo.case({ weatherNotes: 'Rain from noon' }) }, ...synced.slice(1)];
    later.files = input.files;
    const answer = await send(await buildCaseArchive(later)).expect(200);
    expect(answer.body.records[0]).toMatchObject({ entity: 'case', outcome: 'conflict', version: 2 });
    expect(answer.body.records[0].reason).toContain('version 2');
    expect(answer.body.records.slice(1).map((r: { outcome: string }) => r.outcome)).toEqual(Array(8).fill('unchanged'));
    const detail = await caseDetail(ids.case).expect(200);
    expect(JSON.stringify(detail.body)).toContain('Gate C from now on');
    expect(JSON.stringify(detail.body)).not.toContain('Rain from noon');
  });

  it('refuses a tampered file with 422 naming it, and writes nothing', async () => {
    const { ids, input } = fieldDay(inspector.user);
    const entries = unzipSync(await buildCaseArchive(input));
    entries[`files/${ids.photo}`] = entries[`files/${ids.photo}`].slice();
    entries[`files/${ids.photo}`][100] ^= 0xff;
    const response = await send(zipSync(entries as Zippable)).expect(422);
    expectErrorShape(response.body, 422, '/api/cases/import');
    expect(response.body.message).toContain(`files/${ids.photo}`);
    expect(response.body.message).toContain('SHA-256');
    await caseDetail(ids.case).expect(404);
    const rows = await t.dataSource.query('SELECT COUNT(*) AS n FROM sync_changes WHERE recordId = ?', [ids.case]);
    expect(Number(rows[0].n)).toBe(0);
  });

  it('refuses an unknown format version with 422, a file that is not a ZIP with 415, and no file with 400', async () => {
    const { input } = fieldDay(inspector.user);
    const entries = unzipSync(await buildCaseArchive(input));
    const manifest = JSON.parse(strFromU8(entries['manifest.json']));
    manifest.formatVersion = 99;
    entries['manifest.json'] = strToU8(JSON.stringify(manifest));
    const version = await send(zipSync(entries as Zippable)).expect(422);
    expect(version.body.message).toContain('formatVersion 99');
    const csv = await send(Buffer.from('siteName,address\nQuay 7,Breakwater Road\n'), inspector.accessToken, 'case.csv').expect(415);
    expectErrorShape(csv.body, 415, '/api/cases/import');
    const none = await t.http().post('/api/cases/import').set('Authorization', `Bearer ${inspector.accessToken}`).field('note', 'no file').expect(400);
    expect(none.body.message).toContain('file');
  });

  it('refuses an archive unpacking to more than the limits with 413 before inflating it (zip bomb)', async () => {
    const { ids, input } = fieldDay(inspector.user);
    const entries = unzipSync(await buildCaseArchive(input));
    entries[`files/${ids.photo}`] = new Uint8Array(DEFAULT_CASE_ARCHIVE_LIMITS.maxFileBytes + 1);
    const bomb = zipSync(entries as Zippable);
    expect(bomb.length).toBeLessThan(500_000);
    const response = await send(bomb).expect(413);
    expectErrorShape(response.body, 413, '/api/cases/import');
    expect(response.body.message).toContain(`files/${ids.photo}`);
    await caseDetail(ids.case).expect(404);
  });

  it('lets only inspectors import, and only their own archives', async () => {
    const { ids, input } = fieldDay(inspector.user);
    const archive = await buildCaseArchive(input);
    const asSupervisor = await send(archive, supervisor).expect(403);
    expectErrorShape(asSupervisor.body, 403, '/api/cases/import');
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    await t.http().post('/api/users').set('Authorization', `Bearer ${admin}`)
      .send({ email: 'second.inspector@demo.test', displayName: 'Second Inspector', role: 'inspector', password: 'second-inspector-pw' }).expect(201);
    const other = (await signIn(t, 'second.inspector@demo.test', 'second-inspector-pw')).accessToken;
    const asOther = await send(archive, other).expect(403);
    expect(asOther.body.message).toContain(inspector.user.email);
    await send(archive, admin).expect(403);
    await caseDetail(ids.case).expect(404);
  });
});
