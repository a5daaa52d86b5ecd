import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export const MAIL_STATUSES = ['pending', 'sent'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/**
 * A mail to send, written in the same transaction as what causes it (the transactional outbox). The
 * worker sends it later and retries until the relay takes it, so a relay outage loses nothing.
 */
@Entity({ name: 'mail_outbox' })
@Index('IDX_mail_outbox_due', ['status', 'nextAttemptAt'])
@Index('IDX_mail_outbox_ref', ['refId'])
export class MailOutbox {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** What the mail is about: `escalation.raised`, `escalation.reminder`, `escalation.second_contact`, `user.invitation`. */
  @Column({ type: 'varchar', length: 40 })
  kind: string;

  /** The record it is about (escalation or user id). */
  @Column({ type: 'uuid', nullable: true })
  refId: string | null;

  @Column({ type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  /** Plain text; emptied once sent when `sensitive` (a set-password link). */
  @Column({ type: 'mediumtext' })
  textBody: string;

  @Column({ type: 'boolean', default: false })
  sensitive: boolean;

  @Column({ type: 'enum', enum: MAIL_STATUSES, default: 'pending' })
  status: MailStatus;

  @Column({ type: 'int', default: 0 })
  attempts: number;

  @Column({ type: 'datetime', precision: 3 })
  nextAttemptAt: Date;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  lastError: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  sentAt: Date | null;

  /** The relay's Message-ID, once sent. */
  @Column({ type: 'varchar', length: 250, nullable: true })
  messageId: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
