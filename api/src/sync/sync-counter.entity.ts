import { Column, Entity, PrimaryColumn } from 'typeorm';
import { BIGINT_AS_NUMBER } from './synced-record';

/**
 * The one row holding the last sync sequence number handed out. Every synced write locks it
 * (SELECT … FOR UPDATE, or the UPDATE that takes the next number) until its transaction commits, so sequence numbers become visible in order and a
 * pull cursor never skips a write that commits later.
 */
@Entity({ name: 'sync_counter' })
export class SyncCounter {
  @PrimaryColumn({ type: 'tinyint' })
  id: number;

  @Column({ type: 'bigint', transformer: BIGINT_AS_NUMBER })
  value: number;
}

/** Id of the single counter row (created by the migration). */
export const SYNC_COUNTER_ID = 1;
