import { normalizeEmail } from '../users/email';
import type { EnvReader, NodeEnv } from './app-config';

/** Outgoing mail (through the outbox), the escalation timers and invitations. */
export interface MailConfig {
  /** SMTP relay; in development and tests the local fake (`scripts/fakes/smtp.mjs`). */
  smtpHost: string;
  smtpPort: number;
  /** Sign-in at the relay, when it wants one (the local fake does not). */
  smtpAuth: { user: string; pass: string } | undefined;
  /** Sender of every mail. */
  from: string;
  /** The app's address as people open it: links in mails point there. No trailing slash. */
  publicUrl: string;
  /** How often each API instance looks for due mails and escalation timers. */
  pollIntervalSeconds: number;
  /** First retry delay after a failed send; doubles on every failure up to `retryMaxSeconds`. */
  retryBaseSeconds: number;
  retryMaxSeconds: number;
}

/** When an unacknowledged escalation is mailed again, and to whom after that. */
export interface EscalationTimerConfig {
  renotifyAfterSeconds: number;
  /** An e-mail address, or undefined when there is no second contact. */
  secondContact: string | undefined;
  secondContactAfterSeconds: number;
}

/** A single-use set-password link's lifetime. */
export interface InviteConfig {
  ttlSeconds: number;
}

// A plain shape check for addresses in configuration (common practice); the relay has the last word.
const ADDRESS = /^[^\s@<>]+@[^\s@<>]+\.[^\s@<>]+$/;

/** Reads SMTP_*, APP_PUBLIC_URL, MAIL_*, ESCALATION_* and INVITE_TTL. */
export function readMailConfig(reader: EnvReader, nodeEnv: NodeEnv, port: number): { mail: MailConfig; escalationTimers: EscalationTimerConfig; invite: InviteConfig } {
  const smtpHost = reader.string('SMTP_HOST', '127.0.0.1');
  const smtpPort = reader.integer('SMTP_PORT', 2525, 1, 65535);
  const smtpUser = reader.optional('SMTP_USER');
  const smtpPassword = reader.optional('SMTP_PASSWORD');
  if ((smtpUser === undefined) !== (smtpPassword === undefined)) reader.problems.push('SMTP_USER and SMTP_PASSWORD go together: set both or neither');
  const smtpAuth = smtpUser !== undefined && smtpPassword !== undefined ? { user: smtpUser, pass: smtpPassword } : undefined;
  // `.test` is reserved for testing (RFC 2606, from memory): a default that can never reach a real domain.
  const from = reader.string('SMTP_FROM', 'Siteband <alerts@siteband.test>');
  const fromAddress = /<([^>]+)>\s*$/.exec(from)?.[1] ?? from;
  if (!ADDRESS.test(fromAddress)) {
    reader.problems.push(`SMTP_FROM must be an address like "Siteband <alerts@example.org>", got "${from}"`);
  }
  const publicUrlRaw = reader.optional('APP_PUBLIC_URL');
  if (publicUrlRaw === undefined && nodeEnv === 'production') {
    reader.problems.push('APP_PUBLIC_URL is required in production (the address people open, for the links in mails)');
  }
  const publicUrl = (publicUrlRaw ?? `http://127.0.0.1:${port}`).replace(/\/+$/, '');
  if (!/^https?:\/\/[^/\s]+(\/[^\s]*)?$/.test(publicUrl)) reader.problems.push(`APP_PUBLIC_URL must be an http(s) URL, got "${publicUrl}"`);

  const pollIntervalSeconds = reader.duration('MAIL_POLL_INTERVAL', '5s');
  const retryBaseSeconds = reader.duration('MAIL_RETRY_BASE', '30s');
  const retryMaxSeconds = reader.duration('MAIL_RETRY_MAX', '1h');
  if (retryBaseSeconds > retryMaxSeconds) reader.problems.push('MAIL_RETRY_BASE must not be longer than MAIL_RETRY_MAX');

  const renotifyAfterSeconds = reader.duration('ESCALATION_RENOTIFY_AFTER', '15m');
  const secondContactAfterSeconds = reader.duration('ESCALATION_SECOND_CONTACT_AFTER', '30m');
  const secondContactRaw = reader.optional('ESCALATION_SECOND_CONTACT');
  const secondContact = secondContactRaw === undefined ? undefined : normalizeEmail(secondContactRaw);
  if (secondContact !== undefined && !ADDRESS.test(secondContact)) {
    reader.problems.push(`ESCALATION_SECOND_CONTACT must be an e-mail address, got "${secondContactRaw}"`);
  }
  const ttlSeconds = reader.duration('INVITE_TTL', '72h');

  return {
    mail: { smtpHost, smtpPort, smtpAuth, from, publicUrl, pollIntervalSeconds, retryBaseSeconds, retryMaxSeconds },
    escalationTimers: { renotifyAfterSeconds, secondContact, secondContactAfterSeconds },
    invite: { ttlSeconds },
  };
}
