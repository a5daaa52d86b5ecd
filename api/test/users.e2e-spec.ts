import { ROLES, type Role } from '@siteband/shared';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Users and the role matrix (e2e, MariaDB)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  let targetId: string;

  beforeAll(async () => {
    t = await startTestApp();
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
    const target = await t
      .http()
      .post('/api/users')
      .set('Authorization', `Bearer ${tokens.admin}`)
      .send({ email: 'matrix.target@demo.test', displayName: 'Matrix Target', role: 'inspector', password: 'matrix-target-pw' })
      .expect(201);
    targetId = target.body.id;
  });
  afterAll(async () => {
    await t?.close();
  });

  /** Every protected route, with a request that would succeed for a permitted role. */
  const routes: { name: string; allowed: readonly Role[]; call: (token?: string, role?: Role) => Promise<{ status: number; body: Record<string, unknown> }> }[] = [
    {
      name: 'GET /api/me',
      allowed: ROLES,
      call: (token) => withToken(t.http().get('/api/me'), token),
    },
    {
      name: 'GET /api/users',
      allowed: ['admin'],
      call: (token) => withToken(t.http().get('/api/users'), token),
    },
    {
      name: 'POST /api/users',
      allowed: ['admin'],
      call: (token, role = 'inspector') =>
        withToken(t.http().post('/api/users'), token).send({
          email: `made.by.${role}.${Date.now()}@demo.test`,
          displayName: `Made by ${role}`,
          role: 'inspector',
          password: 'a-long-enough-pw',
        }),
    },
    {
      name: 'PATCH /api/users/:id',
      allowed: ['admin'],
      call: (token, role = 'inspector') =>
        withToken(t.http().patch(`/api/users/${targetId}`), token).send({ displayName: `Renamed by ${role}` }),
    },
  ];

  function withToken<T extends { set: (name: string, value: string) => T }>(call: T, token?: string): T {
    return token ? call.set('Authorization', `Bearer ${token}`) : call;
  }

  describe.each(routes)('$name', ({ name, allowed, call }) => {
    const path = name.split(' ')[1].replace(':id', '');

    it('is refused without a token (401)', async () => {
      const response = await call();
      expect(response.status).toBe(401);
      expectErrorShape(response.body, 401, expect.stringContaining(path));
    });

    for (const role of ROLES) {
      const permitted = allowed.includes(role);
      it(`as ${role}: ${permitted ? 'allowed' : '403'}`, async () => {
        const response = await call(tokens[role], role);
        if (permitted) {
          expect([200, 201]).toContain(response.status);
        } else {
          expect(response.status).toBe(403);
          expectErrorShape(response.body, 403, expect.stringContaining(path));
          expect(response.body.message).toBe(`This needs the role admin; you are signed in as ${role}`);
        }
      });
    }
  });

  describe('administration', () => {
    const admin = () => ({ Authorization: `Bearer ${tokens.admin}` });

    it('lists users with public fields only', async () => {
      const response = await t.http().get('/api/users').set(admin()).expect(200);
      const emails = response.body.map((user: { email: string }) => user.email);
      expect(emails).toEqual(expect.arrayContaining(Object.values(DEMO)));
      for (const user of response.body) {
        expect(Object.keys(user).sort()).toEqual(['active', 'createdAt', 'displayName', 'email', 'id', 'role', 'updatedAt']);
      }
    });

    it('creates a user who can then sign in; emails are stored lower-case', async () => {
      const created = await t
        .http()
        .post('/api/users')
        .set(admin())
        .send({ email: 'New.Supervisor@Demo.test', displayName: '  New Supervisor ', role: 'supervisor', password: 'supervisor-pw-123' })
        .expect(201);
      expect(created.body).toEqual({
        id: expect.stringMatching(/^[0-9a-f-]{36}$/),
        email: 'new.supervisor@demo.test',
        displayName: 'New Supervisor',
        role: 'supervisor',
        active: true,
        createdAt: expect.any(String),
        updatedAt: expect.any(String),
      });
      const session = await signIn(t, 'new.supervisor@demo.test', 'supervisor-pw-123');
      expect(session.user.role).toBe('supervisor');
      const [row] = await t.dataSource.query('SELECT passwordHash FROM users WHERE email = ?', ['new.supervisor@demo.test']);
      expect(row.passwordHash).toMatch(/^\$2[aby]\$12\$/);
    });

    it('refuses a taken email with 409', async () => {
      const response = await t
        .http()
        .post('/api/users')
        .set(admin())
        .send({ email: 'INSPECTOR@demo.test', displayName: 'Copy', role: 'inspector', password: 'inspector-pw-123' })
        .expect(409);
      expectErrorShape(response.body, 409, '/api/users');
      expect(response.body.message).toBe('A user with this email already exists');
    });

    it('validates new users, naming each bad field', async () => {
      const response = await t
        .http()
        .post('/api/users')
        .set(admin())
        .send({ email: 'not-an-email', displayName: '', role: 'wizard', password: 'short', isAdmin: true })
        .expect(400);
      expectErrorShape(response.body, 400, '/api/users');
      const fields = response.body.details.map((detail: { field: string }) => detail.field).sort();
      expect(fields).toEqual(['displayName', 'email', 'isAdmin', 'password', 'role']);
      expect(response.body.message).toContain('property isAdmin should not exist');
      expect(response.body.message).toContain('role must be one of inspector, supervisor, safety_officer, admin');
      expect(response.body.message).toContain('password must have at least 12 characters');
    });

    it('changes role, name and active flag; refuses unknown fields', async () => {
      const updated = await t
        .http()
        .patch(`/api/users/${targetId}`)
        .set(admin())
        .send({ displayName: 'Target Renamed', role: 'safety_officer', active: false })
        .expect(200);
      expect(updated.body).toMatchObject({ displayName: 'Target Renamed', role: 'safety_officer', active: false });
      const response = await t.http().patch(`/api/users/${targetId}`).set(admin()).send({ email: 'x@demo.test' }).expect(400);
      expect(response.body.message).toContain('property email should not exist');
    });

    it('answers 404 for an unknown id and 400 for a malformed one', async () => {
      const missing = await t
        .http()
        .patch('/api/users/00000000-0000-4000-8000-000000000000')
        .set(admin())
        .send({ displayName: 'Nobody' })
        .expect(404);
      expectErrorShape(missing.body, 404, '/api/users/00000000-0000-4000-8000-000000000000');
      await t.http().patch('/api/users/not-a-uuid').set(admin()).send({ displayName: 'Nobody' }).expect(400);
    });

    it('does not let an admin deactivate or demote themselves', async () => {
      const me = await t.http().get('/api/me').set(admin()).expect(200);
      for (const change of [{ active: false }, { role: 'supervisor' }]) {
        const response = await t.http().patch(`/api/users/${me.body.id}`).set(admin()).send(change).expect(409);
        expect(response.body.message).toMatch(/cannot deactivate your own account or remove your own admin role/);
      }
    });
  });
});
