import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { BIGINT_AS_NUMBER } from '../sync/synced-record';

/**
 * One entry of the audit trail: who did what to which record, with the record before and after. Entries
 * are append-only and hash-chained: `hash` covers every other column and the previous entry's hash
 * (`prevHash`), so a changed, removed or reordered entry breaks the chain at that `seq`.
 */
@Entity({ name: 'audit_log' })
@Index('IDX_audit_log_entity', ['entity', 'entityId'])
@Index('IDX_audit_log_caseId', ['caseId'])
export class AuditEntry {
  /** 1, 2, 3… without gaps, handed out under the chain-head lock. */
  @PrimaryColumn({ type: 'bigint', transformer: BIGINT_AS_NUMBER })
  seq: number;

  @Column({ type: 'datetime', precision: 3 })
  at: Date;

  /** The user who made the change; null for the server's own work. */
  @Column({ type: 'uuid', nullable: true })
  actorId: string | null;

  @Column({ type: 'varchar', length: 20, nullable: true })
  actorRole: string | null;

  /** The kind of record (`case`, `sample`, …, `decision`, `user`). */
  @Column({ type: 'varchar', length: 40 })
  entity: string;

  @Column({ type: 'varchar', length: 64 })
  entityId: string;

  /** The case the record belongs to, when it belongs to one. */
  @Column({ type: 'uuid', nullable: true })
  caseId: string | null;

  /** What happened (`create`, `update`, `delete`, `acknowledge`, …). */
  @Column({ type: 'varchar', length: 40 })
  action: string;

  /** The record before the change (null when it was created), as canonical JSON. */
  @Column({ type: 'longtext', nullable: true })
  before: string | null;

  /** The record after the change (null when it was deleted), as canonical JSON. */
  @Column({ type: 'longtext', nullable: true })
  after: string | null;

  @Column({ type: 'char', length: 64 })
  prevHash: string;

  @Column({ type: 'char', length: 64 })
  hash: string;
}
