import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { Escalation } from '../scans/escalation.entity';
import { SyncedRecord } from '../sync/synced-record';

/** A safety officer's or supervisor's note on an escalation; written by the server, pulled by tablets. Never changed. */
@Entity({ name: 'escalation_notes' })
@Index('IDX_escalation_notes_syncSeq', ['syncSeq'])
@Index('IDX_escalation_notes_caseId', ['caseId'])
@Index('IDX_escalation_notes_escalationId', ['escalationId', 'at'])
export class EscalationNote extends SyncedRecord {
  @Column({ type: 'uuid' })
  escalationId: string;

  @ManyToOne(() => Escalation, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'escalationId', foreignKeyConstraintName: 'FK_escalation_notes_escalation' })
  escalation?: Escalation;

  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_escalation_notes_case' })
  parentCase?: Case;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'uuid' })
  authorId: string;

  /** The author's display name at the time. */
  @Column({ type: 'varchar', length: 120 })
  authorName: string;

  @Column({ type: 'datetime', precision: 3 })
  at: Date;
}
