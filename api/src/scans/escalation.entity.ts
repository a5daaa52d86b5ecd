import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';

/** Escalation statuses: raised (by the tablet) → acknowledged → closed (by a safety officer). */
export const ESCALATION_STATUSES = ['raised', 'acknowledged', 'closed'] as const;
export type EscalationStatus = (typeof ESCALATION_STATUSES)[number];

/** What the safety officer did on acknowledging. */
export const ESCALATION_ACTIONS = ['evacuation_advised', 'ppe_required', 'specialist_team_called', 'no_action'] as const;
export type EscalationAction = (typeof ESCALATION_ACTIONS)[number];

/** Levels of protection A (highest) to D, as the US EPA defines them (40 CFR 1910.120 appendix B, from memory); with `ppe_required`. */
export const PPE_LEVELS = ['A', 'B', 'C', 'D'] as const;
export type PpeLevel = (typeof PPE_LEVELS)[number];

/** A finding sent to a safety officer, raised from a case (and usually one scan of it). */
@Entity({ name: 'escalations' })
@Index('IDX_escalations_syncSeq', ['syncSeq'])
@Index('IDX_escalations_caseId', ['caseId'])
@Index('IDX_escalations_due', ['status', 'nextNotifyAt'])
export class Escalation extends SyncedRecord {
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_escalations_case' })
  parentCase?: Case;

  @Column({ type: 'uuid', nullable: true })
  scanId: string | null;

  /** The user who raised it (set by the server). */
  @Column({ type: 'uuid' })
  raisedBy: string;

  @Column({ type: 'datetime', precision: 3 })
  raisedAt: Date;

  @Column({ type: 'text' })
  reason: string;

  /** Hazard classes behind the escalation, as the tablet's hazard rules named them. */
  @Column({ type: 'json' })
  hazardClasses: string[];

  @Column({ type: 'enum', enum: ESCALATION_STATUSES, default: 'raised' })
  status: EscalationStatus;

  @Column({ type: 'uuid', nullable: true })
  acknowledgedBy: string | null;

  /** The safety officer's display name at the time, so the tablet can show who without a user lookup. */
  @Column({ type: 'varchar', length: 120, nullable: true })
  acknowledgedByName: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  acknowledgedAt: Date | null;

  @Column({ type: 'enum', enum: ESCALATION_ACTIONS, nullable: true })
  actionTaken: EscalationAction | null;

  @Column({ type: 'enum', enum: PPE_LEVELS, nullable: true })
  ppeLevel: PpeLevel | null;

  @Column({ type: 'text', nullable: true })
  ackComment: string | null;

  @Column({ type: 'uuid', nullable: true })
  closedBy: string | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  closedAt: Date | null;

  @Column({ type: 'text', nullable: true })
  closeComment: string | null;

  /** How many rounds of mail to the safety officers have been queued (the first on arrival). */
  @Column({ type: 'int', default: 0 })
  notifiedCount: number;

  /** When the next reminder round is due while still raised; null once acknowledged or closed. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  nextNotifyAt: Date | null;

  /** When the second contact is mailed if still raised: set on arrival when a second contact is configured. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  secondContactDueAt: Date | null;

  /** When the mail to the second contact was queued; null while not (yet) sent. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  secondContactNotifiedAt: Date | null;
}
