import type { EntityManager } from 'typeorm';
import { SYNC_COUNTER_ID, SyncCounter } from './sync-counter.entity';

/**
 * Locks the sync counter for the rest of the transaction and returns it. Every synced write takes it
 * first, which serialises writers: sequence numbers then commit in order and a pull cursor never skips
 * a write that was still in flight.
 */
export async function lockSyncCounter(manager: EntityManager): Promise<SyncCounter> {
  const counter = await manager.findOne(SyncCounter, { where: { id: SYNC_COUNTER_ID }, lock: { mode: 'pessimistic_write' } });
  if (!counter) throw new Error('The sync_counter row is missing: run the migrations');
  return counter;
}

/** Hands out the next sequence number from a counter locked by `lockSyncCounter` in this transaction. */
export async function takeSyncSeq(manager: EntityManager, counter: SyncCounter): Promise<number> {
  const seq = nextSyncSeq(counter);
  await manager.update(SyncCounter, { id: SYNC_COUNTER_ID }, { value: counter.value });
  return seq;
}

/**
 * Locks the sync counter for the rest of the transaction and hands out its next sequence number, in one
 * statement (the UPDATE takes the same row lock as `lockSyncCounter`): for a writer that needs one number
 * and reads nothing under the lock before. LAST_INSERT_ID(expr) makes the server answer the new value
 * with the statement (MariaDB's LAST_INSERT_ID documentation; from memory).
 */
export async function lockAndTakeSyncSeq(manager: EntityManager): Promise<number> {
  const done: { affectedRows: number; insertId: number | string } = await manager.query(
    'UPDATE `sync_counter` SET `value` = LAST_INSERT_ID(`value` + 1) WHERE `id` = ?',
    [SYNC_COUNTER_ID],
  );
  if (done.affectedRows !== 1) throw new Error('The sync_counter row is missing: run the migrations');
  return Number(done.insertId);
}

/**
 * The next sequence number, counted only in memory: for a writer that hands out many in one transaction
 * and then stores the counter's `value` once, before it commits.
 */
export function nextSyncSeq(counter: SyncCounter): number {
  counter.value += 1;
  return counter.value;
}
