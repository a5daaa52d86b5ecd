import { ROLES, loadLibrary, type Role } from '@siteband/shared';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Compound library: reading and curating (e2e, MariaDB)', () => {
  let t: TestApp;
  const tokens = {} as Record<Role, string>;
  const bundled = loadLibrary();
  const entry = (id: string) => JSON.parse(JSON.stringify(bundled.compounds.find((c) => c.id === id)));
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    t = await startTestApp();
    for (const role of ROLES) tokens[role] = (await signIn(t, DEMO[role])).accessToken;
  });
  afterAll(async () => {
    await t?.close();
  });

  it('refuses to answer without a token (401)', async () => {
    for (const call of [t.http().get('/api/library'), t.http().get('/api/library/ammonia'), t.http().post('/api/library').send(entry('ammonia'))]) {
      const response = await call;
      expect(response.status).toBe(401);
      expectErrorShape(response.body, 401, expect.stringContaining('/api/library'));
    }
  });

  it.each(ROLES)('lets %s read the library and one compound', async (role) => {
    const library = await t.http().get('/api/library').set(as(role)).expect(200);
    expect(library.body.version).toEqual(bundled.version);
    expect(library.body.compounds).toHaveLength(bundled.compounds.length);
    expect(library.body.retired).toEqual([]);
    const ammonia = await t.http().get('/api/library/ammonia').set(as(role)).expect(200);
    expect(ammonia.body).toMatchObject({ origin: 'bundled', retired: false, version: 0, editedBy: null, compound: { id: 'ammonia', cas: '7664-41-7' } });
  });

  it('documents its routes in the OpenAPI document', async () => {
    const docs = await t.http().get('/api/docs-json').expect(200);
    expect(Object.keys(docs.body.paths)).toEqual(expect.arrayContaining(['/api/library', '/api/library/{id}', '/api/library/{id}/history', '/api/identify', '/api/symmetry']));
  });

  it('lets a tablet revalidate its copy: the same library answers 304 to its ETag', async () => {
    const first = await t.http().get('/api/library').set(as('inspector')).expect(200);
    expect(first.headers.etag).toEqual(expect.any(String));
    await t.http().get('/api/library').set(as('inspector')).set('If-None-Match', first.headers.etag).expect(304);
  });

  it('answers 404 for an unknown compound', async () => {
    const response = await t.http().get('/api/library/no-such-compound').set(as('inspector')).expect(404);
    expectErrorShape(response.body, 404, '/api/library/no-such-compound');
  });

  it.each(['inspector', 'safety_officer', 'admin'] as const)('refuses every edit by %s (403)', async (role) => {
    const attempts = [
      t.http().post('/api/library').set(as(role)).send({ ...entry('toluene'), id: 'toluene-by-' + role.replace('_', '-'), cas: '108-88-3', solutionOf: 'toluene' }),
      t.http().put('/api/library/acetone').set(as(role)).send({ ...entry('acetone'), name: 'Changed' }),
      t.http().delete('/api/library/acetone').set(as(role)),
    ];
    for (const attempt of attempts) {
      const response = await attempt;
      expect(response.status).toBe(403);
      expect(response.body.message).toBe(`This needs the role supervisor; you are signed in as ${role}`);
    }
    const [row] = await t.dataSource.query('SELECT COUNT(*) AS n FROM library_edits');
    expect(Number(row.n)).toBe(0);
  });

  describe('as a supervisor', () => {
    it('edits a compound: GET shows it, the version changes, the history keeps the row', async () => {
      const before = await t.http().get('/api/library').set(as('inspector')).expect(200);
      const edited = { ...entry('acetone'), synonyms: [...entry('acetone').synonyms, 'dimethyl ketone (site label)'] };
      const saved = await t.http().put('/api/library/acetone').set(as('supervisor')).send(edited).expect(200);
      expect(saved.body).toMatchObject({ origin: 'edited', version: 1, retired: false, editedBy: expect.stringMatching(/^[0-9a-f-]{36}$/) });

      const after = await t.http().get('/api/library').set(as('inspector')).expect(200);
      expect(after.body.version.version).not.toBe(before.body.version.version);
      expect(after.body.version.version).toMatch(/\+edits\.[0-9a-f]{12}$/);
      expect(after.body.compounds.find((c: { id: string }) => c.id === 'acetone').synonyms).toContain('dimethyl ketone (site label)');
      const one = await t.http().get('/api/library/acetone').set(as('safety_officer')).expect(200);
      expect(one.body.compound.synonyms).toContain('dimethyl ketone (site label)');

      const history = await t.http().get('/api/library/acetone/history').set(as('supervisor')).expect(200);
      expect(history.body.map((h: { version: number; retired: boolean }) => [h.version, h.retired])).toEqual([[1, false]]);
      await t.http().get('/api/library/acetone/history').set(as('inspector')).expect(403);
    });

    it('rejects fundamentals that disagree with the engine’s Γvib, with the reason, and saves nothing', async () => {
      const [rowBefore] = await t.dataSource.query('SELECT COUNT(*) AS n FROM library_edits');
      const ammonia = entry('ammonia');
      ammonia.fundamentals[3].label = 'A1';
      const response = await t.http().put('/api/library/ammonia').set(as('supervisor')).send(ammonia).expect(400);
      expectErrorShape(response.body, 400, '/api/library/ammonia');
      expect(response.body.details).toEqual([
        { field: 'compound', messages: ['fundamentals: Γvib of C3v has 2 A1, the entry lists 3', 'fundamentals: Γvib of C3v has 2 E, the entry lists 1'] },
      ]);
      expect(response.body.message).toContain('Γvib of C3v has 2 E, the entry lists 1');
      const [rowAfter] = await t.dataSource.query('SELECT COUNT(*) AS n FROM library_edits');
      expect(rowAfter.n).toEqual(rowBefore.n);
    });

    it('rejects a band labelled with a species the technique forbids', async () => {
      const co2 = entry('carbon-dioxide');
      co2.bands[0].technique = 'ir';
      const response = await t.http().put('/api/library/carbon-dioxide').set(as('supervisor')).send(co2).expect(400);
      expect(response.body.details[0].messages).toEqual(['bands[0] (ir 1285.41 cm⁻¹): Σg+ is IR-inactive in D∞h']);
    });

    it('rejects an entry the shared validation refuses (bad CAS check digit) and a path/body id mismatch', async () => {
      const bad = await t.http().put('/api/library/acetone').set(as('supervisor')).send({ ...entry('acetone'), cas: '67-64-2' }).expect(400);
      expect(bad.body.message).toContain('acetone.cas: "67-64-2" fails the CAS RN check digit');
      const mismatch = await t.http().put('/api/library/acetone').set(as('supervisor')).send(entry('methanol')).expect(400);
      expect(mismatch.body.message).toContain('the entry\'s id must be acetone');
      await t.http().put('/api/library/unknown-thing').set(as('supervisor')).send(entry('methanol')).expect(404);
    });

    it('refuses a misspelt field instead of dropping it', async () => {
      const response = await t.http().put('/api/library/acetone').set(as('supervisor')).send({ ...entry('acetone'), synonym: ['propanone'] }).expect(400);
      expect(response.body.details[0].messages).toEqual(['compound.synonym is not a field of a compound entry']);
    });

    it('adds a compound and lists it; the same id twice is 409', async () => {
      const added = { ...entry('toluene'), id: 'toluene-technical', name: 'Toluene, technical grade', solutionOf: 'toluene' };
      const created = await t.http().post('/api/library').set(as('supervisor')).send(added).expect(201);
      expect(created.body).toMatchObject({ origin: 'added', version: 1, compound: { id: 'toluene-technical' } });
      await t.http().post('/api/library').set(as('supervisor')).send(added).expect(409);
      await t.http().post('/api/library').set(as('supervisor')).send({ ...entry('acetone') }).expect(409);
      const library = await t.http().get('/api/library').set(as('inspector')).expect(200);
      expect(library.body.compounds.map((c: { id: string }) => c.id)).toContain('toluene-technical');
    });

    it('retires a compound softly: out of the library, still readable, history kept; twice is 409', async () => {
      const retired = await t.http().delete('/api/library/chloroform').set(as('supervisor')).expect(200);
      expect(retired.body).toMatchObject({ retired: true, version: 1, compound: { id: 'chloroform' } });
      const library = await t.http().get('/api/library').set(as('inspector')).expect(200);
      expect(library.body.compounds.map((c: { id: string }) => c.id)).not.toContain('chloroform');
      expect(library.body.retired).toEqual(['chloroform']);
      const one = await t.http().get('/api/library/chloroform').set(as('inspector')).expect(200);
      expect(one.body.retired).toBe(true);
      await t.http().delete('/api/library/chloroform').set(as('supervisor')).expect(409);

      // Reinstating is an edit like any other; both rows stay.
      await t.http().put('/api/library/chloroform').set(as('supervisor')).send(entry('chloroform')).expect(200);
      const history = await t.http().get('/api/library/chloroform/history').set(as('supervisor')).expect(200);
      expect(history.body.map((h: { version: number; retired: boolean }) => [h.version, h.retired])).toEqual([[1, true], [2, false]]);
    });

    it('refuses to retire a compound another entry is a solution of (409)', async () => {
      const response = await t.http().delete('/api/library/toluene').set(as('supervisor')).expect(409);
      expect(response.body.message).toMatch(/toluene-technical\.solutionOf: "toluene" is not in the library/);
    });
  });
});
