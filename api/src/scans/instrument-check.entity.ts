import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Case } from '../cases/case.entity';
import { SyncedRecord } from '../sync/synced-record';

/** A check of the spectrometer against a reference standard, done on site before scanning. A permanent record. */
@Entity({ name: 'instrument_checks' })
@Index('IDX_instrument_checks_syncSeq', ['syncSeq'])
@Index('IDX_instrument_checks_caseId', ['caseId'])
export class InstrumentCheck extends SyncedRecord {
  @Column({ type: 'uuid' })
  caseId: string;

  @ManyToOne(() => Case, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'caseId', foreignKeyConstraintName: 'FK_instrument_checks_case' })
  parentCase?: Case;

  /** Which reference standard was measured (an id from the shared instrument-check catalogue). */
  @Column({ type: 'varchar', length: 60 })
  standardId: string;

  @Column({ type: 'datetime', precision: 3 })
  performedAt: Date;

  @Column({ type: 'boolean' })
  passed: boolean;

  /** Per-band offsets as the tablet measured them. */
  @Column({ type: 'json' })
  offsets: unknown[];

  /** The user who pushed the check (set by the server). */
  @Column({ type: 'uuid' })
  performedBy: string;
}
