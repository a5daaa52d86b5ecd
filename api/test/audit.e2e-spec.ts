import { randomBytes, randomUUID } from 'node:crypto';
import { entryHash } from '../src/audit/audit-hash';
import type { AuditEntryDto } from '../src/audit/dto/audit.dto';
import { demo, pullAll, push, remove, upsert, type Change } from './support/field-records';
import { addUser, DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

describe('Audit trail (e2e, MariaDB)', () => {
  let t: TestApp;
  let inspector: { token: string; id: string };
  let second: { token: string; id: string };
  let admin: string;
  let supervisor: string;
  let safety: string;

  beforeAll(async () => {
    t = await startTestApp();
    const signedIn = await signIn(t, DEMO.inspector);
    inspector = { token: signedIn.accessToken, id: signedIn.user.id };
    supervisor = (await signIn(t, DEMO.supervisor)).accessToken;
    safety = (await signIn(t, DEMO.safety_officer)).accessToken;
    admin = (await signIn(t, DEMO.admin)).accessToken;
    const other = await addUser(t, admin, 'audit.second@demo.test', 'inspector');
    second = { token: other.accessToken, id: other.user.id };
  });
  afterAll(async () => {
    await t?.close();
  });

  const entryCount = async () => Number((await t.dataSource.query('SELECT COUNT(*) AS n FROM audit_log'))[0].n);

  async function entries(query: Record<string, string | number>): Promise<{ items: AuditEntryDto[]; total: number; page: number; pageSize: number }> {
    const response = await t.http().get('/api/audit').query(query).set('Authorization', `Bearer ${admin}`).expect(200);
    return response.body;
  }

  async function verify(): Promise<{ ok: boolean; checked: number; firstBroken?: { seq: number; reason: string } }> {
    return (await t.http().get('/api/audit/verify').set('Authorization', `Bearer ${admin}`).expect(200)).body;
  }

  /** A whole site visit of one inspector, created in one batch. */
  function visit(ownerCase = randomUUID()) {
    const ids = {
      case: ownerCase, sample: randomUUID(), handover: randomUUID(), check: randomUUID(), scan: randomUUID(),
      note: randomUUID(), escalation: randomUUID(), photo: randomUUID(),
    };
    const photo = randomBytes(2_000);
    const changes: Change[] = [
      upsert('case', ids.case, demo.case()),
      upsert('sample', ids.sample, demo.sample(ids.case)),
      upsert('handover', ids.handover, demo.handover(ids.sample)),
      upsert('instrumentCheck', ids.check, demo.instrumentCheck(ids.case)),
      upsert('scan', ids.scan, demo.scan(ids.sample, { instrumentCheckId: ids.check })),
      upsert('note', ids.note, demo.note(ids.case, ids.sample)),
      upsert('escalation', ids.escalation, { caseId: ids.case, scanId: ids.scan, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'Likely oxidiser near fuel drums', hazardClasses: ['oxidiser'] }),
      upsert('attachment', ids.photo, demo.photo('sample', ids.sample, photo)),
    ];
    return { ids, changes };
  }

  describe('recording every applied sync change', () => {
    it('writes one entry per applied change of every entity, with who, when, what, before and after', async () => {
      const startCount = await entryCount();
      const { ids, changes } = visit();
      const results = await push(t, inspector.token, changes);
      expect(results.map((result) => result.status)).toEqual(changes.map(() => 'applied'));

      const pushedAt = Date.now();
      const { items, total } = await entries({ caseId: ids.case, pageSize: 200 });
      expect(total).toBe(changes.length);
      expect(await entryCount()).toBe(startCount + changes.length);
      const { changes: pulled } = await pullAll(t, inspector.token);
      const pulledById = new Map(pulled.map((record) => [record.id, record]));

      // Newest first, in the order the changes were applied.
      expect(items.map((entry) => [entry.entity, entry.entityId]).reverse()).toEqual(changes.map((change) => [change.entity, change.id]));
      for (const entry of items) {
        expect(entry).toMatchObject({ actorId: inspector.id, actorRole: 'inspector', caseId: ids.case, action: 'create', before: null });
        expect(Math.abs(Date.parse(entry.at) - pushedAt)).toBeLessThan(10 * 60_000);
        // After = the record as pull hands it out, server fields included.
        expect(entry.after).toEqual(pulledById.get(entry.entityId)?.data);
      }
      expect(items.find((entry) => entry.entity === 'handover')?.after).toMatchObject({ caseId: ids.case, sealNumber: 'PA-000431' });
    });

    it('records updates and deletes with the record before and after', async () => {
      const { ids, changes } = visit();
      await push(t, inspector.token, changes);
      const results = await push(t, inspector.token, [
        upsert('sample', ids.sample, demo.sample(ids.case, { label: 'S-01b', sealNumber: 'PA-000432' }), 1),
        remove('note', ids.note, 1),
      ]);
      expect(results.map((result) => result.status)).toEqual(['applied', 'applied']);

      const sample = (await entries({ entity: 'sample', entityId: ids.sample })).items;
      expect(sample.map((entry) => entry.action)).toEqual(['update', 'create']);
      expect(sample[0].before).toEqual(sample[1].after);
      expect(sample[0].before).toMatchObject({ label: 'S-01', sealNumber: 'PA-000431' });
      expect(sample[0].after).toMatchObject({ label: 'S-01b', sealNumber: 'PA-000432' });

      const note = (await entries({ entity: 'note', entityId: ids.note })).items;
      expect(note.map((entry) => entry.action)).toEqual(['delete', 'create']);
      expect(note[0]).toMatchObject({ before: note[1].after, after: null, actorId: inspector.id, caseId: ids.case });
    });

    it('writes nothing for re-sent duplicates, conflicts and rejected changes', async () => {
      const { ids, changes } = visit();
      const batchId = randomUUID();
      await push(t, inspector.token, changes, batchId);
      const before = await entryCount();

      const again = await push(t, inspector.token, changes, batchId);
      expect(again.map((result) => result.status)).toEqual(changes.map(() => 'duplicate'));
      const conflict = await push(t, inspector.token, [upsert('case', ids.case, demo.case({ siteName: 'Renamed' }), 7)]);
      expect(conflict[0].status).toBe('conflict');
      const rejected = await push(t, inspector.token, [
        remove('handover', ids.handover, 1),
        upsert('case', ids.case, demo.case({ siteName: 'Not theirs' }), 1),
      ]);
      expect(rejected[0].status).toBe('rejected');
      const foreign = await push(t, second.token, [upsert('case', ids.case, demo.case({ siteName: 'Not theirs' }), 1)]);
      expect(foreign[0].status).toBe('rejected');

      // Only the inspector's own valid rename (the second change of the rejected batch) was applied.
      expect(rejected[1].status).toBe('applied');
      expect(await entryCount()).toBe(before + 1);
    });
  });

  describe('recording user changes', () => {
    it("records an admin's create, role change and deactivation, never the password", async () => {
      const adminId = (await signIn(t, DEMO.admin)).user.id;
      const created = await t
        .http()
        .post('/api/users')
        .set('Authorization', `Bearer ${admin}`)
        .send({ email: 'audited.person@demo.test', displayName: 'Audited Person', role: 'inspector', password: 'audited-person-pw' })
        .expect(201);
      const id = created.body.id as string;
      await t.http().patch(`/api/users/${id}`).set('Authorization', `Bearer ${admin}`).send({ role: 'supervisor' }).expect(200);
      await t.http().patch(`/api/users/${id}`).set('Authorization', `Bearer ${admin}`).send({ active: false }).expect(200);
      // A refused change (an admin demoting themselves) writes nothing.
      await t.http().patch(`/api/users/${adminId}`).set('Authorization', `Bearer ${admin}`).send({ role: 'inspector' }).expect(409);

      const { items } = await entries({ entity: 'user', entityId: id });
      const person = { email: 'audited.person@demo.test', displayName: 'Audited Person' };
      expect(items.map(({ action, before, after, actorId, actorRole, caseId }) => ({ action, before, after, actorId, actorRole, caseId }))).toEqual([
        { action: 'update', before: { ...person, role: 'supervisor', active: true }, after: { ...person, role: 'supervisor', active: false }, actorId: adminId, actorRole: 'admin', caseId: null },
        { action: 'update', before: { ...person, role: 'inspector', active: true }, after: { ...person, role: 'supervisor', active: true }, actorId: adminId, actorRole: 'admin', caseId: null },
        { action: 'create', before: null, after: { ...person, role: 'inspector', active: true }, actorId: adminId, actorRole: 'admin', caseId: null },
      ]);
      expect(JSON.stringify(items)).not.toMatch(/password/i);
      expect((await entries({ entity: 'user', entityId: adminId })).total).toBe(0);
    });
  });

  describe('GET /api/audit', () => {
    it('filters by entity and pages newest first', async () => {
      const all = await entries({ entity: 'case', pageSize: 2 });
      expect(all.pageSize).toBe(2);
      expect(all.items).toHaveLength(2);
      expect(all.total).toBeGreaterThan(2);
      expect(all.items.every((entry) => entry.entity === 'case')).toBe(true);
      expect(all.items[0].seq).toBeGreaterThan(all.items[1].seq);
      const next = await entries({ entity: 'case', pageSize: 2, page: 2 });
      expect(next.items[0].seq).toBeLessThan(all.items[1].seq);
    });

    it('refuses bad filters with the one error shape', async () => {
      const response = await t.http().get('/api/audit').query({ caseId: 'not-a-uuid', page: 0 }).set('Authorization', `Bearer ${admin}`).expect(400);
      expectErrorShape(response.body, 400, expect.stringMatching(/^\/api\/audit/));
      expect(response.body.message).toMatch(/caseId/);
    });

    it.each([
      ['inspector', () => inspector.token],
      ['supervisor', () => supervisor],
      ['safety_officer', () => safety],
    ])('is for administrators only: %s gets 403 on both routes', async (_role, token) => {
      for (const path of ['/api/audit', '/api/audit/verify']) {
        const response = await t.http().get(path).set('Authorization', `Bearer ${token()}`).expect(403);
        expectErrorShape(response.body, 403, path);
      }
    });

    it('answers 401 without a token', async () => {
      await t.http().get('/api/audit').expect(401);
      await t.http().get('/api/audit/verify').expect(401);
    });
  });

  describe('the hash chain', () => {
    it('keeps one valid chain while two inspectors push in parallel', async () => {
      const before = await entryCount();
      const batches = [inspector, second, inspector, second, inspector, second].map((who) => ({ who, ...visit() }));
      const answers = await Promise.all(batches.map((batch) => push(t, batch.who.token, batch.changes)));
      const applied = answers.flat().filter((result) => result.status === 'applied').length;
      expect(applied).toBe(batches.length * batches[0].changes.length);
      expect(await entryCount()).toBe(before + applied);

      const result = await verify();
      expect(result).toEqual({ ok: true, checked: before + applied });
      const seqs: { seq: string }[] = await t.dataSource.query('SELECT seq FROM audit_log ORDER BY seq');
      expect(seqs.map((row) => Number(row.seq))).toEqual(seqs.map((_row, index) => index + 1));
      const secondsEntries = await entries({ entity: 'case', entityId: batches[1].ids.case });
      expect(secondsEntries.items[0]).toMatchObject({ actorId: second.id, actorRole: 'inspector' });
    });

    it('refuses UPDATE and DELETE of an entry in the database itself', async () => {
      await expect(t.dataSource.query("UPDATE audit_log SET action = 'x' WHERE seq = 1")).rejects.toThrow(/append-only/);
      await expect(t.dataSource.query('DELETE FROM audit_log WHERE seq = 1')).rejects.toThrow(/append-only/);
      expect((await verify()).ok).toBe(true);
    });

    describe('with the append-only triggers dropped (someone with DDL rights)', () => {
      let total: number;
      beforeAll(async () => {
        await t.dataSource.query('DROP TRIGGER audit_log_no_update');
        await t.dataSource.query('DROP TRIGGER audit_log_no_delete');
        total = await entryCount();
        expect(total).toBeGreaterThan(20);
      });

      const row = async (seq: number) => (await t.dataSource.query('SELECT * FROM audit_log WHERE seq = ?', [seq]))[0];
      const put = async (seq: number, fields: Record<string, unknown>) => {
        const names = Object.keys(fields);
        await t.dataSource.query(`UPDATE audit_log SET ${names.map((name) => `\`${name}\` = ?`).join(', ')} WHERE seq = ?`, [...names.map((name) => fields[name]), seq]);
      };
      const restore = async (entry: Record<string, unknown>) => {
        const names = Object.keys(entry);
        await t.dataSource.query(`INSERT INTO audit_log (${names.map((name) => `\`${name}\``).join(', ')}) VALUES (${names.map(() => '?').join(', ')})`, names.map((name) => entry[name]));
      };
      afterEach(async () => {
        expect(await verify()).toEqual({ ok: true, checked: total });
      });

      it('finds a changed entry at exactly its seq', async () => {
        const original = await row(7);
        await put(7, { after: JSON.stringify({ ...JSON.parse(original.after), reason: 'Nothing to see here' }) });
        expect(await verify()).toEqual({ ok: false, checked: 6, firstBroken: { seq: 7, reason: expect.stringMatching(/^content hash mismatch/) } });
        await put(7, { actorId: second.id, after: original.after });
        expect((await verify()).firstBroken).toEqual({ seq: 7, reason: expect.stringMatching(/^content hash mismatch/) });
        await put(7, { actorId: original.actorId });
      });

      it('finds a changed entry whose hash was recomputed by its link to the next one', async () => {
        const original = await row(12);
        const forged = { ...original, seq: Number(original.seq), action: 'update' };
        await put(12, { action: 'update', hash: entryHash(forged) });
        expect(await verify()).toEqual({ ok: false, checked: 12, firstBroken: { seq: 13, reason: expect.stringMatching(/^prevHash mismatch/) } });
        await put(12, { action: original.action, hash: original.hash });
      });

      it('finds a deleted entry as a gap at its seq', async () => {
        const original = await row(9);
        await t.dataSource.query('DELETE FROM audit_log WHERE seq = 9');
        expect(await verify()).toEqual({ ok: false, checked: 8, firstBroken: { seq: 9, reason: expect.stringMatching(/^gap in seq/) } });
        await restore(original);
      });

      it('finds entries removed from the end through the chain head', async () => {
        const last = await row(total);
        await t.dataSource.query('DELETE FROM audit_log WHERE seq = ?', [total]);
        expect(await verify()).toEqual({ ok: false, checked: total - 1, firstBroken: { seq: total, reason: expect.stringMatching(/^gap in seq/) } });
        await restore(last);
      });

      it('finds two swapped entries at the first of them', async () => {
        const [a, b] = [await row(15), await row(16)];
        await put(15, { seq: -1 });
        await put(16, { seq: 15 });
        await put(-1, { seq: 16 });
        expect(await verify()).toEqual({ ok: false, checked: 14, firstBroken: { seq: 15, reason: expect.stringMatching(/mismatch/) } });
        // Swapped contents under the original seqs break at the first one too.
        await put(15, { seq: -1 });
        await put(16, { seq: 15 });
        await put(-1, { seq: 16 });
        const contentOf = (entry: Record<string, unknown>) => ({ at: entry.at, actorId: entry.actorId, entity: entry.entity, entityId: entry.entityId, action: entry.action, before: entry.before, after: entry.after, hash: entry.hash, prevHash: entry.prevHash });
        await put(15, contentOf(b));
        await put(16, contentOf(a));
        expect((await verify()).firstBroken).toEqual({ seq: 15, reason: expect.stringMatching(/mismatch/) });
        await put(15, contentOf(a));
        await put(16, contentOf(b));
      });
    });
  });
});
