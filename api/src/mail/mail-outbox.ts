import type { EntityManager } from 'typeorm';
import { MailOutbox } from './mail-outbox.entity';

/** A mail as its cause composes it. */
export interface OutgoingMail {
  kind: string;
  refId: string | null;
  to: string;
  subject: string;
  text: string;
  /** Emptied from the outbox once sent (e.g. a set-password link). */
  sensitive?: boolean;
}

/** Queues mails in the caller's transaction: they are sent only if that transaction commits. */
export async function enqueueMails(manager: EntityManager, mails: OutgoingMail[]): Promise<void> {
  if (!mails.length) return;
  const now = new Date();
  await manager.insert(
    MailOutbox,
    mails.map((mail) => ({
      kind: mail.kind,
      refId: mail.refId,
      toAddress: mail.to,
      subject: mail.subject.slice(0, 300),
      textBody: mail.text,
      sensitive: mail.sensitive ?? false,
      status: 'pending' as const,
      attempts: 0,
      nextAttemptAt: now,
    })),
  );
}
