import { checkStructure, MAX_ATOMS, ROLES, type Role } from '@siteband/shared';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

// Idealised geometries (invented placements; bond lengths from memory of the CRC Handbook): NH3 r 1.012 Å, ∠ 106.7°; BF3 r 1.307 Å, planar.
const AMMONIA = '4\nammonia\nN 0 0 0\nH 0.937530 0 -0.381028\nH -0.468765 0.811924 -0.381028\nH -0.468765 -0.811924 -0.381028\n';
const BF3 = '4\nboron trifluoride\nB 0 0 0\nF 1.307 0 0\nF -0.6535 1.131895 0\nF -0.6535 -1.131895 0\n';

describe('Structure check (e2e)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const check = (body: Record<string, unknown>, role: Role = 'inspector') => t.http().post('/api/symmetry').set(as(role)).send(body);

  beforeAll(async () => {
    t = await startTestApp();
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('refuses to answer without a token (401)', async () => {
    const response = await t.http().post('/api/symmetry').send({ structure: AMMONIA });
    expect(response.status).toBe(401);
    expectErrorShape(response.body, 401, '/api/symmetry');
  });

  it.each(ROLES)('checks ammonia for %s: C3v, Γvib 2A1 + 2E, 4 IR- and 4 Raman-active', async (role) => {
    const response = await check({ structure: AMMONIA }, role).expect(200);
    // Counts: Cotton, Chemical Applications of Group Theory (3rd ed.), from memory (project check values §3).
    expect(response.body).toMatchObject({ pointGroup: 'C3v', atoms: 4, formula: 'H3N', vibrations: { total: 6, gamma: { A1: 2, E: 2 }, irActive: 4, ramanActive: 4, silent: 0 } });
    // The same object as the command line's `symmetry --json`, which calls the same shared function.
    expect(response.body).toEqual(JSON.parse(JSON.stringify(checkStructure(AMMONIA))));
  });

  it('checks BF3: D3h, Γvib A1′ + A2″ + 2E′, 3 IR- and 3 Raman-active, from an uploaded file', async () => {
    const response = await t.http().post('/api/symmetry').set(as('supervisor')).attach('file', Buffer.from(BF3), 'bf3.xyz').expect(200);
    // Counts: Cotton / Harris & Bertolucci, from memory (project check values §3).
    expect(response.body).toMatchObject({ pointGroup: 'D3h', order: 12, vibrations: { gamma: { "A1'": 1, "A2''": 1, "E'": 2 }, irActive: 3, ramanActive: 3, coincident: 2 } });
  });

  it('takes tolerance and convention as multipart fields too', async () => {
    const water = '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n';
    const response = await t.http().post('/api/symmetry').set(as('inspector')).field('convention', 'xz').field('tolerance', '0.05').attach('file', Buffer.from(water), 'water.xyz').expect(200);
    expect(response.body.vibrations.gamma).toEqual({ A1: 2, B1: 1 });
    expect(response.body.orientation).toMatchObject({ convention: 'xz', tolerance: 0.05 });
  });

  const tooMany = `${MAX_ATOMS + 1}\nbig\n${Array.from({ length: MAX_ATOMS + 1 }, (_, i) => `C ${i * 1.5} 0 0`).join('\n')}\n`;
  const bad: [string, string, RegExp][] = [
    ['a wrong atom count', '5\nammonia\nN 0 0 0\nH 0.9375 0 -0.381\nH -0.4688 0.8119 -0.381\nH -0.4688 -0.8119 -0.381\n', /^line 1: the header says 5 atoms but the file has 4/],
    ['a non-numeric coordinate', '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692x\nH 0 -0.7572 -0.4692\n', /^line 4: /],
    ['an unknown element', '3\nwater\nO 0 0 0.1173\nQq 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n', /^line 4: .*Qq/],
    ['two atoms at the same position', '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 0.7572 -0.4692\n', /^line [45]: .*line [45]/],
    ['an empty file', '\n\n', /^line 1: the file is empty/],
    ['more atoms than the limit', tooMany, new RegExp(`^line 1: ${MAX_ATOMS + 1} atoms is more than the limit of ${MAX_ATOMS}`)],
  ];

  it.each(bad)('answers %s with 400 naming the line', async (_kind, text, message) => {
    const response = await check({ structure: text }).expect(400);
    expectErrorShape(response.body, 400, '/api/symmetry');
    expect(response.body.message).toMatch(message);
    expect(response.body.details).toEqual([{ field: 'structure', messages: [response.body.message] }]);
    const uploaded = await t.http().post('/api/symmetry').set(as('inspector')).attach('file', Buffer.from(text), 'bad.xyz').expect(400);
    expect(uploaded.body.message).toBe(response.body.message);
  });

  it('validates the options and the body (400 naming the field)', async () => {
    const response = await check({ structure: AMMONIA, format: 'pdb', tolerance: -1, convention: 'xy', extra: 1 }).expect(400);
    expect(response.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['convention', 'extra', 'format', 'tolerance']);
    const nothing = await check({}).expect(400);
    expect(nothing.body.message).toContain('Send a structure');
    const both = await t.http().post('/api/symmetry').set(as('inspector')).field('structure', AMMONIA).attach('file', Buffer.from(AMMONIA), 'a.xyz').expect(400);
    expect(both.body.message).toContain('not both');
  });

  it('answers a file over 1 MB with 413', async () => {
    const huge = Buffer.alloc(1024 * 1024 + 1, 0x20);
    const response = await t.http().post('/api/symmetry').set(as('inspector')).attach('file', huge, 'huge.xyz').expect(413);
    expectErrorShape(response.body, 413, '/api/symmetry');
  });
});
