import { CASE_STATUSES, type CaseStatus } from '@siteband/shared';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { User } from '../users/user.entity';
import { SyncedRecord } from '../sync/synced-record';

/** A site visit: where, when, under what conditions, by which inspector. Samples, scans and notes hang below it. */
@Entity({ name: 'cases' })
@Index('IDX_cases_syncSeq', ['syncSeq'])
@Index('IDX_cases_inspectorId', ['inspectorId'])
export class Case extends SyncedRecord {
  @Column({ type: 'varchar', length: 200 })
  siteName: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  address: string | null;

  @Column({ type: 'double', nullable: true })
  latitude: number | null;

  @Column({ type: 'double', nullable: true })
  longitude: number | null;

  /** Radius of the position fix in metres, as the device reported it. */
  @Column({ type: 'double', nullable: true })
  locationAccuracyM: number | null;

  /** true when the position was typed in rather than taken from the device. */
  @Column({ type: 'boolean', default: false })
  locationEnteredByHand: boolean;

  @Column({ type: 'datetime', precision: 3 })
  startedAt: Date;

  @Column({ type: 'text', nullable: true })
  weatherNotes: string | null;

  @Column({ type: 'text', nullable: true })
  accessNotes: string | null;

  /** The user who created the case (set by the server from the pushing user). */
  @Column({ type: 'uuid' })
  inspectorId: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'inspectorId', foreignKeyConstraintName: 'FK_cases_inspector' })
  inspector?: User;

  @Column({ type: 'enum', enum: CASE_STATUSES, default: 'open' })
  status: CaseStatus;

  /** When the inspector last submitted the case (set by the server); null while it never was. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  submittedAt: Date | null;
}
