import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { SyncedRecord } from '../sync/synced-record';
import { Sample } from './sample.entity';

/** A transfer of custody of a sample (chain of custody): append-only, never changed or deleted. */
@Entity({ name: 'handovers' })
@Index('IDX_handovers_syncSeq', ['syncSeq'])
@Index('IDX_handovers_sampleId', ['sampleId'])
@Index('IDX_handovers_caseId', ['caseId'])
export class Handover extends SyncedRecord {
  @Column({ type: 'uuid' })
  sampleId: string;

  @ManyToOne(() => Sample, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'sampleId', foreignKeyConstraintName: 'FK_handovers_sample' })
  sample?: Sample;

  /** Copied from the sample by the server, for visibility filters. */
  @Column({ type: 'uuid' })
  caseId: string;

  @Column({ type: 'varchar', length: 120 })
  fromParty: string;

  @Column({ type: 'varchar', length: 120 })
  toParty: string;

  @Column({ type: 'datetime', precision: 3 })
  handedOverAt: Date;

  @Column({ type: 'varchar', length: 60, nullable: true })
  sealNumber: string | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;
}
