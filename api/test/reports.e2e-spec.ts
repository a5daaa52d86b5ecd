import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { identifySpectrum, importSpectrum, RAMAN_LASER_CAUTION, scanResultRecord } from '@siteband/shared';
import { convert } from 'jcampconverter';
import { entryHash } from '../src/audit/audit-hash';
import { REPORT_SECTIONS } from '../src/reports/case-report-document';
import { ScanRecomputeQueue } from '../src/scans/scan-recompute.queue';
import { demo, push, sha256, upsert, uploadWhole } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { addUser, DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

const RAMAN_FIXTURE = 'synthetic-raman-ammonium-nitrate-785.csv';
const IR_FIXTURE = 'synthetic-ir-ethanol-liquid.csv';
const fixture = (name: string) => readFileSync(join(__dirname, '..', '..', 'fixtures', 'spectra', name));

/** The fixture's points as written in the file (comment and header lines skipped), ascending. */
function pointsOf(bytes: Buffer): { x: number[]; y: number[] } {
  const rows = bytes
    .toString('utf8')
    .split('\n')
    .filter((line) => /^[\d.-]/.test(line))
    .map((line) => line.split(',').map(Number))
    .sort((a, b) => a[0] - b[0]);
  return { x: rows.map((row) => row[0]), y: rows.map((row) => row[1]) };
}

/** Reads any answer body as UTF-8 text (supertest only does so for text/* types). */
function asText(res: unknown, done: (error: Error | null, body: string) => void): void {
  const stream = res as NodeJS.ReadableStream;
  let text = '';
  stream.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
  stream.on('end', () => done(null, text));
}

/** The result a tablet stores for a raw file: the shared identification run on the device, in the sync form. */
function tabletResult(name: string, technique: 'ir' | 'raman', excitationNm?: number): Record<string, unknown> {
  const spectrum = importSpectrum(new Uint8Array(fixture(name)), { fileName: name, technique, ...(excitationNm ? { excitationNm } : {}) });
  const { processed, result } = identifySpectrum(spectrum, { process: { technique, phase: 'condensed' } });
  return scanResultRecord(result, processed);
}

describe('Scan export and case report (e2e, MariaDB + S3 fake)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let inspector: string;
  let otherInspector: string;
  let supervisor: string;
  let supervisorName: string;
  let safety: string;
  let admin: string;
  let caseId: string;
  let sampleId: string;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
    const supervisorSignIn = await signIn(t, DEMO.supervisor);
    supervisor = supervisorSignIn.accessToken;
    supervisorName = (await t.http().get('/api/me').set('Authorization', `Bearer ${supervisor}`).expect(200)).body.displayName;
    safety = (await signIn(t, DEMO.safety_officer)).accessToken;
    admin = (await signIn(t, DEMO.admin)).accessToken;
    otherInspector = (await addUser(t, admin, 'reports.other@demo.test', 'inspector')).accessToken;
    caseId = randomUUID();
    sampleId = randomUUID();
    const results = await push(t, inspector, [upsert('case', caseId, demo.case()), upsert('sample', sampleId, demo.sample(caseId))]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied']);
  });
  afterAll(async () => {
    await t?.app.get(ScanRecomputeQueue).idle();
    await t?.close();
    await s3?.close();
  });

  /** Pushes a scan with its raw file and uploads the bytes (unless `upload` is false); returns the scan id. */
  async function scanWithRaw(options: { name: string; bytes: Buffer; technique: 'ir' | 'raman'; contentType?: string; upload?: boolean; result?: Record<string, unknown> | null; sample?: string }) {
    const scanId = randomUUID();
    const rawId = randomUUID();
    const raman = options.technique === 'raman';
    const results = await push(t, inspector, [
      upsert('scan', scanId, demo.scan(options.sample ?? sampleId, {
        technique: options.technique, excitationNm: raman ? 785 : null, rawAttachmentId: rawId, rawSha256: sha256(options.bytes), result: options.result ?? null,
      })),
      upsert('attachment', rawId, {
        ownerType: 'scan', ownerId: scanId, kind: 'raw-scan', fileName: options.name, contentType: options.contentType ?? 'text/csv',
        size: options.bytes.length, sha256: sha256(options.bytes),
      }),
    ]);
    expect(results.map((r) => r.status)).toEqual(['applied', 'applied']);
    if (options.upload !== false) await uploadWhole(t, inspector, rawId, options.bytes, options.contentType ?? 'text/csv').expect(200);
    return scanId;
  }

  const jdx = (scanId: string, token: string) => t.http().get(`/api/scans/${scanId}/spectrum.jdx`).set('Authorization', `Bearer ${token}`);

  describe('GET /api/scans/:scanId/spectrum.jdx', () => {
    let ramanScan: string;
    beforeAll(async () => {
      ramanScan = await scanWithRaw({ name: RAMAN_FIXTURE, bytes: fixture(RAMAN_FIXTURE), technique: 'raman' });
    });

    it('writes the raw file as JCAMP-DX that jcampconverter reads back to the same points', async () => {
      const response = await jdx(ramanScan, inspector).buffer(true).parse(asText).expect(200);
      expect(response.headers['content-type']).toBe('chemical/x-jcamp-dx; charset=utf-8');
      expect(response.headers['content-disposition']).toContain(`scan-${ramanScan}.jdx`);
      const text = response.body as string;
      expect(text).toMatch(/##DATA TYPE=RAMAN SPECTRUM/);
      expect(text).toContain(`##$SITEBAND SCAN=${ramanScan}`);
      expect(text).not.toContain('SITEBAND RESAMPLED');

      const parsed = convert(text).flatten[0];
      const { x, y } = parsed.spectra[0].data as { x: number[]; y: number[] };
      const expected = pointsOf(fixture(RAMAN_FIXTURE));
      expect(x).toHaveLength(expected.x.length);
      const range = Math.max(...expected.y) - Math.min(...expected.y);
      x.forEach((value, i) => {
        expect(value).toBeCloseTo(expected.x[i], 6);
        expect(Math.abs(y[i] - expected.y[i])).toBeLessThan(1e-6 * range);
      });
    });

    it('resamples an uneven axis onto even spacing and says so', async () => {
      const lines = ['Wavenumber (cm-1),Absorbance'];
      for (let i = 0; i < 40; i++) lines.push(`${(600 + i * 10 + (i % 3 === 0 ? 1.5 : 0)).toFixed(1)},${(0.1 + 0.01 * i).toFixed(3)}`);
      const scanId = await scanWithRaw({ name: 'uneven.csv', bytes: Buffer.from(`${lines.join('\n')}\n`), technique: 'ir' });
      const response = await jdx(scanId, supervisor).buffer(true).parse(asText).expect(200);
      const text = response.body as string;
      expect(text).toMatch(/##\$SITEBAND RESAMPLED=linear interpolation of 40 points onto \d+ evenly spaced points/);
      const { x } = convert(text).flatten[0].spectra[0].data as { x: number[] };
      const steps = x.slice(1).map((value, i) => value - x[i]);
      for (const step of steps) expect(step).toBeCloseTo(steps[0], 6);
      expect(x[0]).toBeCloseTo(601.5, 6);
    });

    it('answers 404 without a raw file, 409 while uploading and 422 for an unreadable file', async () => {
      const bare = randomUUID();
      await push(t, inspector, [upsert('scan', bare, demo.scan(sampleId))]);
      const none = await jdx(bare, inspector).expect(404);
      expectErrorShape(none.body, 404, `/api/scans/${bare}/spectrum.jdx`);
      expect(none.body.message).toMatch(/no raw file/);

      const pending = await scanWithRaw({ name: IR_FIXTURE, bytes: fixture(IR_FIXTURE), technique: 'ir', upload: false });
      expect((await jdx(pending, inspector).expect(409)).body.message).toMatch(/not completely uploaded/);

      const garbage = await scanWithRaw({ name: 'notes.txt', bytes: Buffer.from('not a spectrum at all\njust words\n'), technique: 'ir', contentType: 'text/plain' });
      expect((await jdx(garbage, inspector).expect(422)).body.message).toMatch(/cannot be read/);
    });

    it('is for the readers of the case only', async () => {
      await jdx(ramanScan, safety).expect(200);
      const other = await jdx(ramanScan, otherInspector).expect(404);
      expectErrorShape(other.body, 404, `/api/scans/${ramanScan}/spectrum.jdx`);
      await jdx(ramanScan, admin).expect(403);
      await t.http().get(`/api/scans/${ramanScan}/spectrum.jdx`).expect(401);
      await jdx(randomUUID(), supervisor).expect(404);
      await jdx('not-a-uuid', supervisor).expect(400);
    });
  });

  describe('GET /api/cases/:caseId/report.pdf', () => {
    const reportCase: string = randomUUID();
    const reportSample = randomUUID();
    let scanId: string;
    const pdfText = async (token: string, id = reportCase): Promise<string> => {
      const response = await t.http().get(`/api/cases/${id}/report.pdf`).set('Authorization', `Bearer ${token}`).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      }).expect(200);
      expect(response.headers['content-type']).toBe('application/pdf');
      expect(response.headers['content-disposition']).toContain(`case-report-${id}.pdf`);
      const bytes = response.body as Buffer;
      expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      const dir = mkdtempSync(join(tmpdir(), 'siteband-report-'));
      try {
        writeFileSync(join(dir, 'report.pdf'), bytes);
        // Debian's poppler-utils; -raw keeps the text in content order.
        return execFileSync('pdftotext', ['-raw', join(dir, 'report.pdf'), '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    };

    beforeAll(async () => {
      const caseData = demo.case({ siteName: 'Berth 4 chemical store, Port Averin' });
      const handover = randomUUID();
      const results = await push(t, inspector, [
        upsert('case', reportCase, caseData),
        upsert('sample', reportSample, demo.sample(reportCase, { label: 'S-07', sealNumber: 'PA-000977' })),
        upsert('handover', handover, demo.handover(reportSample)),
        upsert('note', randomUUID(), demo.note(reportCase)),
        upsert('attachment', randomUUID(), demo.photo('sample', reportSample, Buffer.from('invented photo bytes'), { fileName: 'seal-close-up.jpg', caption: 'Seal PA-000977 intact before transport' })),
      ]);
      expect(results.map((r) => r.status)).toEqual(['applied', 'applied', 'applied', 'applied', 'applied']);
      scanId = await scanWithRaw({ name: RAMAN_FIXTURE, bytes: fixture(RAMAN_FIXTURE), technique: 'raman', sample: reportSample, result: tabletResult(RAMAN_FIXTURE, 'raman', 785) });
      const more = await push(t, inspector, [
        upsert('escalation', randomUUID(), { caseId: reportCase, scanId, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'Likely oxidiser stored beside diesel drums', hazardClasses: ['oxidising-solid'] }),
        upsert('case', reportCase, { ...caseData, status: 'submitted' }, 1),
      ]);
      expect(more.map((r) => r.status)).toEqual(['applied', 'applied']);
      await t.app.get(ScanRecomputeQueue).idle();
    });

    it('holds every section with the key values, the cautions and the spectrum plot, as extractable text', async () => {
      const bundle = (await t.http().get(`/api/review/cases/${reportCase}`).set('Authorization', `Bearer ${supervisor}`).expect(200)).body;
      const serverResult = bundle.scans[0].serverResult;
      expect(serverResult).toBeTruthy();
      const text = await pdfText(supervisor);
      let at = 0;
      for (const section of REPORT_SECTIONS) {
        const found = text.indexOf(` ${section} `, at);
        expect({ section, found: found >= 0 }).toEqual({ section, found: true });
        at = found;
      }
      for (const value of [
        'Case report: Berth 4 chemical store, Port Averin', '7 Breakwater Road, Port Averin', 'S-07', 'PA-000977', 'Courier M. Pell',
        'Sacks stacked against a warm wall', 'Raman shift (cm-1); red ticks: picked peaks', 'From the server recomputation from the raw file',
        serverResult.candidates[0].name, 'Explained peaks', 'Missing bands', 'Evidence against',
        'Identification is presumptive', 'Confirm by laboratory analysis', RAMAN_LASER_CAUTION.slice(0, 60),
        'Likely oxidiser stored beside diesel drums', 'Not signed off: the case is submitted.', 'audit entries verified intact',
        'Photos File Caption seal-close-up.jpg Seal PA-000977 intact before transport',
      ]) {
        expect({ value, found: text.includes(value) }).toEqual({ value, found: true });
      }
      // Assignments keep their mode labels in letters the report font has (nu for the Greek letter).
      expect(text).toMatch(/NO3- symmetric stretch \(nu1/);
      const firstPeak = serverResult.peaks.slice().sort((a: { relativeHeight: number }, b: { relativeHeight: number }) => b.relativeHeight - a.relativeHeight)[0];
      expect(text).toContain(firstPeak.x.toFixed(1));
    });

    it('shows the review decisions and the sign-off once the supervisor has decided', async () => {
      let version = (await t.http().get(`/api/review/cases/${reportCase}`).set('Authorization', `Bearer ${supervisor}`).expect(200)).body.case.version as number;
      const decide = (body: Record<string, unknown>) => t.http().post(`/api/review/cases/${reportCase}/decisions`).set('Authorization', `Bearer ${supervisor}`).send(body).expect(201);
      version = (await decide({ kind: 'needs_lab', scanId, comment: 'Send S-07 to the laboratory for confirmation', baseVersion: version })).body.case.version;
      await decide({ kind: 'sign_off', comment: 'Reviewed with the site photographs', baseVersion: version });
      const text = await pdfText(inspector);
      expect(text).toContain(`Signed off by ${supervisorName}`);
      expect(text).toContain('Needs laboratory confirmation');
      expect(text).toContain('Send S-07 to the laboratory for confirmation');
      expect(text).toContain('Reviewed with the site photographs');
    });

    it('is for the readers of the case only', async () => {
      await pdfText(safety);
      const other = await t.http().get(`/api/cases/${reportCase}/report.pdf`).set('Authorization', `Bearer ${otherInspector}`).expect(404);
      expectErrorShape(other.body, 404, `/api/cases/${reportCase}/report.pdf`);
      await t.http().get(`/api/cases/${reportCase}/report.pdf`).set('Authorization', `Bearer ${admin}`).expect(403);
      await t.http().get(`/api/cases/${reportCase}/report.pdf`).expect(401);
      await t.http().get(`/api/cases/${randomUUID()}/report.pdf`).set('Authorization', `Bearer ${supervisor}`).expect(404);
    });

    it('says where a plot is missing instead of failing', async () => {
      // The first case holds a scan without a raw file, one still uploading and an unreadable one.
      const text = await pdfText(supervisor, caseId);
      expect(text).toContain('No spectrum plot: Scan');
      expect(text).toContain('has no raw file on the server');
      expect(text).toContain('is not completely uploaded yet');
      expect(text).toContain('cannot be read');
    });

    describe("the audit summary vouches for the case's own entries (append-only triggers dropped, as by someone with DDL rights)", () => {
      type Row = Record<string, unknown> & { seq: string; caseId: string | null; after: string | null; hash: string };
      const rowsOf = async (ofCase: string): Promise<Row[]> => t.dataSource.query('SELECT * FROM audit_log WHERE caseId = ? ORDER BY seq', [ofCase]);
      const put = (seq: string, fields: Record<string, unknown>) =>
        t.dataSource.query(`UPDATE audit_log SET ${Object.keys(fields).map((name) => `\`${name}\` = ?`).join(', ')} WHERE seq = ?`, [...Object.values(fields), seq]);
      const changed = (row: Row) => JSON.stringify({ ...JSON.parse(row.after ?? '{}'), siteName: 'Nothing happened here' });
      const audited = async (ofCase: string) => {
        const text = await pdfText(supervisor, ofCase);
        return text.slice(text.lastIndexOf('Audit summary'));
      };

      beforeAll(async () => {
        await t.dataSource.query('DROP TRIGGER audit_log_no_update');
        await t.dataSource.query('DROP TRIGGER audit_log_no_delete');
      });

      it("reports a changed entry of this case, and not a changed entry of another case", async () => {
        const mine = await rowsOf(reportCase);
        const others = await rowsOf(caseId);
        expect(await audited(reportCase)).toContain(`This case's ${mine.length} audit entries verified intact`);

        const other = others[1];
        await put(other.seq, { after: changed(other) });
        expect(await audited(reportCase)).toContain(`This case's ${mine.length} audit entries verified intact`);
        expect(await audited(caseId)).toContain(`audit trail is BROKEN at entry ${other.seq}: content hash mismatch`);
        expect((await t.http().get('/api/audit/verify').set('Authorization', `Bearer ${admin}`).expect(200)).body.firstBroken.seq).toBe(Number(other.seq));
        await put(other.seq, { after: other.after });

        const target = mine[1];
        await put(target.seq, { after: changed(target) });
        expect(await audited(reportCase)).toContain(`audit trail is BROKEN at entry ${target.seq}: content hash mismatch`);
        await put(target.seq, { after: target.after });
        expect(await audited(reportCase)).toContain('verified intact');
      });

      it('reports an entry rehashed after a change by the link of the entry after it', async () => {
        const mine = await rowsOf(reportCase);
        const at = mine.findIndex((row, i) => i + 1 < mine.length && Number(mine[i + 1].seq) === Number(row.seq) + 1);
        expect(at).toBeGreaterThanOrEqual(0);
        const original = mine[at];
        const after = changed(original);
        await put(original.seq, { after, hash: entryHash({ ...original, seq: Number(original.seq), after } as never) });
        expect(await audited(reportCase)).toContain(`audit trail is BROKEN at entry ${mine[at + 1].seq}: prevHash mismatch`);
        await put(original.seq, { after: original.after, hash: original.hash });
        expect(await audited(reportCase)).toContain('verified intact');
      });
    });
  });
});
