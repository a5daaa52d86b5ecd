import { randomBytes, randomUUID } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { PHOTO_CAPTION_MAX_LENGTH } from '@siteband/shared';
import { PHOTO_MAX_BYTES, RAW_SCAN_MAX_BYTES } from '../src/attachments/attachment-limits';
import { demo, pullAll, push, sha256, upsert, uploadWhole } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Attachment uploads (e2e, MariaDB + S3 fake)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;
  let supervisor: string;
  let caseId: string;
  let sampleId: string;
  let scanId: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
    caseId = randomUUID();
    sampleId = randomUUID();
    scanId = randomUUID();
    const results = await push(t, inspector, [
      upsert('case', caseId, demo.case()),
      upsert('sample', sampleId, demo.sample(caseId)),
      upsert('scan', scanId, demo.scan(sampleId)),
    ]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'applied', 'applied']);
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  /** Declares a photo of the sample through sync and returns its id. */
  async function declarePhoto(bytes: Buffer, overrides: Record<string, unknown> = {}): Promise<string> {
    const id = randomUUID();
    const [result] = await push(t, inspector, [upsert('attachment', id, demo.photo('sample', sampleId, bytes, overrides))]);
    expect(result.status).toBe('applied');
    return id;
  }

  const status = (id: string) => t.http().get(`/api/attachments/${id}/status`).set('Authorization', `Bearer ${inspector}`);
  const chunk = (id: string, bytes: Buffer, start: number, total: number, type = 'image/jpeg') =>
    t
      .http()
      .put(`/api/attachments/${id}/content`)
      .set('Authorization', `Bearer ${inspector}`)
      .set('Content-Type', type)
      .set('Content-Range', `bytes ${start}-${start + bytes.length - 1}/${total}`)
      .send(bytes);

  /** Sends the start of a chunk, then drops the connection, like a tablet losing its network mid-file. */
  async function sendAndDrop(id: string, file: Buffer, start: number, end: number): Promise<void> {
    const server = t.app.getHttpServer();
    if (!server.listening) await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    await new Promise<void>((resolve) => {
      const outgoing = httpRequest({
        host: '127.0.0.1',
        port,
        method: 'PUT',
        path: `/api/attachments/${id}/content`,
        headers: {
          Authorization: `Bearer ${inspector}`,
          'Content-Type': 'image/jpeg',
          'Content-Range': `bytes ${start}-${end}/${file.length}`,
          'Content-Length': String(end - start + 1),
        },
      });
      outgoing.on('error', () => resolve());
      outgoing.on('close', () => resolve());
      outgoing.write(file.subarray(start, start + Math.floor((end - start + 1) / 2)), () => setTimeout(() => outgoing.destroy(), 50));
    });
  }

  it('resumes an interrupted upload from the reported offset and verifies the whole file', async () => {
    const file = randomBytes(300_000);
    const id = await declarePhoto(file, { fileName: 'Bay 3 – Probe ä.jpg' });
    expect((await status(id).expect(200)).body).toEqual({ id, size: file.length, receivedBytes: 0, complete: false, sha256: sha256(file), uploadedAt: null });

    const first = await chunk(id, file.subarray(0, 100_000), 0, file.length).expect(200);
    expect(first.body).toMatchObject({ receivedBytes: 100_000, complete: false });

    // The next chunk dies half-way: nothing of it is kept.
    await sendAndDrop(id, file, 100_000, 199_999);
    expect((await status(id).expect(200)).body.receivedBytes).toBe(100_000);

    // A chunk from the wrong offset is refused with the offset to resume from.
    const wrong = await chunk(id, file.subarray(150_000, 200_000), 150_000, file.length).expect(409);
    expectErrorShape(wrong.body, 409, `/api/attachments/${id}/content`);
    expect(wrong.body.message).toContain('is at byte 100000');

    const offset = (await status(id)).body.receivedBytes as number;
    await chunk(id, file.subarray(offset, 200_000), offset, file.length).expect(200);
    const last = await chunk(id, file.subarray(200_000), 200_000, file.length).expect(200);
    expect(last.body).toMatchObject({ receivedBytes: file.length, complete: true, uploadedAt: expect.any(String) });

    // The last chunk sent again (its answer lost) is answered with the finished state.
    const again = await chunk(id, file.subarray(200_000), 200_000, file.length).expect(200);
    expect(again.body.complete).toBe(true);

    const download = await t.http().get(`/api/attachments/${id}/content`).set('Authorization', `Bearer ${supervisor}`).responseType('blob').expect(200);
    expect(download.headers['content-type']).toBe('image/jpeg');
    expect(download.headers['content-disposition']).toBe(`attachment; filename="Bay 3 _ Probe _.jpg"; filename*=UTF-8''Bay%203%20%E2%80%93%20Probe%20%C3%A4.jpg`);
    expect(sha256(download.body as Buffer)).toBe(sha256(file));
    const staging = await t.dataSource.query('SELECT storageKey FROM attachments WHERE id = ?', [id]);
    expect(staging[0].storageKey).toBe(`attachments/${caseId}/${id}`);
  });

  it('gives a finished upload the next sync sequence number, so the next pull carries it', async () => {
    const file = randomBytes(2_000);
    const id = await declarePhoto(file);
    const seqOf = async () => Number((await t.dataSource.query('SELECT syncSeq FROM attachments WHERE id = ?', [id]))[0].syncSeq);
    const declared = await seqOf();
    const [{ value: before }] = await t.dataSource.query('SELECT value FROM sync_counter');
    await uploadWhole(t, inspector, id, file, 'image/jpeg').expect(200);
    const [{ value: after }] = await t.dataSource.query('SELECT value FROM sync_counter');
    expect(Number(after)).toBe(Number(before) + 1);
    expect(await seqOf()).toBe(Number(after));
    const pulled = (await pullAll(t, inspector)).changes.find((record) => record.id === id);
    expect(pulled).toMatchObject({ syncSeq: Number(after), version: 1, data: { uploadedAt: expect.any(String) } });
    expect(declared).toBeLessThan(Number(after));
  });

  it('keeps nothing when the bytes do not match the declared SHA-256 (422), and accepts a clean retry', async () => {
    const file = randomBytes(4_000);
    const id = await declarePhoto(file);
    const tampered = Buffer.from(file);
    tampered[10] ^= 0xff;
    const response = await uploadWhole(t, inspector, id, tampered, 'image/jpeg').expect(422);
    expectErrorShape(response.body, 422, `/api/attachments/${id}/content`);
    expect(response.body.message).toBe(`The received file has SHA-256 ${sha256(tampered)}, not the declared ${sha256(file)}: nothing was kept; upload it again from byte 0`);
    expect((await status(id)).body).toMatchObject({ receivedBytes: 0, complete: false });
    await t.http().get(`/api/attachments/${id}/content`).set('Authorization', `Bearer ${inspector}`).expect(409);
    await uploadWhole(t, inspector, id, file, 'image/jpeg').expect(200);
  });

  it('refuses a file over its limit with 413 and a wrong type with 415, in the error shape', async () => {
    const file = randomBytes(1_000);
    const id = await declarePhoto(file);
    const tooBig = await chunk(id, file, 0, PHOTO_MAX_BYTES + 1).expect(413);
    expectErrorShape(tooBig.body, 413, `/api/attachments/${id}/content`);
    expect(tooBig.body.message).toBe(`photo attachments may have at most ${PHOTO_MAX_BYTES} bytes; this upload declares ${PHOTO_MAX_BYTES + 1}`);

    const longer = await uploadWhole(t, inspector, id, Buffer.concat([file, Buffer.alloc(10)]), 'image/jpeg').expect(413);
    expect(longer.body.message).toBe('The body has more than the 1000 bytes this range (or the declared size) allows');

    const wrongType = await uploadWhole(t, inspector, id, file, 'text/plain').expect(415);
    expectErrorShape(wrongType.body, 415, `/api/attachments/${id}/content`);
    expect(wrongType.body.message).toBe(`Attachment ${id} was declared as image/jpeg; this upload is "text/plain"`);
    expect((await status(id)).body.receivedBytes).toBe(0);

    // The declaration itself is checked against the same limits when it is pushed.
    const refused = await push(t, inspector, [
      upsert('attachment', randomUUID(), demo.photo('sample', sampleId, file, { size: PHOTO_MAX_BYTES + 1 })),
      upsert('attachment', randomUUID(), demo.photo('sample', sampleId, file, { contentType: 'image/gif' })),
      upsert('attachment', randomUUID(), { ...demo.photo('scan', scanId, file), kind: 'raw-scan', contentType: 'text/csv', size: RAW_SCAN_MAX_BYTES + 1 }),
    ]);
    expect(refused.map((result) => result.reason)).toEqual([
      `photo attachments may have at most ${PHOTO_MAX_BYTES} bytes (10 MB); this one declares ${PHOTO_MAX_BYTES + 1}`,
      'photo attachments must be one of image/jpeg, image/png, image/webp; got "image/gif"',
      `raw-scan attachments may have at most ${RAW_SCAN_MAX_BYTES} bytes (20 MB); this one declares ${RAW_SCAN_MAX_BYTES + 1}`,
    ]);
  });

  it('freezes the declared file once bytes have arrived, but allows renaming it', async () => {
    const file = randomBytes(2_000);
    const id = await declarePhoto(file);
    await chunk(id, file.subarray(0, 1_000), 0, file.length).expect(200);
    const [changed, renamed] = await push(t, inspector, [
      upsert('attachment', id, demo.photo('sample', sampleId, randomBytes(2_000)), 1),
      upsert('attachment', id, demo.photo('sample', sampleId, file, { fileName: 'bay3-close-up.jpg' }), 1),
    ]);
    expect(changed.reason).toBe('The file of this attachment is already being uploaded: kind, contentType, size and sha256 can no longer change');
    expect(renamed).toMatchObject({ status: 'applied', version: 2 });
  });

  it('hides attachments of other inspectors and answers unknown ids with 404', async () => {
    const admin = (await signIn(t, DEMO.admin)).accessToken;
    await t.http().post('/api/users').set('Authorization', `Bearer ${admin}`)
      .send({ email: 'third.inspector@demo.test', displayName: 'Third Inspector', role: 'inspector', password: 'third-inspector-pw' }).expect(201);
    const other = (await signIn(t, 'third.inspector@demo.test', 'third-inspector-pw')).accessToken;
    const file = randomBytes(500);
    const id = await declarePhoto(file);
    for (const call of [
      t.http().get(`/api/attachments/${id}/status`),
      t.http().get(`/api/attachments/${id}/content`),
      t.http().put(`/api/attachments/${id}/content`).set('Content-Type', 'image/jpeg').send(file),
    ]) {
      const response = await call.set('Authorization', `Bearer ${other}`).expect(404);
      expect(response.body.message).toBe(`No attachment with the id ${id} is visible to you`);
    }
    await status(randomUUID()).expect(404);
    await t.http().get('/api/attachments/not-a-uuid/status').set('Authorization', `Bearer ${inspector}`).expect(400);
  });

  describe('captions', () => {
    const stored = async (id: string) => (await t.dataSource.query('SELECT caption, uploadedAt, receivedBytes, version FROM attachments WHERE id = ?', [id]))[0];

    it('refuses a caption over the limit with the reason, and keeps the rest of the batch', async () => {
      const bytes = randomBytes(2000);
      const tooLong = randomUUID();
      const fine = randomUUID();
      const results = await push(t, inspector, [
        upsert('attachment', tooLong, demo.photo('sample', sampleId, bytes, { caption: 'x'.repeat(PHOTO_CAPTION_MAX_LENGTH + 1) })),
        upsert('attachment', fine, demo.photo('sample', sampleId, bytes, { caption: 'ü'.repeat(PHOTO_CAPTION_MAX_LENGTH) })),
        upsert('attachment', randomUUID(), demo.photo('sample', sampleId, bytes, { caption: 42 })),
      ]);
      expect(results.map((r) => r.status)).toEqual(['rejected', 'applied', 'rejected']);
      expect(results[0].reason).toContain(`caption must be at most ${PHOTO_CAPTION_MAX_LENGTH} characters; this one has ${PHOTO_CAPTION_MAX_LENGTH + 1}`);
      expect(results[2].reason).toContain('caption must be text');
      expect(await stored(tooLong)).toBeUndefined();
      expect((await stored(fine)).caption).toBe('ü'.repeat(PHOTO_CAPTION_MAX_LENGTH));
    });

    it('takes no caption on a raw scan file', async () => {
      const raw = Buffer.from('x,y\n1000,0.1\n1001,0.2\n');
      const [result] = await push(t, inspector, [
        upsert('attachment', randomUUID(), { ...demo.photo('scan', scanId, raw), kind: 'raw-scan', contentType: 'text/csv', fileName: 'scan.csv', caption: 'Spectrum of the drum' }),
      ]);
      expect(result).toMatchObject({ status: 'rejected', reason: 'Only photos take a caption; a raw scan file has none' });
    });

    it('edits the caption of an uploaded photo without touching its bytes, and pulls it to every reader', async () => {
      const bytes = randomBytes(5000);
      const id = randomUUID();
      const data = demo.photo('sample', sampleId, bytes, { fileName: 'drum-label.jpg' });
      const [created] = await push(t, inspector, [upsert('attachment', id, data)]);
      expect(created.status).toBe('applied');
      await uploadWhole(t, inspector, id, bytes, 'image/jpeg').expect(200);
      const before = await stored(id);
      expect(before.caption).toBeNull();

      const [edited] = await push(t, inspector, [upsert('attachment', id, { ...data, caption: '  Drum label, north wall: UN 1942 \n' }, before.version)]);
      expect(edited.status).toBe('applied');
      const after = await stored(id);
      expect(after.caption).toBe('Drum label, north wall: UN 1942');
      expect(after.uploadedAt).toEqual(before.uploadedAt);
      expect(after.receivedBytes).toBe(bytes.length);
      const status = await t.http().get(`/api/attachments/${id}/status`).set('Authorization', `Bearer ${inspector}`).expect(200);
      expect(status.body.complete).toBe(true);

      for (const token of [inspector, supervisor]) {
        const pulled = (await pullAll(t, token)).changes.find((c) => c.id === id);
        expect(pulled).toMatchObject({ version: after.version, data: { caption: 'Drum label, north wall: UN 1942', uploadedAt: expect.any(String) } });
      }

      // Clearing it (an empty caption) leaves none.
      const [cleared] = await push(t, inspector, [upsert('attachment', id, { ...data, caption: '   ' }, after.version)]);
      expect(cleared.status).toBe('applied');
      expect((await stored(id)).caption).toBeNull();
      const bundle = await t.http().get(`/api/review/cases/${caseId}`).set('Authorization', `Bearer ${supervisor}`).expect(200);
      expect(bundle.body.attachments.find((a: { id: string }) => a.id === id)).toMatchObject({ caption: null, fileName: 'drum-label.jpg' });
    });
  });
});
