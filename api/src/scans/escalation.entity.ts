import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';

/** Escalation statuses; only `raised` exists until the safety officer's workflow arrives. */
export const ESCALATION_STATUSES = ['raised'] as const;
export type EscalationStatus = (typeof ESCALATION_STATUSES)[number];

/** A finding sent to a safety officer, raised from a case (and usually one scan of it). */
@Entity({ name: 'escalations' })
@Index('IDX_escalations_syncSeq', ['syncSeq'])
@Index('IDX_escalations_caseId', ['caseId'])
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
}
