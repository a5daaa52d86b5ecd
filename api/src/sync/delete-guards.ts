import { IsNull, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { ChangeRejected } from './sync-handler';
import type { SyncedRecord } from './synced-record';

/** Records below one that keep it from being deleted while any of them is live. */
export interface Dependents<E extends SyncedRecord = SyncedRecord> {
  target: new () => E;
  where: FindOptionsWhere<E>;
  /** How the reason names them, plural ("site notes"). */
  label: string;
}

/**
 * Refuses the delete of `what` while live records point at it: a deletion never leaves records below a
 * tombstone, and a permanent record (never deleted) keeps what it belongs to for good.
 */
export async function refuseWhileReferenced(manager: EntityManager, what: string, dependents: readonly Dependents[]): Promise<void> {
  const found: string[] = [];
  for (const dependent of dependents) {
    const count = await manager.countBy(dependent.target, { ...dependent.where, deletedAt: IsNull() } as FindOptionsWhere<SyncedRecord>);
    if (count > 0) found.push(`${dependent.label}: ${count}`);
  }
  if (found.length > 0) throw new ChangeRejected(`${what} cannot be deleted while it holds ${found.join(', ')}: delete those first (permanent records are never deleted)`);
}

/** Declares dependents with their entity's own where-type checked. */
export function dependents<E extends SyncedRecord>(target: new () => E, where: FindOptionsWhere<E>, label: string): Dependents {
  return { target, where, label } as unknown as Dependents;
}
