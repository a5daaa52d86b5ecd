import { MailWorker } from '../src/mail/mail.worker';
import { EscalationTimers } from '../src/escalations/escalation-timers';
import { escalationLink } from '../src/escalations/escalation-mail';
import { eventually, raiseEscalation } from './support/escalations';
import { startSmtpFake, type SmtpFake } from './support/smtp-fake';
import { DEMO, signIn, startTestApp, type TestApp } from './support/test-app';

const PUBLIC_URL = 'https://siteband.example';
const SECOND_CONTACT = 'duty.manager@example.org';

interface OutboxRow {
  kind: string;
  refId: string;
  toAddress: string;
  textBody: string;
  status: string;
  messageId: string | null;
  attempts: number;
  lastError: string | null;
}

describe('escalation timers and mail delivery with two API instances (e2e)', () => {
  let smtp: SmtpFake;
  let first: TestApp;
  let second: TestApp;
  let inspector: string;
  let safety: string;
  const timerEnv = {
    MAIL_POLL_INTERVAL: '1s',
    MAIL_RETRY_BASE: '1s',
    MAIL_RETRY_MAX: '2s',
    APP_PUBLIC_URL: PUBLIC_URL,
    ESCALATION_RENOTIFY_AFTER: '1s',
    ESCALATION_SECOND_CONTACT: SECOND_CONTACT,
    ESCALATION_SECOND_CONTACT_AFTER: '2s',
  };

  beforeAll(async () => {
    smtp = await startSmtpFake();
    first = await startTestApp({ env: { ...smtp.env, ...timerEnv } });
    second = await startTestApp({ sameDatabaseAs: first, env: { ...smtp.env, ...timerEnv } });
    inspector = (await signIn(first, DEMO.inspector)).accessToken;
    safety = (await signIn(second, DEMO.safety_officer)).accessToken;
  });
  afterAll(async () => {
    await second?.close();
    await first?.close();
    await smtp?.close();
  });

  const outbox = (refId: string): Promise<OutboxRow[]> =>
    first.dataSource.query('SELECT kind, refId, toAddress, textBody, status, messageId, attempts, lastError FROM mail_outbox WHERE refId = ? ORDER BY createdAt', [refId]);

  it('queues each reminder and the second-contact mail once and sends each mail once, while both instances race for the work', async () => {
    const escalations = [await raiseEscalation(first, inspector, 'Site A'), await raiseEscalation(second, inspector, 'Site B'), await raiseEscalation(first, inspector, 'Site C')];
    const racers = [first, second].flatMap((instance) => [instance.app.get(EscalationTimers), instance.app.get(MailWorker)]);
    // Besides their own rounds every second, push both instances into rounds at the same moments.
    const state = async () =>
      (await first.dataSource.query('SELECT id, notifiedCount, secondContactNotifiedAt FROM escalations WHERE id IN (?)', [escalations.map((ids) => ids.escalation)])) as {
        notifiedCount: number;
        secondContactNotifiedAt: Date | null;
      }[];
    await eventually(async () => {
      await Promise.all(racers.map((racer) => (racer instanceof EscalationTimers ? racer.runNow() : racer.wake())));
      const rows = await state();
      return rows.every((row) => row.notifiedCount >= 3 && row.secondContactNotifiedAt !== null);
    });
    for (const ids of escalations) {
      await first.http().post(`/api/escalations/${ids.escalation}/acknowledge`).set('Authorization', `Bearer ${safety}`).send({ actionTaken: 'evacuation_advised', baseVersion: 1 }).expect(200);
    }
    // Acknowledged: a last round on both instances finds nothing due.
    await Promise.all(racers.map((racer) => (racer instanceof EscalationTimers ? racer.runNow() : undefined)));
    const counts = new Map((await state()).map((row, index) => [index, row.notifiedCount]));

    for (const [index, ids] of escalations.entries()) {
      const rows = await outbox(ids.escalation);
      const reminders = rows.filter((row) => row.kind === 'escalation.reminder');
      const rounds = reminders.map((row) => row.textBody.split('\n')[0]);
      // One mail per round (the only safety officer), never the same round twice.
      expect(new Set(rounds).size).toBe(rounds.length);
      expect(rows.filter((row) => row.kind === 'escalation.raised')).toHaveLength(1);
      const [{ notifiedCount }] = await first.dataSource.query('SELECT notifiedCount FROM escalations WHERE id = ?', [ids.escalation]);
      expect(reminders).toHaveLength(notifiedCount - 1);
      expect(counts.get(index)).toBe(notifiedCount);
      const secondContact = rows.filter((row) => row.kind === 'escalation.second_contact');
      expect(secondContact.map((row) => row.toAddress)).toEqual([SECOND_CONTACT]);
      expect(secondContact[0].textBody).toContain('You are the second contact');
      expect(secondContact[0].textBody).toContain(escalationLink(PUBLIC_URL, ids.escalation));
    }
    // Every queued mail reaches the relay exactly once.
    const all: OutboxRow[] = await first.dataSource.query('SELECT kind, refId, toAddress, textBody, status, messageId, attempts, lastError FROM mail_outbox');
    await eventually(async () => {
      const pending = await first.dataSource.query("SELECT COUNT(*) AS n FROM mail_outbox WHERE status = 'pending'");
      return Number(pending[0].n) === 0;
    });
    const sent: OutboxRow[] = await first.dataSource.query("SELECT messageId FROM mail_outbox WHERE status = 'sent'");
    expect(sent).toHaveLength(all.length);
    await smtp.waitFor((mails) => mails.length >= all.length);
    const received = smtp.received.map((mail) => mail.messageId);
    expect(received).toHaveLength(all.length);
    expect(new Set(received)).toEqual(new Set(sent.map((row) => row.messageId)));
  });

  it('keeps the timers across a restart: a reminder that fell due while no instance ran is sent by the next one', async () => {
    const ids = await raiseEscalation(first, inspector, 'Site after restart');
    await second.close();
    const restartedEnv = { ...smtp.env, ...timerEnv, ESCALATION_RENOTIFY_AFTER: '1h', ESCALATION_SECOND_CONTACT_AFTER: '2h' };
    // Stop the first instance's timers too, as a full outage would; the due time stays in the row.
    await first.app.get(EscalationTimers).beforeApplicationShutdown();
    await first.dataSource.query('UPDATE escalations SET nextNotifyAt = ? WHERE id = ?', [new Date(Date.now() - 60_000), ids.escalation]);
    second = await startTestApp({ sameDatabaseAs: first, env: restartedEnv });
    await smtp.waitFor((mails) => mails.some((mail) => mail.subject.startsWith('Reminder: escalation at Site after restart')));
    const rows = await eventually(async () => {
      const found = await outbox(ids.escalation);
      return found.some((row) => row.kind === 'escalation.reminder' && row.status === 'sent') && found;
    });
    expect(rows.filter((row) => row.kind === 'escalation.reminder')).toHaveLength(1);
  });

  it('records escalations while the mail server is down, retries, and delivers every mail once when it is back', async () => {
    await smtp.stop();
    const ids = await raiseEscalation(second, inspector, 'Site with the relay down');
    const [row] = await first.dataSource.query('SELECT status FROM escalations WHERE id = ?', [ids.escalation]);
    expect(row.status).toBe('raised');
    const failing = await eventually(async () => {
      const [found] = await outbox(ids.escalation);
      return found && found.attempts >= 2 && found;
    });
    expect(failing).toMatchObject({ status: 'pending', lastError: expect.any(String) });
    await smtp.start();
    await smtp.waitFor((mails) => mails.some((mail) => mail.subject.startsWith('Escalation at Site with the relay down')));
    const sent = await eventually(async () => {
      const found = await outbox(ids.escalation);
      return found.every((item) => item.status === 'sent') && found;
    });
    expect(sent.filter((item) => item.kind === 'escalation.raised')).toHaveLength(1);
    expect(smtp.received.filter((mail) => mail.subject.startsWith('Escalation at Site with the relay down'))).toHaveLength(1);
  });
});
