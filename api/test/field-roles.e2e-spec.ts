import { randomBytes, randomUUID } from 'node:crypto';
import { ROLES, type Role } from '@siteband/shared';
import { demo, push, upsert, uploadWhole } from './support/field-records';
import { startS3Fake, type S3Fake } from './support/s3-fake';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

const READERS: readonly Role[] = ['inspector', 'supervisor', 'safety_officer'];
const WRITERS: readonly Role[] = ['inspector'];

describe('Cases, sync and attachments: the role matrix and case lists (e2e)', () => {
  let s3: S3Fake;
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let caseId: string;
  let photoId: string;
  const photo = randomBytes(2_000);

  beforeAll(async () => {
    s3 = await startS3Fake();
    t = await startTestApp({ env: s3.env });
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
    caseId = randomUUID();
    photoId = randomUUID();
    const results = await push(t, tokens.inspector, [upsert('case', caseId, demo.case()), upsert('attachment', photoId, demo.photo('case', caseId, photo))]);
    expect(results.map((result) => result.status)).toEqual(['applied', 'applied']);
  });
  afterAll(async () => {
    await t?.close();
    await s3?.close();
  });

  function withToken<T extends { set: (name: string, value: string) => T }>(call: T, token?: string): T {
    return token ? call.set('Authorization', `Bearer ${token}`) : call;
  }

  /** Every new route, with a request that succeeds for a permitted role. */
  const routes: { name: string; allowed: readonly Role[]; call: (token?: string) => Promise<{ status: number; body: Record<string, unknown> }> }[] = [
    {
      name: 'POST /api/sync/push',
      allowed: WRITERS,
      call: (token) => withToken(t.http().post('/api/sync/push'), token).send({ clientId: 'matrix', batchId: randomUUID(), changes: [upsert('note', randomUUID(), demo.note(caseId))] }),
    },
    { name: 'GET /api/sync/pull', allowed: READERS, call: (token) => withToken(t.http().get('/api/sync/pull'), token) },
    { name: 'GET /api/cases', allowed: READERS, call: (token) => withToken(t.http().get('/api/cases'), token) },
    { name: 'GET /api/cases/:id', allowed: READERS, call: (token) => withToken(t.http().get(`/api/cases/${caseId}`), token) },
    {
      name: 'PUT /api/attachments/:id/content',
      allowed: WRITERS,
      call: (token) => withToken(t.http().put(`/api/attachments/${photoId}/content`), token).set('Content-Type', 'image/jpeg').send(photo),
    },
    { name: 'GET /api/attachments/:id/status', allowed: READERS, call: (token) => withToken(t.http().get(`/api/attachments/${photoId}/status`), token) },
  ];

  describe.each(routes)('$name', ({ name, allowed, call }) => {
    const path = name.split(' ')[1].split('/:')[0];

    it('is refused without a token (401)', async () => {
      const response = await call();
      expect(response.status).toBe(401);
      expectErrorShape(response.body, 401, expect.stringContaining(path));
    });

    for (const role of ROLES) {
      const permitted = allowed.includes(role);
      it(`as ${role}: ${permitted ? 'allowed' : '403'}`, async () => {
        const response = await call(tokens[role]);
        if (permitted) {
          expect(response.status).toBe(200);
        } else {
          expect(response.status).toBe(403);
          expectErrorShape(response.body, 403, expect.stringContaining(path));
          expect(response.body.message).toBe(`This needs the role ${allowed.join(' or ')}; you are signed in as ${role}`);
        }
      });
    }
  });

  // Runs after the matrix uploaded the photo: downloading needs a complete upload.
  describe('GET /api/attachments/:id/content', () => {
    it('is refused without a token (401)', async () => {
      expect((await t.http().get(`/api/attachments/${photoId}/content`)).status).toBe(401);
    });
    for (const role of ROLES) {
      const permitted = READERS.includes(role);
      it(`as ${role}: ${permitted ? 'allowed' : '403'}`, async () => {
        const response = await withToken(t.http().get(`/api/attachments/${photoId}/content`), tokens[role]).buffer(true);
        expect(response.status).toBe(permitted ? 200 : 403);
      });
    }
  });

  it('lists the visible cases a page at a time, newest visit first', async () => {
    const starts = ['2026-11-01T08:00:00.000Z', '2026-11-03T08:00:00.000Z', '2026-11-02T08:00:00.000Z'];
    const ids: string[] = starts.map(() => randomUUID());
    await push(t, tokens.inspector, ids.map((id, i) => upsert('case', id, demo.case({ startedAt: starts[i], siteName: `Listed ${i}` }))));
    const all = await withToken(t.http().get('/api/cases').query({ pageSize: 100 }), tokens.inspector).expect(200);
    const total = all.body.total as number;
    expect(total).toBe(all.body.items.length);
    const listed = all.body.items.filter((item: { id: string }) => ids.includes(item.id)).map((item: { siteName: string }) => item.siteName);
    expect(listed).toEqual(['Listed 1', 'Listed 2', 'Listed 0']);

    const page2 = await withToken(t.http().get('/api/cases').query({ page: 2, pageSize: 2 }), tokens.inspector).expect(200);
    expect(page2.body).toMatchObject({ page: 2, pageSize: 2, total });
    expect(page2.body.items).toEqual(all.body.items.slice(2, 4));

    await uploadWhole(t, tokens.inspector, randomUUID(), photo, 'image/jpeg').expect(404);
    const bad = await withToken(t.http().get('/api/cases').query({ pageSize: 1000 }), tokens.inspector).expect(400);
    expect(bad.body.message).toContain('pageSize must not be greater than 100');

    const admin = (await signIn(t, DEMO.admin)).accessToken;
    await t.http().post('/api/users').set('Authorization', `Bearer ${admin}`)
      .send({ email: 'listing.inspector@demo.test', displayName: 'Listing Inspector', role: 'inspector', password: 'listing-inspector-pw' }).expect(201);
    const other = (await signIn(t, 'listing.inspector@demo.test', 'listing-inspector-pw')).accessToken;
    expect((await withToken(t.http().get('/api/cases'), other).expect(200)).body).toMatchObject({ items: [], total: 0 });
    const supervisorTotal = (await withToken(t.http().get('/api/cases').query({ pageSize: 100 }), tokens.supervisor).expect(200)).body.total;
    expect(supervisorTotal).toBe(total);
  });
});
