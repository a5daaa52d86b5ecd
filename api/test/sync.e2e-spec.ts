import { randomBytes, randomUUID } from 'node:crypto';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { ScanRecomputeQueue } from '../src/scans/scan-recompute.queue';
import { ChangeApplier } from '../src/sync/change-applier';
import { createS3Client } from '../src/storage/object-storage.service';
import { demo, pullAll, push, remove, sha256, upsert, uploadWhole } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Sync push and pull (e2e, MariaDB + S3 fake)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;
  let otherInspector: string;
  let supervisor: string;
  let safety: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
    safety = (await signIn(t, DEMO.safety_officer)).accessToken;
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    await t
      .http()
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: 'second.inspector@demo.test', displayName: 'Second Inspector', role: 'inspector', password: 'second-inspector-pw' })
      .expect(201);
    otherInspector = (await signIn(t, 'second.inspector@demo.test', 'second-inspector-pw')).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  const count = async (table: string, where = '1 = 1', params: unknown[] = []) =>
    Number((await t.dataSource.query(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE ${where}`, params))[0].n);

  /** A fresh open case of the demo inspector, applied on the server. */
  async function openCase(overrides: Record<string, unknown> = {}): Promise<string> {
    const id = randomUUID();
    const [result] = await push(t, inspector, [upsert('case', id, demo.case(overrides))]);
    expect(result).toMatchObject({ status: 'applied', version: 1 });
    return id;
  }

  it('creates a whole site visit in one batch, uploads its files and pulls every record back', async () => {
    const ids = {
      case: randomUUID(), sample: randomUUID(), check: randomUUID(), scan: randomUUID(), raw: randomUUID(),
      photo1: randomUUID(), photo2: randomUUID(), note: randomUUID(), handover: randomUUID(), escalation: randomUUID(),
    };
    const photo1 = randomBytes(48_000);
    const photo2 = randomBytes(20_000);
    const raw = Buffer.from('##TITLE=demo raman scan\n##JCAMP-DX=4.24\n##XYDATA=(X++(Y..Y))\n200 10 11 12\n##END=\n');
    const sent: Record<string, [string, Record<string, unknown>]> = {
      case: ['case', demo.case()],
      sample: ['sample', demo.sample(ids.case)],
      check: ['instrumentCheck', demo.instrumentCheck(ids.case)],
      scan: ['scan', demo.scan(ids.sample, { instrumentCheckId: ids.check, rawAttachmentId: ids.raw, rawSha256: sha256(raw) })],
      raw: ['attachment', { ownerType: 'scan', ownerId: ids.scan, kind: 'raw-scan', fileName: 'S-01.jdx', contentType: 'chemical/x-jcamp-dx', size: raw.length, sha256: sha256(raw) }],
      photo1: ['attachment', demo.photo('sample', ids.sample, photo1)],
      photo2: ['attachment', demo.photo('case', ids.case, photo2, { fileName: 'gate.png', contentType: 'image/png' })],
      note: ['note', demo.note(ids.case, ids.sample)],
      handover: ['handover', demo.handover(ids.sample)],
      escalation: ['escalation', { caseId: ids.case, scanId: ids.scan, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'Likely oxidiser near fuel drums', hazardClasses: ['oxidiser'] }],
    };
    const changes = Object.entries(sent).map(([key, [entity, data]]) => upsert(entity, ids[key as keyof typeof ids], data));
    const results = await push(t, inspector, changes);
    expect(results.map((result) => [result.status, result.version])).toEqual(changes.map(() => ['applied', 1]));

    for (const [id, bytes, type] of [[ids.photo1, photo1, 'image/jpeg'], [ids.photo2, photo2, 'image/png'], [ids.raw, raw, 'chemical/x-jcamp-dx']] as const) {
      const uploaded = await uploadWhole(t, inspector, id, bytes, type).expect(200);
      expect(uploaded.body).toEqual({ id, size: bytes.length, receivedBytes: bytes.length, complete: true, sha256: sha256(bytes), uploadedAt: expect.any(String) });
    }

    const { changes: pulled } = await pullAll(t, inspector);
    const byId = new Map(pulled.map((record) => [record.id, record]));
    for (const [key, [entity, data]] of Object.entries(sent)) {
      const record = byId.get(ids[key as keyof typeof ids]);
      expect(record).toMatchObject({ entity, version: 1, deleted: false, data });
    }
    const me = (await t.http().get('/api/me').set('Authorization', `Bearer ${inspector}`)).body.id;
    expect(byId.get(ids.case)?.data).toMatchObject({ inspectorId: me, status: 'open' });
    expect(byId.get(ids.note)?.data).toMatchObject({ authorId: me, caseId: ids.case });
    expect(byId.get(ids.escalation)?.data).toMatchObject({ raisedBy: me, status: 'raised' });
    expect(byId.get(ids.scan)?.data).toMatchObject({ caseId: ids.case, serverResult: null, resultMismatch: null, serverRecomputedAt: null });
    expect(byId.get(ids.photo1)?.data).toMatchObject({ receivedBytes: photo1.length, uploadedAt: expect.any(String) });

    // Behind the API: one row each, and the stored objects hash to the declared values.
    expect(await count('cases', 'id = ?', [ids.case])).toBe(1);
    for (const table of ['samples', 'instrument_checks', 'scans', 'site_notes', 'handovers', 'escalations']) {
      expect(await count(table, 'caseId = ?', [ids.case])).toBe(1);
    }
    const stored: { id: string; storageKey: string; sha256: string }[] = await t.dataSource.query(
      'SELECT id, storageKey, sha256 FROM attachments WHERE caseId = ? ORDER BY id',
      [ids.case],
    );
    expect(stored).toHaveLength(3);
    const client = createS3Client(t.config.s3);
    for (const row of stored) {
      const object = await client.send(new GetObjectCommand({ Bucket: t.config.s3.bucket, Key: row.storageKey }));
      expect(sha256(Buffer.from(await object.Body!.transformToByteArray()))).toBe(row.sha256);
    }
    client.destroy();

    const detail = await t.http().get(`/api/cases/${ids.case}`).set('Authorization', `Bearer ${supervisor}`).expect(200);
    expect(detail.body.case).toMatchObject({ id: ids.case, siteName: 'Quay 7 drum store, Port Averin' });
    expect(detail.body.samples.map((row: { id: string }) => row.id)).toEqual([ids.sample]);
    expect(detail.body.attachments.map((row: { id: string }) => row.id).sort()).toEqual([ids.photo1, ids.photo2, ids.raw].sort());
    for (const key of ['handovers', 'instrumentChecks', 'scans', 'notes', 'escalations']) expect(detail.body[key]).toHaveLength(1);

    const supervisorSees = new Set((await pullAll(t, supervisor)).changes.map((record) => record.id));
    const safetySees = new Set((await pullAll(t, safety)).changes.map((record) => record.id));
    const otherSees = new Set((await pullAll(t, otherInspector)).changes.map((record) => record.id));
    for (const id of Object.values(ids)) {
      expect(supervisorSees.has(id)).toBe(true);
      expect(safetySees.has(id)).toBe(true);
      expect(otherSees.has(id)).toBe(false);
    }
    // The server recomputes the scan once the sync has been quiet; its write must not land in a later test's pulls.
    await t.app.get(ScanRecomputeQueue).idle();
  });

  it('answers a re-sent batch from the stored outcomes and changes nothing', async () => {
    const caseId = randomUUID();
    const sampleId = randomUUID();
    const changes = [upsert('case', caseId, demo.case()), upsert('sample', sampleId, demo.sample(caseId)), upsert('sample', randomUUID(), { label: '' })];
    const batchId = randomUUID();
    const first = await push(t, inspector, changes, batchId);
    expect(first.map((result) => result.status)).toEqual(['applied', 'applied', 'rejected']);
    const { cursor } = await pullAll(t, inspector);

    const second = await push(t, inspector, changes, batchId);
    expect(second.slice(0, 2)).toEqual([
      { changeId: changes[0].changeId, status: 'duplicate', firstStatus: 'applied', version: 1 },
      { changeId: changes[1].changeId, status: 'duplicate', firstStatus: 'applied', version: 1 },
    ]);
    expect(second[2]).toMatchObject({ status: 'duplicate', firstStatus: 'rejected', reason: first[2].reason });
    expect(await count('cases', 'id = ?', [caseId])).toBe(1);
    expect(await count('samples', 'caseId = ?', [caseId])).toBe(1);
    expect((await pullAll(t, inspector, cursor)).changes).toEqual([]);
  });

  it('applies a batch in order: a later change sees an earlier one, a repeated changeId is a duplicate, each write audited in order', async () => {
    const caseId = randomUUID();
    const sampleId = randomUUID();
    const [before] = await t.dataSource.query('SELECT lastSeq FROM audit_chain_head');
    const created = upsert('sample', sampleId, demo.sample(caseId));
    const edited = upsert('sample', sampleId, demo.sample(caseId, { description: 'Second look' }), 1);
    const stale = upsert('sample', sampleId, demo.sample(caseId, { description: 'From version 1 again' }), 1);
    const results = await push(t, inspector, [upsert('case', caseId, demo.case()), created, edited, created, stale]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'applied', 'applied', 'duplicate', 'conflict']);
    expect(results[2].version).toBe(2);
    expect(results[3]).toEqual({ changeId: created.changeId, status: 'duplicate', firstStatus: 'applied', version: 1 });
    expect(results[4].server).toMatchObject({ version: 2, data: { description: 'Second look' } });
    const [sample] = await t.dataSource.query('SELECT version, description FROM samples WHERE id = ?', [sampleId]);
    expect(sample).toEqual({ version: 2, description: 'Second look' });
    expect(await count('sync_changes', 'changeId IN (?)', [[created.changeId, edited.changeId, stale.changeId]])).toBe(3);

    const entries: { seq: string; entity: string; action: string }[] = await t.dataSource.query(
      'SELECT seq, entity, action FROM audit_log WHERE seq > ? AND (entityId = ? OR entityId = ?) ORDER BY seq',
      [before.lastSeq, caseId, sampleId],
    );
    expect(entries.map((entry) => `${entry.entity} ${entry.action}`)).toEqual(['case create', 'sample create', 'sample update']);
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    expect((await t.http().get('/api/audit/verify').set('Authorization', `Bearer ${admin}`).expect(200)).body).toMatchObject({ ok: true });
  });

  it('refuses a malformed batch as a whole with 400, naming what is wrong, and applies nothing', async () => {
    const caseId = randomUUID();
    const good = upsert('case', caseId, demo.case());
    const send = (body: Record<string, unknown>) => t.http().post('/api/sync/push').set('Authorization', `Bearer ${inspector}`).send(body).expect(400);
    const batch = { clientId: 'tablet-e2e', batchId: randomUUID() };
    expect((await send({ ...batch, changes: [] })).body.message).toContain('changes must contain at least 1 elements');
    expect((await send({ ...batch, changes: [good, 'case'] })).body.message).toContain('each value in changes must be an object');
    expect((await send({ ...batch, changes: Array(201).fill(good) })).body.message).toContain('changes must contain no more than 200 elements');
    expect((await send({ batchId: batch.batchId, changes: [good] })).body.message).toContain('clientId must be a string');
    expect((await send({ ...batch, batchId: 'b-1', changes: [good] })).body.message).toContain('batchId must be a UUID');
    expect((await send({ ...batch, changes: [good], extra: 1 })).body.message).toContain('property extra should not exist');
    expect(await count('cases', 'id = ?', [caseId])).toBe(0);
  });

  it('rejects only the invalid record of a batch, naming what is wrong', async () => {
    const caseId = await openCase();
    const good = upsert('note', randomUUID(), demo.note(caseId));
    const bad = upsert('sample', randomUUID(), { ...demo.sample(caseId), label: '', observations: { odour: 'sharp' } });
    const alsoGood = upsert('sample', randomUUID(), demo.sample(caseId, { label: 'S-02' }));
    const results = await push(t, inspector, [good, bad, alsoGood]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'rejected', 'applied']);
    expect(results[1].reason).toMatch(/^Invalid sample: /);
    expect(results[1].reason).toContain('label must be longer than or equal to 1 characters');
    expect(results[1].reason).toContain('observations.odour: property odour should not exist');
    expect(await count('samples', 'id = ?', [bad.id])).toBe(0);

    const envelope = await push(t, inspector, [{ ...upsert('case', randomUUID(), demo.case()), entity: 'spaceship' }, { changeId: 'nope' } as never]);
    expect(envelope[0]).toMatchObject({ status: 'rejected', reason: expect.stringContaining('entity must be one of case, sample') });
    expect(envelope[1]).toMatchObject({ changeId: 'nope', status: 'rejected', reason: expect.stringContaining('changeId must be a UUID') });
  });

  it('detects a conflict between two tablets editing the same version, and applies the resolution', async () => {
    const caseId = await openCase();
    const [fromA] = await push(t, inspector, [upsert('case', caseId, demo.case({ siteName: 'Quay 7 (tablet A)' }), 1)]);
    expect(fromA).toMatchObject({ status: 'applied', version: 2 });
    const [fromB] = await push(t, inspector, [upsert('case', caseId, demo.case({ weatherNotes: 'Rain from 10:00 (tablet B)' }), 1)]);
    expect(fromB.status).toBe('conflict');
    expect(fromB.server).toMatchObject({ entity: 'case', id: caseId, version: 2, deleted: false, data: { siteName: 'Quay 7 (tablet A)', weatherNotes: 'Dry, light onshore wind' } });
    const [row] = await t.dataSource.query('SELECT siteName, weatherNotes, version FROM cases WHERE id = ?', [caseId]);
    expect(row).toEqual({ siteName: 'Quay 7 (tablet A)', weatherNotes: 'Dry, light onshore wind', version: 2 });

    const merged = demo.case({ siteName: 'Quay 7 (tablet A)', weatherNotes: 'Rain from 10:00 (tablet B)' });
    const [resolution] = await push(t, inspector, [upsert('case', caseId, merged, fromB.server!.version)]);
    expect(resolution).toMatchObject({ status: 'applied', version: 3 });
    const pulled = (await pullAll(t, inspector)).changes.find((record) => record.id === caseId);
    expect(pulled).toMatchObject({ version: 3, data: merged });
  });

  it("rejects an inspector's changes to another inspector's case, and refuses pushes from readers", async () => {
    const caseId = await openCase();
    const results = await push(t, otherInspector, [
      upsert('sample', randomUUID(), demo.sample(caseId)),
      upsert('case', caseId, demo.case({ siteName: 'Taken over' }), 1),
      remove('case', caseId, 1),
    ]);
    for (const result of results) {
      expect(result).toMatchObject({ status: 'rejected', reason: `Case ${caseId} belongs to another inspector: only its own inspector can change it` });
      expect(result.server).toBeUndefined();
    }
    expect((await t.dataSource.query('SELECT siteName, deletedAt FROM cases WHERE id = ?', [caseId]))[0]).toEqual({ siteName: 'Quay 7 drum store, Port Averin', deletedAt: null });
    const other = await t.http().get(`/api/cases/${caseId}`).set('Authorization', `Bearer ${otherInspector}`).expect(404);
    expect(other.body.message).toBe(`No case with the id ${caseId} is visible to you`);
  });

  it('freezes a submitted case until the inspector reopens it, and keeps review statuses off the tablet', async () => {
    const caseId = await openCase();
    const [submitted] = await push(t, inspector, [upsert('case', caseId, demo.case({ status: 'submitted' }), 1)]);
    expect(submitted).toMatchObject({ status: 'applied', version: 2 });
    const [frozen] = await push(t, inspector, [upsert('sample', randomUUID(), demo.sample(caseId))]);
    expect(frozen).toMatchObject({ status: 'rejected', reason: `Case ${caseId} is submitted: reopen it before changing what belongs to it` });
    const [accepted] = await push(t, inspector, [upsert('case', caseId, demo.case({ status: 'accepted' }), 2)]);
    expect(accepted.reason).toContain('status must be open or submitted');
    const [reopened] = await push(t, inspector, [upsert('case', caseId, demo.case({ status: 'open' }), 2)]);
    expect(reopened).toMatchObject({ status: 'applied', version: 3 });
    await t.dataSource.query("UPDATE cases SET status = 'in_review' WHERE id = ?", [caseId]);
    const [inReview] = await push(t, inspector, [upsert('case', caseId, demo.case(), 3)]);
    expect(inReview.reason).toBe(`Case ${caseId} is in_review: it is with the supervisors and cannot be changed from the tablet`);
  });

  it('checks each change of a batch against its parents as the earlier changes of the batch left them', async () => {
    const caseId = await openCase();
    const [sampleId, scanId, rawId, photoId, lateSampleId] = [randomUUID(), randomUUID(), randomUUID(), randomUUID(), randomUUID()];
    const raw = Buffer.from('Wavenumber (cm-1),Absorbance\n1000,0.1\n1001,0.2\n');
    const rawFile = { ownerType: 'scan', ownerId: scanId, kind: 'raw-scan', fileName: 'S-01.csv', contentType: 'text/csv', size: raw.length, sha256: sha256(raw) };
    const results = await push(t, inspector, [
      upsert('sample', sampleId, demo.sample(caseId)),
      upsert('scan', scanId, demo.scan(sampleId)),
      // The scan as read for its photo, then changed to name a raw file: the raw file is checked against the change.
      upsert('attachment', photoId, demo.photo('scan', scanId, randomBytes(1_000))),
      upsert('scan', scanId, demo.scan(sampleId, { rawAttachmentId: rawId, rawSha256: sha256(Buffer.from('another file')) }), 1),
      upsert('attachment', rawId, rawFile),
      // The case as read for the sample, then submitted: a later sample sees it submitted.
      upsert('case', caseId, demo.case({ status: 'submitted' }), 1),
      upsert('sample', lateSampleId, demo.sample(caseId, { label: 'S-09' })),
    ]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'applied', 'applied', 'applied', 'rejected', 'applied', 'rejected']);
    expect(results[4].reason).toBe(`sha256 differs from the rawSha256 of scan ${scanId}`);
    expect(results[6].reason).toBe(`Case ${caseId} is submitted: reopen it before changing what belongs to it`);
    expect(await count('attachments', 'id = ?', [rawId])).toBe(0);
    expect(await count('samples', 'id = ?', [lateSampleId])).toBe(0);
  });

  it('rejects a change whose data names its parents by anything but a UUID, and applies the rest of the batch', async () => {
    const caseId = await openCase();
    const sampleId = randomUUID();
    const results = await push(t, inspector, [
      upsert('sample', sampleId, demo.sample(caseId)),
      upsert('scan', randomUUID(), demo.scan('S-01')),
      upsert('scan', randomUUID(), demo.scan(sampleId, { rawAttachmentId: 'raw-1', rawSha256: sha256(Buffer.from('x')) })),
      upsert('attachment', randomUUID(), demo.photo('scan', 'scan-7', randomBytes(100))),
      upsert('attachment', randomUUID(), demo.photo('sample', 42 as never, randomBytes(100))),
      upsert('scan', randomUUID(), demo.scan(sampleId)),
    ]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'rejected', 'rejected', 'rejected', 'rejected', 'applied']);
    expect(results[1].reason).toContain('sampleId must be a UUID');
    expect(results[2].reason).toContain('rawAttachmentId must be a UUID');
    expect(results[3].reason).toContain('ownerId must be a UUID');
  });

  it('counts the records a batch has just made below a record it is asked to delete', async () => {
    const caseId = await openCase();
    const sampleId = randomUUID();
    const results = await push(t, inspector, [
      upsert('sample', sampleId, demo.sample(caseId)),
      upsert('attachment', randomUUID(), demo.photo('sample', sampleId, randomBytes(1_000))),
      remove('sample', sampleId, 1),
    ]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'applied', 'rejected']);
    expect(results[2].reason).toContain('photo');
    expect((await t.dataSource.query('SELECT deletedAt FROM samples WHERE id = ?', [sampleId]))[0]).toEqual({ deletedAt: null });
  });

  it('stores a batch of new records too large for one statement to the database, every record once', async () => {
    const caseId = await openCase();
    const sampleId = randomUUID();
    // About 17 MB of scan results: more than MariaDB takes in one statement (max_allowed_packet, 16 MiB by default).
    const scans = Array.from({ length: 90 }, (_, n) =>
      upsert('scan', randomUUID(), demo.scan(sampleId, { result: { codeVersion: '0.1.0', libraryVersion: 'demo-1', parameters: {}, note: `${n} ${'x'.repeat(190_000)}` } })),
    );
    const me = (await t.http().get('/api/me').set('Authorization', `Bearer ${inspector}`)).body;
    const changes = [upsert('sample', sampleId, demo.sample(caseId)), ...scans].map((change) => ({ ...change }));
    const results = await t.app.get(ChangeApplier).applyBatch(changes, { clientId: 'e2e', batchId: randomUUID() }, me);
    expect(results.map((result) => result.status)).toEqual(Array(91).fill('applied'));
    const stored: { id: string; chars: number }[] = await t.dataSource.query('SELECT id, LENGTH(result) AS chars FROM scans WHERE sampleId = ?', [sampleId]);
    expect(stored.map((row) => row.id).sort()).toEqual(scans.map((scan) => scan.id).sort());
    for (const row of stored) expect(Number(row.chars)).toBeGreaterThan(190_000);
  });

  it('passes deletions on as tombstones and keeps hand-overs and instrument checks permanent', async () => {
    const caseId = await openCase();
    const sampleId = randomUUID();
    const noteId = randomUUID();
    const handoverId = randomUUID();
    await push(t, inspector, [upsert('sample', sampleId, demo.sample(caseId)), upsert('note', noteId, demo.note(caseId)), upsert('handover', handoverId, demo.handover(sampleId))]);
    const { cursor } = await pullAll(t, inspector);
    const results = await push(t, inspector, [
      remove('note', noteId, 1),
      remove('handover', handoverId, 1),
      upsert('handover', handoverId, { ...demo.handover(sampleId), to: 'Someone else' }, 1),
      upsert('scan', randomUUID(), demo.scan(sampleId, { technique: 'ir', excitationNm: 1064 })),
      upsert('scan', randomUUID(), demo.scan(sampleId, { excitationNm: undefined })),
      upsert('scan', randomUUID(), demo.scan(sampleId, { result: { codeVersion: '0.1.0', parameters: {} } })),
    ]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'rejected', 'rejected', 'rejected', 'rejected', 'rejected']);
    expect(results[1].reason).toBe('Permanent record (hand-over): it cannot be deleted');
    expect(results[2].reason).toBe('Permanent record (hand-over): it cannot be changed once sent');
    expect(results[3].reason).toBe('excitationNm is only for Raman scans; leave it out for IR');
    expect(results[4].reason).toContain('excitationNm (laser wavelength in nm) is required for a Raman scan');
    expect(results[5].reason).toContain('result needs libraryVersion');
    const after = await pullAll(t, inspector, cursor);
    expect(after.changes).toEqual([expect.objectContaining({ entity: 'note', id: noteId, version: 2, deleted: true })]);
    const detail = await t.http().get(`/api/cases/${caseId}`).set('Authorization', `Bearer ${inspector}`).expect(200);
    expect(detail.body.notes).toEqual([]);
    expect(detail.body.handovers).toHaveLength(1);
  });

  it('pages pulls in write order with a cursor that never repeats or skips', async () => {
    const caseId = await openCase();
    await push(t, inspector, Array.from({ length: 5 }, (_, i) => upsert('note', randomUUID(), { ...demo.note(caseId), text: `note ${i}` })));
    const seen: number[] = [];
    let cursor = '0';
    for (let page = 0; page < 1000; page++) {
      const response = await t.http().get('/api/sync/pull').query({ cursor, limit: 3 }).set('Authorization', `Bearer ${inspector}`).expect(200);
      expect(response.body.changes.length).toBeLessThanOrEqual(3);
      seen.push(...response.body.changes.map((record: { syncSeq: number }) => record.syncSeq));
      cursor = response.body.cursor;
      if (!response.body.hasMore) break;
    }
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
    expect(new Set(seen).size).toBe(seen.length);
    const [{ n }] = await t.dataSource.query('SELECT value AS n FROM sync_counter');
    expect(Number(cursor)).toBe(Number(n));
    const bad = await t.http().get('/api/sync/pull').query({ cursor: '-1' }).set('Authorization', `Bearer ${inspector}`).expect(400);
    expect(bad.body.message).toContain('cursor must be the cursor string of a previous pull');
  });
});
