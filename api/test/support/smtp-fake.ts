import type { AddressInfo } from 'node:net';
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** A received mail as the tests look at it. */
export interface ReceivedMail {
  to: string[];
  subject: string;
  text: string;
  messageId: string;
  attachments: number;
}

/** An in-process smtp-server on a loopback port, parsing each mail with mailparser. */
export interface SmtpFake {
  port: number;
  /** The SMTP_* variables that point the API at it. */
  env: Record<string, string>;
  received: ReceivedMail[];
  /** Resolves when `predicate` holds for the received mails (checked on every arrival), with them. */
  waitFor: (predicate: (mails: ReceivedMail[]) => boolean) => Promise<ReceivedMail[]>;
  /** Stops listening (connections are then refused), keeping the port and what was received. */
  stop: () => Promise<void>;
  /** Listens again on the same port. */
  start: () => Promise<void>;
  close: () => Promise<void>;
}

function addressesOf(mail: ParsedMail): string[] {
  const to = mail.to === undefined ? [] : Array.isArray(mail.to) ? mail.to : [mail.to];
  return to.flatMap((group) => group.value.map((entry) => entry.address ?? ''));
}

export async function startSmtpFake(): Promise<SmtpFake> {
  const received: ReceivedMail[] = [];
  const waiters: { predicate: (mails: ReceivedMail[]) => boolean; resolve: (mails: ReceivedMail[]) => void }[] = [];
  const settle = () => {
    for (const waiter of [...waiters]) {
      if (waiter.predicate(received)) {
        waiters.splice(waiters.indexOf(waiter), 1);
        waiter.resolve(received);
      }
    }
  };
  let port = 0;
  let server: SMTPServer | null = null;
  const listen = async () => {
    server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData(stream, _session, callback) {
        simpleParser(stream)
          .then((mail) => {
            received.push({
              to: addressesOf(mail),
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              messageId: mail.messageId ?? '',
              attachments: mail.attachments.length,
            });
            callback();
            settle();
          })
          .catch((error: Error) => callback(error));
      },
    });
    const current = server;
    await new Promise<void>((resolve, reject) => {
      current.once('error', reject);
      current.listen(port, '127.0.0.1', () => resolve());
    });
    port = (current.server.address() as AddressInfo).port;
  };
  const stop = async () => {
    const current = server;
    server = null;
    if (current) await new Promise<void>((resolve) => current.close(() => resolve()));
  };
  await listen();
  return {
    port,
    env: { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port) },
    received,
    waitFor: (predicate) =>
      new Promise((resolve) => {
        waiters.push({ predicate, resolve });
        settle();
      }),
    stop,
    start: listen,
    close: stop,
  };
}
