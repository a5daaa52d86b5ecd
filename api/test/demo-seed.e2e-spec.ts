import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { REPO_ROOT } from '../src/config/paths';
import { demoId, seedDemoCases } from '../src/database/demo-cases.seeder';
import { DEMO_CASES } from '../src/database/seed-data';
import { pullAll } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Demo cases seed (e2e)', () => {
  let s3: S3Fake;
  let t: TestApp;
  let supervisor: string;
  let inspector: string;
  let firstRun: Awaited<ReturnType<typeof seedDemoCases>>;

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    firstRun = await seedDemoCases(t.app);
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
    inspector = (await signIn(t, DEMO.inspector)).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  const counts = async () => {
    const tables = ['cases', 'samples', 'handovers', 'scans', 'attachments', 'site_notes', 'escalations', 'review_decisions', 'audit_log', 'sync_changes'];
    const found: Record<string, number> = {};
    for (const table of tables) found[table] = Number((await t.dataSource.query(`SELECT COUNT(*) AS n FROM \`${table}\``))[0].n);
    return found;
  };

  it('seeds a case at every stage of review, and the escalated one', async () => {
    expect(firstRun.created).toHaveLength(DEMO_CASES.length);
    const queue = await t.http().get('/api/review/queue').query({ pageSize: 100, sort: 'siteName' }).set('Authorization', `Bearer ${supervisor}`).expect(200);
    const bySite = new Map(queue.body.items.map((item: { siteName: string }) => [item.siteName, item]));
    expect(queue.body.total).toBe(DEMO_CASES.length);
    const statusOf = (key: string) => (bySite.get(DEMO_CASES.find((demo) => demo.key === key)!.siteName) as { status: string }).status;
    expect(statusOf('ferry-terminal-jerrycan')).toBe('submitted');
    expect(statusOf('estate-packaging-sheet')).toBe('in_review');
    expect(statusOf('docks-warehouse-drum')).toBe('returned');
    expect(statusOf('quay-four-bonded-store')).toBe('accepted');
    const escalated = bySite.get(DEMO_CASES.find((demo) => demo.key === 'rail-sidings-sacks')!.siteName) as Record<string, unknown>;
    expect(escalated).toMatchObject({ status: 'submitted', openEscalations: 1, highestHazard: { rank: 3, label: 'escalation' }, likelyCompounds: [{ id: 'ammonium-nitrate', name: 'Ammonium nitrate' }] });
    for (const item of queue.body.items) expect(item.siteName).toContain('(demo)');
  });

  it('stores each raw file with its hash, and the server recomputation agrees with the tablet result', async () => {
    for (const demo of DEMO_CASES) {
      const bundle = await t.http().get(`/api/review/cases/${demoId(`${demo.key}/case`)}`).set('Authorization', `Bearer ${supervisor}`).expect(200);
      expect(bundle.body.scans).toHaveLength(demo.scans.length);
      for (const scan of bundle.body.scans) {
        expect(scan).toMatchObject({ resultMismatch: false, serverRecomputeError: null, serverResult: expect.any(Object) });
        expect(scan.serverResult.candidates[0].id).toBe(scan.result.candidates[0].id);
        const index = demo.scans.findIndex((_, i) => demoId(`${demo.key}/raw-${i}`) === scan.rawAttachmentId);
        const file = demo.scans[index].file;
        const bytes = readFileSync(join(REPO_ROOT, 'fixtures', 'spectra', file));
        const raw = await t.http().get(`/api/attachments/${scan.rawAttachmentId}/content`).set('Authorization', `Bearer ${supervisor}`).buffer(true).parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        }).expect(200);
        expect(createHash('sha256').update(raw.body as Buffer).digest('hex')).toBe(scan.rawSha256);
        expect(scan.rawSha256).toBe(createHash('sha256').update(bytes).digest('hex'));
      }
    }
  });

  it('tells the story through decisions the tablet pulls', async () => {
    const { changes } = await pullAll(t, inspector);
    const decisionsOf = (key: string) =>
      changes.filter((change) => change.entity === 'decision' && change.data.caseId === demoId(`${key}/case`)).map((change) => change.data);
    expect(decisionsOf('docks-warehouse-drum').map((decision) => decision.kind)).toEqual(['accept', 'return']);
    expect(decisionsOf('docks-warehouse-drum')[1].comment).toContain('photo of the drum markings');
    expect(decisionsOf('quay-four-bonded-store').map((decision) => decision.kind)).toEqual(['accept', 'accept', 'sign_off']);
    expect(decisionsOf('ferry-terminal-jerrycan')).toEqual([]);
    expect(changes.filter((change) => change.entity === 'escalation')).toHaveLength(1);
  });

  it('adds nothing when it runs again', async () => {
    const before = await counts();
    const again = await seedDemoCases(t.app);
    expect(again).toEqual({ created: [], unchanged: DEMO_CASES.map((demo) => demo.siteName) });
    expect(await counts()).toEqual(before);
  });
});
