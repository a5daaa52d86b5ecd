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
 * The next sequence number, counted only in memory: for a writer that hands out many in one transaction
 * and then stores the counter's `value` once, before it commits.
 */
export function nextSyncSeq(counter: SyncCounter): number {
  counter.value += 1;
  return counter.value;
}
