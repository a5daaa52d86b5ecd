import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';

/** A timestamped free-text observation on a case, optionally about one sample. */
@Entity({ name: 'site_notes' })
@Index('IDX_site_notes_syncSeq', ['syncSeq'])
@Index('IDX_site_notes_caseId', ['caseId'])
export class SiteNote extends SyncedRecord {
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_site_notes_case' })
  parentCase?: Case;

  @Column({ type: 'uuid', nullable: true })
  sampleId: string | null;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'datetime', precision: 3 })
  recordedAt: Date;

  /** The user who wrote it (set by the server). */
  @Column({ type: 'uuid' })
  authorId: string;
}
