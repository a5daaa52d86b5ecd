import { DECISION_KINDS, type DecisionKind } from '@siteband/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';
import { User } from '../users/user.entity';

/**
 * One review decision. Append-only: a later decision on the same scan (or case) is a new row with the
 * case's next `revision`; the current decision of a scan is its row with the highest revision. Written by
 * the review routes only, and pulled by tablets as `decision`.
 */
@Entity({ name: 'review_decisions' })
@Index('IDX_review_decisions_syncSeq', ['syncSeq'])
@Index('UQ_review_decisions_case_revision', ['caseId', 'revision'], { unique: true })
@Index('IDX_review_decisions_scanId', ['scanId'])
export class ReviewDecision extends SyncedRecord {
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_review_decisions_case' })
  parentCase?: Case;

  /** The scan decided on; null for a decision on the whole case. */
  @Column({ type: 'uuid', nullable: true })
  scanId: string | null;

  @Column({ type: 'enum', enum: DECISION_KINDS })
  kind: DecisionKind;

  /** The compound that stands for the scan (accept: the first likely compound; replace: the supervisor's choice). */
  @Column({ type: 'varchar', length: 64, nullable: true })
  compoundId: string | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  compoundName: string | null;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Column({ type: 'text', nullable: true })
  comment: string | null;

  /** 1, 2, 3… per case, in the order the decisions were made. */
  @Column({ type: 'int' })
  revision: number;

  @Column({ type: 'uuid' })
  decidedBy: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'decidedBy', foreignKeyConstraintName: 'FK_review_decisions_user' })
  decider?: User;

  /** The supervisor's display name when deciding, so tablets can show it without the user list. */
  @Column({ type: 'varchar', length: 120 })
  decidedByName: string;

  @Column({ type: 'datetime', precision: 3 })
  decidedAt: Date;
}
