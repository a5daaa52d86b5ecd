import { randomUUID } from 'node:crypto';
import { escalationLink } from '../src/escalations/escalation-mail';
import { eventually, raiseEscalation } from './support/escalations';
import { pullAll, push, upsert } from './support/field-records';
import { startSmtpFake, type SmtpFake } from './support/smtp-fake';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

const PUBLIC_URL = 'https://siteband.example';

describe('escalations (e2e)', () => {
  let t: TestApp;
  let smtp: SmtpFake;
  const tokens: Record<string, string> = {};
  let otherInspector: string;

  beforeAll(async () => {
    smtp = await startSmtpFake();
    t = await startTestApp({
      env: { ...smtp.env, MAIL_POLL_INTERVAL: '1s', APP_PUBLIC_URL: PUBLIC_URL, ESCALATION_RENOTIFY_AFTER: '1h' },
    });
    for (const [role, email] of Object.entries(DEMO)) tokens[role] = (await signIn(t, email)).accessToken;
    const addUser = (email: string, role: string) =>
      t.http().post('/api/users').set('Authorization', `Bearer ${tokens.admin}`).send({ email, displayName: email.split('@')[0], role, password: 'another-person-pw' }).expect(201);
    await addUser('second.safety@demo.test', 'safety_officer');
    const away = await addUser('away.safety@demo.test', 'safety_officer');
    await t.http().patch(`/api/users/${away.body.id}`).set('Authorization', `Bearer ${tokens.admin}`).send({ active: false }).expect(200);
    await addUser('second.inspector@demo.test', 'inspector');
    otherInspector = (await signIn(t, 'second.inspector@demo.test', 'another-person-pw')).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await smtp?.close();
  });

  const bearer = (role: string) => ({ Authorization: `Bearer ${tokens[role]}` });
  const mailsAbout = (id: string) => smtp.received.filter((mail) => mail.text.includes(escalationLink(PUBLIC_URL, id)));

  it('mails every active safety officer when an escalation arrives, with case, compounds, hazards, caution and link, no file', async () => {
    const ids = await raiseEscalation(t, tokens.inspector, 'Warehouse 12, Port Averin');
    const mails = await smtp.waitFor(() => mailsAbout(ids.escalation).length >= 2).then(() => mailsAbout(ids.escalation));
    expect(mails.map((mail) => mail.to).flat().sort()).toEqual(['safety@demo.test', 'second.safety@demo.test']);
    for (const mail of mails) {
      expect(mail.subject).toBe('Escalation at Warehouse 12, Port Averin (Sodium azide)');
      expect(mail.text).toContain('Case: Warehouse 12, Port Averin, 7 Breakwater Road, Port Averin');
      expect(mail.text).toContain('Raised by: Rowan Ashdown');
      expect(mail.text).toContain('Likely compounds: Sodium azide; Sodium nitrate');
      expect(mail.text).toContain('Hazard classes: Acute toxicity (oral), category 2; Hazardous to the aquatic environment');
      expect(mail.text).toContain('Identification is presumptive');
      expect(mail.text).toContain(`${PUBLIC_URL}/tabs/escalations/${ids.escalation}`);
      expect(mail.attachments).toBe(0);
    }
    // The worker records the outcome when its round commits, just after the relay took the mails.
    const outbox = await eventually(async () => {
      const rows: { status: string }[] = await t.dataSource.query('SELECT kind, toAddress, status FROM mail_outbox WHERE refId = ? ORDER BY toAddress', [ids.escalation]);
      return rows.every((row) => row.status === 'sent') && rows;
    });
    expect(outbox).toEqual([
      { kind: 'escalation.raised', toAddress: 'safety@demo.test', status: 'sent' },
      { kind: 'escalation.raised', toAddress: 'second.safety@demo.test', status: 'sent' },
    ]);
  });

  it('queues no mail for an escalation the server refuses', async () => {
    const ids = await raiseEscalation(t, tokens.inspector);
    const stray = randomUUID();
    const [result] = await push(t, tokens.inspector, [
      upsert('escalation', stray, { caseId: ids.case, scanId: randomUUID(), raisedAt: '2026-11-30T09:00:00.000Z', reason: 'x', hazardClasses: [] }),
    ]);
    expect(result.status).toBe('rejected');
    expect(await t.dataSource.query('SELECT id FROM mail_outbox WHERE refId = ?', [stray])).toEqual([]);
  });

  describe('role matrix', () => {
    let id: string;
    let version: number;
    beforeAll(async () => {
      id = (await raiseEscalation(t, tokens.inspector)).escalation;
      version = 1;
    });

    const routes = () => [
      { name: 'GET /api/escalations', call: (h: Record<string, string>) => t.http().get('/api/escalations').set(h), allowed: ['supervisor', 'safety_officer'] },
      { name: 'GET /api/escalations/:id', call: (h: Record<string, string>) => t.http().get(`/api/escalations/${id}`).set(h), allowed: ['supervisor', 'safety_officer'] },
      {
        name: 'POST /api/escalations/:id/notes',
        call: (h: Record<string, string>) => t.http().post(`/api/escalations/${id}/notes`).set(h).send({ text: 'Matrix note' }),
        allowed: ['supervisor', 'safety_officer'],
      },
      {
        name: 'POST /api/escalations/:id/acknowledge',
        call: (h: Record<string, string>) => t.http().post(`/api/escalations/${id}/acknowledge`).set(h).send({ actionTaken: 'no_action', baseVersion: version }),
        allowed: ['safety_officer'],
      },
      {
        name: 'POST /api/escalations/:id/close',
        call: (h: Record<string, string>) => t.http().post(`/api/escalations/${id}/close`).set(h).send({ comment: 'Matrix close', baseVersion: version }),
        allowed: ['safety_officer'],
      },
    ];

    it('lets only the named roles in, and nobody without a token', async () => {
      for (const route of routes()) {
        for (const role of Object.keys(DEMO)) {
          const response = await route.call(bearer(role));
          if (route.allowed.includes(role)) {
            expect({ route: route.name, role, status: response.status }).toEqual({ route: route.name, role, status: expect.any(Number) });
            expect([200, 201]).toContain(response.status);
            if (response.body.version) version = response.body.version;
          } else {
            expect({ route: route.name, role, status: response.status }).toEqual({ route: route.name, role, status: 403 });
            expectErrorShape(response.body, 403, expect.any(String));
          }
        }
        const anonymous = await route.call({});
        expect({ route: route.name, status: anonymous.status }).toEqual({ route: route.name, status: 401 });
      }
    });
  });

  it('acknowledges with the action taken, refusing a stale version and a missing PPE level; the tablet pulls who and what', async () => {
    const ids = await raiseEscalation(t, tokens.inspector);
    const detail = await t.http().get(`/api/escalations/${ids.escalation}`).set(bearer('safety_officer')).expect(200);
    expect(detail.body).toMatchObject({
      id: ids.escalation,
      version: 1,
      status: 'raised',
      caseId: ids.case,
      siteName: 'Quay 7 drum store, Port Averin',
      compounds: ['Sodium azide', 'Sodium nitrate'],
      inspector: { displayName: 'Rowan Ashdown' },
      notifiedCount: 1,
      nextNotifyAt: expect.any(String),
      notes: [],
      case: { id: ids.case, status: 'open', inspector: { displayName: 'Rowan Ashdown' } },
    });

    const noLevel = await t.http().post(`/api/escalations/${ids.escalation}/acknowledge`).set(bearer('safety_officer')).send({ actionTaken: 'ppe_required', baseVersion: 1 });
    expect(noLevel.status).toBe(400);
    expect(noLevel.body.details).toEqual([{ field: 'ppeLevel', messages: ['ppeLevel must be A, B, C or D when actionTaken is ppe_required'] }]);
    const levelWithoutPpe = await t
      .http()
      .post(`/api/escalations/${ids.escalation}/acknowledge`)
      .set(bearer('safety_officer'))
      .send({ actionTaken: 'evacuation_advised', ppeLevel: 'A', baseVersion: 1 });
    expect(levelWithoutPpe.status).toBe(400);
    const closeFirst = await t.http().post(`/api/escalations/${ids.escalation}/close`).set(bearer('safety_officer')).send({ comment: 'Too early', baseVersion: 1 });
    expect(closeFirst.status).toBe(409);
    expect(closeFirst.body.message).toBe('Acknowledge this escalation before closing it');

    const ack = await t
      .http()
      .post(`/api/escalations/${ids.escalation}/acknowledge`)
      .set(bearer('safety_officer'))
      .send({ actionTaken: 'ppe_required', ppeLevel: 'B', comment: 'Team to re-enter in level B only', baseVersion: 1 })
      .expect(200);
    expect(ack.body).toMatchObject({
      version: 2,
      status: 'acknowledged',
      acknowledgedByName: 'Tobiah Okonkwo-Reyes',
      acknowledgedAt: expect.any(String),
      actionTaken: 'ppe_required',
      ppeLevel: 'B',
      ackComment: 'Team to re-enter in level B only',
      nextNotifyAt: null,
    });
    const stale = await t.http().post(`/api/escalations/${ids.escalation}/acknowledge`).set(bearer('safety_officer')).send({ actionTaken: 'no_action', baseVersion: 1 });
    expect(stale.status).toBe(409);
    expectErrorShape(stale.body, 409, `/api/escalations/${ids.escalation}/acknowledge`);
    expect(stale.body.message).toMatch(/version 2, not 1/);
    const again = await t.http().post(`/api/escalations/${ids.escalation}/acknowledge`).set(bearer('safety_officer')).send({ actionTaken: 'no_action', baseVersion: 2 });
    expect(again.status).toBe(409);
    expect(again.body.message).toBe('This escalation is already acknowledged');

    const pulled = (await pullAll(t, tokens.inspector)).changes.find((record) => record.id === ids.escalation);
    expect(pulled).toMatchObject({
      entity: 'escalation',
      version: 2,
      data: { status: 'acknowledged', acknowledgedBy: ack.body.acknowledgedBy, acknowledgedByName: 'Tobiah Okonkwo-Reyes', actionTaken: 'ppe_required', ppeLevel: 'B' },
    });

    const staleClose = await t.http().post(`/api/escalations/${ids.escalation}/close`).set(bearer('safety_officer')).send({ comment: 'Done', baseVersion: 1 });
    expect(staleClose.status).toBe(409);
    const closed = await t.http().post(`/api/escalations/${ids.escalation}/close`).set(bearer('safety_officer')).send({ comment: 'Site cleared by the specialist team', baseVersion: 2 }).expect(200);
    expect(closed.body).toMatchObject({ version: 3, status: 'closed', closeComment: 'Site cleared by the specialist team', closedAt: expect.any(String) });
    const audit: { entity: string; action: string; before: string | null; after: string }[] = await t.dataSource.query(
      'SELECT entity, action, `before`, `after` FROM audit_log WHERE entityId = ? ORDER BY seq',
      [ids.escalation],
    );
    expect(audit.map((entry) => [entry.entity, entry.action])).toEqual([
      ['escalation', 'create'],
      ['escalation', 'acknowledge'],
      ['escalation', 'close'],
    ]);
    expect(JSON.parse(audit[1].before as string)).toMatchObject({ status: 'raised', acknowledgedBy: null });
    expect(JSON.parse(audit[1].after)).toMatchObject({ status: 'acknowledged', actionTaken: 'ppe_required', ppeLevel: 'B' });
    expect(JSON.parse(audit[2].after)).toMatchObject({ status: 'closed', closeComment: 'Site cleared by the specialist team' });
    const closedAgain = await t.http().post(`/api/escalations/${ids.escalation}/close`).set(bearer('safety_officer')).send({ comment: 'Again', baseVersion: 3 });
    expect(closedAgain.status).toBe(409);
    // The tablet cannot change it back: escalations are permanent records for sync.
    const [tabletEdit] = await push(t, tokens.inspector, [
      upsert('escalation', ids.escalation, { caseId: ids.case, raisedAt: '2026-11-30T09:00:00.000Z', reason: 'changed', hazardClasses: [] }, 3),
    ]);
    expect(tabletEdit.status).toBe('rejected');
  });

  it("adds notes that the case's inspector pulls as escalationNote, and no one else's tablet; notes cannot be pushed", async () => {
    const ids = await raiseEscalation(t, tokens.inspector);
    const note = await t.http().post(`/api/escalations/${ids.escalation}/notes`).set(bearer('supervisor')).send({ text: '  Lab courier booked for 14:00  ' }).expect(201);
    expect(note.body).toEqual({
      id: expect.any(String),
      escalationId: ids.escalation,
      caseId: ids.case,
      text: 'Lab courier booked for 14:00',
      authorId: expect.any(String),
      authorName: 'Imke Varga-Lindqvist',
      at: expect.any(String),
    });
    const empty = await t.http().post(`/api/escalations/${ids.escalation}/notes`).set(bearer('safety_officer')).send({ text: '   ' });
    expect(empty.status).toBe(400);
    const missing = await t.http().post(`/api/escalations/${randomUUID()}/notes`).set(bearer('safety_officer')).send({ text: 'Nowhere' });
    expect(missing.status).toBe(404);

    const pulled = (await pullAll(t, tokens.inspector)).changes.find((record) => record.id === note.body.id);
    expect(pulled).toMatchObject({ entity: 'escalationNote', version: 1, deleted: false, data: { escalationId: ids.escalation, caseId: ids.case, text: 'Lab courier booked for 14:00', authorName: 'Imke Varga-Lindqvist' } });
    const elsewhere = (await pullAll(t, otherInspector)).changes.find((record) => record.id === note.body.id);
    expect(elsewhere).toBeUndefined();
    const detail = await t.http().get(`/api/escalations/${ids.escalation}`).set(bearer('safety_officer')).expect(200);
    expect(detail.body.notes).toEqual([note.body]);
    const [audited] = await t.dataSource.query('SELECT entity, action, actorRole FROM audit_log WHERE entityId = ?', [note.body.id]);
    expect(audited).toEqual({ entity: 'escalationNote', action: 'create', actorRole: 'supervisor' });

    const [pushed] = await push(t, tokens.inspector, [upsert('escalationNote', randomUUID(), { escalationId: ids.escalation, caseId: ids.case, text: 'From the tablet' })]);
    expect(pushed).toMatchObject({ status: 'rejected', reason: 'Written by the server only (escalation note): tablets pull these records and never push them' });
  });

  it('lists escalations a page at a time, filtered by status, raised first', async () => {
    const all = await t.http().get('/api/escalations').query({ pageSize: 100 }).set(bearer('safety_officer')).expect(200);
    expect(all.body.total).toBeGreaterThanOrEqual(4);
    const order = all.body.items.map((item: { status: string }) => ['raised', 'acknowledged', 'closed'].indexOf(item.status));
    expect(order).toEqual([...order].sort((a: number, b: number) => a - b));
    const raised = await t.http().get('/api/escalations').query({ status: 'raised', page: 1, pageSize: 2 }).set(bearer('supervisor')).expect(200);
    expect(raised.body).toMatchObject({ page: 1, pageSize: 2, items: expect.any(Array) });
    expect(raised.body.items).toHaveLength(2);
    expect(raised.body.items.every((item: { status: string }) => item.status === 'raised')).toBe(true);
    const closedOrAck = await t.http().get('/api/escalations').query({ status: 'acknowledged,closed' }).set(bearer('safety_officer')).expect(200);
    expect(closedOrAck.body.items.every((item: { status: string }) => item.status !== 'raised')).toBe(true);
    const bad = await t.http().get('/api/escalations').query({ status: 'burning' }).set(bearer('safety_officer'));
    expect(bad.status).toBe(400);
    const tooBig = await t.http().get('/api/escalations').query({ pageSize: 101 }).set(bearer('safety_officer'));
    expect(tooBig.status).toBe(400);
  });
});
