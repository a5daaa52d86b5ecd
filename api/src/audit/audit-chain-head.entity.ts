import { Column, Entity, PrimaryColumn } from 'typeorm';
import { BIGINT_AS_NUMBER } from '../sync/synced-record';

/**
 * The one row naming the last audit entry (its seq and hash). Every writer locks it (SELECT … FOR UPDATE)
 * in its own transaction before appending, so concurrent writers serialise and the chain never forks.
 */
@Entity({ name: 'audit_chain_head' })
export class AuditChainHead {
  @PrimaryColumn({ type: 'tinyint' })
  id: number;

  @Column({ type: 'bigint', transformer: BIGINT_AS_NUMBER })
  lastSeq: number;

  @Column({ type: 'char', length: 64 })
  lastHash: string;
}

/** Id of the single chain-head row (created by the migration). */
export const AUDIT_CHAIN_HEAD_ID = 1;
