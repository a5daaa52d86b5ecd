import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** The stored outcome of one pushed change, keyed by its changeId, so a re-sent change is answered, not re-applied. */
@Entity({ name: 'sync_changes' })
@Index('IDX_sync_changes_user', ['userId', 'processedAt'])
export class SyncChange {
  @PrimaryColumn({ type: 'uuid' })
  changeId: string;

  @Column({ type: 'uuid' })
  userId: string;

  @Column({ type: 'varchar', length: 100 })
  clientId: string;

  @Column({ type: 'uuid' })
  batchId: string;

  @Column({ type: 'varchar', length: 20 })
  entity: string;

  @Column({ type: 'uuid', nullable: true })
  recordId: string | null;

  /** applied, conflict or rejected. */
  @Column({ type: 'varchar', length: 10 })
  status: string;

  @Column({ type: 'int', nullable: true })
  version: number | null;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  reason: string | null;

  @Column({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  processedAt: Date;
}
