import { randomBytes, randomUUID } from 'node:crypto';
import { demo, pullAll, push, remove, sha256, upsert } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

/** Deletes through sync, entity by entity: taken while the case is open, refused once submitted, never for permanent records. */
describe('Sync deletes per entity (e2e, MariaDB)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  const deletedAt = async (table: string, id: string) => (await t.dataSource.query(`SELECT deletedAt FROM \`${table}\` WHERE id = ?`, [id]))[0]?.deletedAt;

  /** An open case with a sample, a case note, a sample note, a photo of the sample and a scan with its raw file record. */
  async function visit() {
    const ids = { case: randomUUID(), sample: randomUUID(), caseNote: randomUUID(), sampleNote: randomUUID(), photo: randomUUID(), scan: randomUUID(), raw: randomUUID() };
    const raw = Buffer.from('##TITLE=invented demo scan\n##END=\n');
    const results = await push(t, inspector, [
      upsert('case', ids.case, demo.case()),
      upsert('sample', ids.sample, demo.sample(ids.case)),
      upsert('note', ids.caseNote, demo.note(ids.case)),
      upsert('note', ids.sampleNote, demo.note(ids.case, ids.sample)),
      upsert('attachment', ids.photo, demo.photo('sample', ids.sample, randomBytes(2000))),
      upsert('scan', ids.scan, demo.scan(ids.sample, { rawAttachmentId: ids.raw, rawSha256: sha256(raw) })),
      upsert('attachment', ids.raw, { ownerType: 'scan', ownerId: ids.scan, kind: 'raw-scan', fileName: 'S-01.jdx', contentType: 'chemical/x-jcamp-dx', size: raw.length, sha256: sha256(raw) }),
    ]);
    expect(results.map((r) => r.status)).toEqual(Array(7).fill('applied'));
    return ids;
  }

  it('deletes notes, photos, a scan, a sample and the emptied case of an open case, leaving tombstones others pull', async () => {
    const ids = await visit();
    const { cursor } = await pullAll(t, inspector);
    const first = await push(t, inspector, [remove('note', ids.caseNote, 1), remove('note', ids.sampleNote, 1), remove('attachment', ids.photo, 1), remove('scan', ids.scan, 1)]);
    expect(first.map((r) => [r.status, r.version])).toEqual([['applied', 2], ['applied', 2], ['applied', 2], ['applied', 2]]);
    expect(await deletedAt('site_notes', ids.caseNote)).toBeInstanceOf(Date);
    expect(await deletedAt('attachments', ids.photo)).toBeInstanceOf(Date);
    const [sample] = await push(t, inspector, [remove('sample', ids.sample, 1)]);
    expect(sample).toMatchObject({ status: 'applied', version: 2 });
    // The raw file is permanent and stays; it belongs to the case, which therefore stays too.
    const [keptCase] = await push(t, inspector, [remove('case', ids.case, 1)]);
    expect(keptCase).toMatchObject({ status: 'rejected', reason: `Case ${ids.case} cannot be deleted while it holds raw scan files: 1: delete those first (permanent records are never deleted)` });
    const after = await pullAll(t, inspector, cursor);
    expect(after.changes.map((c) => [c.entity, c.id, c.deleted]).sort()).toEqual(
      [['note', ids.caseNote, true], ['note', ids.sampleNote, true], ['attachment', ids.photo, true], ['scan', ids.scan, true], ['sample', ids.sample, true]].sort(),
    );

    const emptyCase = randomUUID();
    await push(t, inspector, [upsert('case', emptyCase, demo.case())]);
    const [gone] = await push(t, inspector, [remove('case', emptyCase, 1)]);
    expect(gone).toMatchObject({ status: 'applied', version: 2 });
    const [late] = await push(t, inspector, [upsert('note', randomUUID(), demo.note(emptyCase))]);
    expect(late).toMatchObject({ status: 'rejected', reason: `Case ${emptyCase} was deleted` });
  });

  it('refuses the delete of a record with live records below it, naming them', async () => {
    const ids = await visit();
    const [sample] = await push(t, inspector, [remove('sample', ids.sample, 1)]);
    expect(sample).toMatchObject({
      status: 'rejected',
      reason: `Sample ${ids.sample} cannot be deleted while it holds scans: 1, site notes: 1, photos: 1: delete those first (permanent records are never deleted)`,
    });
    expect(await deletedAt('samples', ids.sample)).toBeNull();
  });

  it('refuses every delete once the case is submitted, and takes them again after the inspector reopens it', async () => {
    const ids = await visit();
    const [submitted] = await push(t, inspector, [upsert('case', ids.case, demo.case({ status: 'submitted' }), 1)]);
    expect(submitted).toMatchObject({ status: 'applied', version: 2 });
    const refused = await push(t, inspector, [remove('note', ids.caseNote, 1), remove('attachment', ids.photo, 1), remove('scan', ids.scan, 1), remove('sample', ids.sample, 1), remove('case', ids.case, 2)]);
    const frozen = `Case ${ids.case} is submitted: reopen it before changing what belongs to it`;
    expect(refused.map((r) => [r.status, r.reason])).toEqual([
      ['rejected', frozen],
      ['rejected', frozen],
      ['rejected', frozen],
      ['rejected', frozen],
      ['rejected', `Case ${ids.case} is submitted: only an open case can be deleted`],
    ]);
    expect(await deletedAt('site_notes', ids.caseNote)).toBeNull();
    expect(await deletedAt('attachments', ids.photo)).toBeNull();

    await push(t, inspector, [upsert('case', ids.case, demo.case({ status: 'open' }), 2)]);
    const [note] = await push(t, inspector, [remove('note', ids.caseNote, 1)]);
    expect(note).toMatchObject({ status: 'applied', version: 2 });
  });

  it('never deletes permanent records: hand-overs, instrument checks, escalations and raw scan files', async () => {
    const ids = await visit();
    const handover = randomUUID();
    const check = randomUUID();
    const escalation = randomUUID();
    const made = await push(t, inspector, [
      upsert('handover', handover, demo.handover(ids.sample)),
      upsert('instrumentCheck', check, demo.instrumentCheck(ids.case)),
      upsert('escalation', escalation, { caseId: ids.case, scanId: ids.scan, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'Invented demo: likely oxidiser near fuel drums', hazardClasses: ['oxidiser'] }),
    ]);
    expect(made.map((r) => r.status)).toEqual(['applied', 'applied', 'applied']);
    const refused = await push(t, inspector, [remove('handover', handover, 1), remove('instrumentCheck', check, 1), remove('escalation', escalation, 1), remove('attachment', ids.raw, 1), remove('scan', ids.scan, 1)]);
    expect(refused.map((r) => [r.status, r.reason])).toEqual([
      ['rejected', 'Permanent record (hand-over): it cannot be deleted'],
      ['rejected', 'Permanent record (instrument check): it cannot be deleted'],
      ['rejected', 'Permanent record (escalation): it cannot be deleted'],
      ['rejected', 'A raw scan file is a permanent record: it cannot be deleted'],
      ['rejected', `Scan ${ids.scan} cannot be deleted while it holds escalations: 1: delete those first (permanent records are never deleted)`],
    ]);
    await push(t, inspector, [remove('note', ids.sampleNote, 1), remove('attachment', ids.photo, 1)]);
    const [sample] = await push(t, inspector, [remove('sample', ids.sample, 1)]);
    expect(sample.reason).toBe(`Sample ${ids.sample} cannot be deleted while it holds hand-overs: 1, scans: 1: delete those first (permanent records are never deleted)`);
    for (const [table, id] of [['handovers', handover], ['instrument_checks', check], ['escalations', escalation], ['attachments', ids.raw], ['scans', ids.scan]]) {
      expect(await deletedAt(table, id)).toBeNull();
    }
  });
});
