import { deleteRefusal, findDeleteBlock, type HeldEntity, type HoldingKindOf } from '@siteband/shared';
import { IsNull, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { ChangeRejected } from './sync-handler';
import type { SyncedRecord } from './synced-record';

/** Where the server finds the live records of one holding kind below a record. */
export interface Dependents<E extends SyncedRecord = SyncedRecord> {
  target: new () => E;
  where: FindOptionsWhere<E>;
}

/**
 * Refuses the delete of `what` while live records hold it (the kinds and their order are the shared
 * `HOLDING_RECORDS`, which the tablet checks too): a deletion never leaves records below a tombstone,
 * and a permanent record (never deleted) keeps what it belongs to for good.
 */
export async function refuseWhileHeld<E extends HeldEntity>(
  manager: EntityManager,
  entity: E,
  what: string,
  holders: Readonly<Record<HoldingKindOf<E>, Dependents>>,
): Promise<void> {
  const block = await findDeleteBlock(entity, (kind) =>
    manager.countBy(holders[kind].target, { ...holders[kind].where, deletedAt: IsNull() } as FindOptionsWhere<SyncedRecord>),
  );
  if (block) throw new ChangeRejected(deleteRefusal(what, block));
}

/** Declares where the records of a holding kind are, with their entity's own where-type checked. */
export function dependents<E extends SyncedRecord>(target: new () => E, where: FindOptionsWhere<E>): Dependents {
  return { target, where } as unknown as Dependents;
}
