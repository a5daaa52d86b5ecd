import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';

/** What the collector saw. There is deliberately no odour field: unknown substances are never sniffed. */
export interface SampleObservations {
  colour?: string;
  state?: string;
  notes?: string;
}

/** One physical sample taken on site. */
@Entity({ name: 'samples' })
@Index('IDX_samples_syncSeq', ['syncSeq'])
@Index('IDX_samples_caseId', ['caseId'])
export class Sample extends SyncedRecord {
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_samples_case' })
  parentCase?: Case;

  @Column({ type: 'varchar', length: 120 })
  label: string;

  @Column({ type: 'varchar', length: 200, nullable: true })
  container: string | null;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  locationOnSite: string | null;

  @Column({ type: 'json' })
  observations: SampleObservations;

  /** Name of the person who took the sample (not necessarily a Siteband user). */
  @Column({ type: 'varchar', length: 120 })
  collectedBy: string;

  @Column({ type: 'datetime', precision: 3 })
  collectedAt: Date;

  @Column({ type: 'varchar', length: 60, nullable: true })
  sealNumber: string | null;
}
