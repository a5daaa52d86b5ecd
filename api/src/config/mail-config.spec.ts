import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ConfigError, loadConfig } from './app-config';

const STRONG = 'kQ7v2x9LpZ4mR8tW1yB6nC3dF5gH0jS-aE_uI';

describe('mail and escalation timer configuration', () => {
  let dataDir: string;
  beforeEach(() => {
    dataDir = mkdtempSync(join(tmpdir(), 'siteband-mail-config-'));
  });
  afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

  const load = (extra: Record<string, string> = {}) => loadConfig({ NODE_ENV: 'development', SITEBAND_DATA_DIR: dataDir, JWT_SECRET: STRONG, ...extra });
  const problems = (extra: Record<string, string>): string[] => {
    try {
      load(extra);
    } catch (error) {
      if (error instanceof ConfigError) return error.problems;
      throw error;
    }
    return [];
  };

  it('has the documented defaults', () => {
    const config = load({ PORT: '4100' });
    expect(config.mail).toEqual({
      smtpHost: '127.0.0.1',
      smtpPort: 2525,
      smtpAuth: undefined,
      from: 'Siteband <alerts@siteband.test>',
      publicUrl: 'http://127.0.0.1:4100',
      pollIntervalSeconds: 5,
      retryBaseSeconds: 30,
      retryMaxSeconds: 3600,
    });
    expect(config.escalationTimers).toEqual({ renotifyAfterSeconds: 900, secondContact: undefined, secondContactAfterSeconds: 1800 });
    expect(config.invite).toEqual({ ttlSeconds: 72 * 3600 });
  });

  it('reads every variable it documents', () => {
    const config = load({
      SMTP_HOST: 'relay.example',
      SMTP_PORT: '587',
      SMTP_USER: 'desk',
      SMTP_PASSWORD: 'relay-secret',
      SMTP_FROM: 'Hazmat desk <desk@example.org>',
      APP_PUBLIC_URL: 'https://siteband.example/',
      MAIL_POLL_INTERVAL: '2s',
      MAIL_RETRY_BASE: '10s',
      MAIL_RETRY_MAX: '10m',
      ESCALATION_RENOTIFY_AFTER: '5m',
      ESCALATION_SECOND_CONTACT: ' Duty.Manager@Example.org ',
      ESCALATION_SECOND_CONTACT_AFTER: '20 min',
      INVITE_TTL: '1d',
    });
    expect(config.mail).toEqual({
      smtpHost: 'relay.example',
      smtpPort: 587,
      smtpAuth: { user: 'desk', pass: 'relay-secret' },
      from: 'Hazmat desk <desk@example.org>',
      publicUrl: 'https://siteband.example',
      pollIntervalSeconds: 2,
      retryBaseSeconds: 10,
      retryMaxSeconds: 600,
    });
    expect(config.invite.ttlSeconds).toBe(86400);
    expect(config.escalationTimers).toEqual({ renotifyAfterSeconds: 300, secondContact: 'duty.manager@example.org', secondContactAfterSeconds: 1200 });
  });

  it('lists every bad value at once', () => {
    expect(
      problems({
        SMTP_PORT: '0',
        SMTP_USER: 'lonely',
        SMTP_FROM: 'nobody',
        APP_PUBLIC_URL: 'ftp://x',
        MAIL_RETRY_BASE: '2h',
        ESCALATION_RENOTIFY_AFTER: 'soon',
        ESCALATION_SECOND_CONTACT: 'not-an-address',
        MAIL_POLL_INTERVAL: '0',
      }),
    ).toEqual([
      'SMTP_PORT must be a whole number from 1 to 65535, got "0"',
      'SMTP_USER and SMTP_PASSWORD go together: set both or neither',
      'SMTP_FROM must be an address like "Siteband <alerts@example.org>", got "nobody"',
      'APP_PUBLIC_URL must be an http(s) URL, got "ftp://x"',
      'MAIL_POLL_INTERVAL: "0" must be a positive duration',
      'MAIL_RETRY_BASE must not be longer than MAIL_RETRY_MAX',
      'ESCALATION_RENOTIFY_AFTER: "soon" is not a duration (examples: 900, 15m, 15 min, 12h, 30d)',
      'ESCALATION_SECOND_CONTACT must be an e-mail address, got "not-an-address"',
    ]);
  });

  it('requires APP_PUBLIC_URL in production', () => {
    const production = { NODE_ENV: 'production', S3_ACCESS_KEY_ID: 'AKIAEXAMPLEONLY', S3_SECRET_ACCESS_KEY: 'not-the-fake-secret' };
    expect(problems(production)).toContain('APP_PUBLIC_URL is required in production (the address people open, for the links in mails)');
  });
});
