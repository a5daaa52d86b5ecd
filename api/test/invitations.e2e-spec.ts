import { startSmtpFake, type SmtpFake } from './support/smtp-fake';
import { DEMO, expectErrorShape, signIn, startTestApp, type TestApp } from './support/test-app';

const PUBLIC_URL = 'https://siteband.example';

describe('invitations by e-mail (e2e)', () => {
  let t: TestApp;
  let smtp: SmtpFake;
  const tokens: Record<string, string> = {};

  beforeAll(async () => {
    smtp = await startSmtpFake();
    t = await startTestApp({ env: { ...smtp.env, MAIL_POLL_INTERVAL: '1s', APP_PUBLIC_URL: PUBLIC_URL } });
    for (const [role, email] of Object.entries(DEMO)) tokens[role] = (await signIn(t, email)).accessToken;
  });
  afterAll(async () => {
    await t?.close();
    await smtp?.close();
  });

  const invite = (email: string, token = tokens.admin) =>
    t.http().post('/api/users/invitations').set('Authorization', `Bearer ${token}`).send({ email, displayName: 'Noor Halloran', role: 'safety_officer' });
  const linkFor = async (email: string): Promise<string> => {
    const [mail] = await smtp.waitFor((mails) => mails.some((item) => item.to.includes(email))).then((mails) => mails.filter((item) => item.to.includes(email)));
    const match = new RegExp(`${PUBLIC_URL.replace(/[.]/g, '\\.')}/set-password\\?token=([A-Za-z0-9_-]+)`).exec(mail.text);
    if (!match) throw new Error(`no link in ${mail.text}`);
    return match[1];
  };

  it('is for administrators only', async () => {
    for (const role of ['inspector', 'supervisor', 'safety_officer']) {
      const response = await invite(`refused.${role}@demo.test`, tokens[role]);
      expect({ role, status: response.status }).toEqual({ role, status: 403 });
    }
    expect((await t.http().post('/api/users/invitations').send({ email: 'x@demo.test', displayName: 'X', role: 'inspector' })).status).toBe(401);
  });

  it('mails a set-password link that works once, then the person signs in', async () => {
    const created = await invite('noor.halloran@demo.test').expect(201);
    expect(created.body).toMatchObject({ email: 'noor.halloran@demo.test', role: 'safety_officer', active: true });
    expect((await t.http().post('/api/auth/login').send({ email: 'noor.halloran@demo.test', password: 'anything-at-all-12' })).status).toBe(401);
    const token = await linkFor('noor.halloran@demo.test');
    const [mail] = smtp.received.filter((item) => item.to.includes('noor.halloran@demo.test'));
    expect(mail).toMatchObject({ subject: 'Your Siteband account: set your password', attachments: 0 });

    const weak = await t.http().post('/api/auth/set-password').send({ token, password: 'short' });
    expect(weak.status).toBe(400);
    await t.http().post('/api/auth/set-password').send({ token, password: 'a-long-new-password-42' }).expect(204);
    await signIn(t, 'noor.halloran@demo.test', 'a-long-new-password-42');
    const reused = await t.http().post('/api/auth/set-password').send({ token, password: 'another-long-password-43' });
    expect(reused.status).toBe(400);
    expectErrorShape(reused.body, 400, '/api/auth/set-password');
    expect(reused.body.message).toMatch(/not valid/);
    await signIn(t, 'noor.halloran@demo.test', 'a-long-new-password-42');

    // The sent mail's link is not kept in the outbox.
    const [row] = await t.dataSource.query("SELECT textBody FROM mail_outbox WHERE kind = 'user.invitation' AND refId = ? AND status = 'sent'", [created.body.id]);
    expect(row.textBody).toBe('');
    const audit = await t.dataSource.query('SELECT action FROM audit_log WHERE entityId = ? ORDER BY seq', [created.body.id]);
    expect(audit.map((entry: { action: string }) => entry.action)).toEqual(['invite', 'set_password']);
  });

  it('refuses an expired link, an unknown one and a taken email', async () => {
    const created = await invite('late.comer@demo.test').expect(201);
    const token = await linkFor('late.comer@demo.test');
    await t.dataSource.query('UPDATE user_invitations SET expiresAt = ? WHERE userId = ?', [new Date(Date.now() - 1000), created.body.id]);
    const expired = await t.http().post('/api/auth/set-password').send({ token, password: 'a-long-new-password-42' });
    expect(expired.status).toBe(400);
    const unknown = await t.http().post('/api/auth/set-password').send({ token: 'x'.repeat(43), password: 'a-long-new-password-42' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.message).toBe(expired.body.message);
    expect((await invite('late.comer@demo.test')).status).toBe(409);
  });
});
