import type { EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import type { BatchRows, RowRef } from './batch-rows';
import type { SyncedRecord } from './synced-record';

/** The kinds of record a client can pull; all but `decision` and `escalationNote` (written by the review and escalation routes) can be pushed too. */
export const SYNC_ENTITIES = ['case', 'sample', 'handover', 'scan', 'note', 'instrumentCheck', 'escalation', 'attachment', 'decision', 'escalationNote'] as const;
export type SyncEntityName = (typeof SYNC_ENTITIES)[number];

/**
 * How a reason names each kind of record: the words people read next to the record, while the result's
 * `entity` keeps the protocol name for programs.
 */
export const ENTITY_NOUNS: Readonly<Record<SyncEntityName, string>> = {
  case: 'case',
  sample: 'sample',
  handover: 'hand-over',
  scan: 'scan',
  note: 'site note',
  instrumentCheck: 'instrument check',
  escalation: 'escalation',
  attachment: 'attachment',
  decision: 'review decision',
  escalationNote: 'escalation note',
};

/** A change the server refuses, with the reason the client shows next to the record. */
export class ChangeRejected extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = 'ChangeRejected';
  }
}

/** What a handler may use while a change is applied: the change's own transaction, who sent it, and the batch's parent lookups. */
export interface ChangeContext {
  manager: EntityManager;
  user: AuthenticatedUser;
  /**
   * The batch's rows: look parents (case, sample, scan...) up here rather than through `manager`. The
   * batch's new rows reach the database together, so a read through `manager` sees them only after
   * `rows.flush()` (the change applier flushes before delete checks and listeners).
   */
  rows: BatchRows;
}

/** What a pull needs of one kind of record: its table, its case link and its client view. */
export interface PulledKind<E extends SyncedRecord = SyncedRecord> {
  entity: SyncEntityName;
  /** The TypeORM entity class. */
  target: new () => E;
  /** The column naming the case a row belongs to, for visibility filters (`id` for cases themselves). */
  caseColumn: 'id' | 'caseId';
  /** The record's fields as clients see them (no id, version or sync fields: the envelope carries those). */
  toData(row: E): Record<string, unknown>;
}

/**
 * How sync treats one kind of record clients push. The generic part (idempotency, versions, sequence
 * numbers, conflicts) lives in the change applier; a handler only knows its own fields and parent links.
 */
export interface SyncHandler<E extends SyncedRecord = SyncedRecord, D extends object = object> extends PulledKind<E> {
  /** The class-validator class for `data` of an upsert (full record, not a patch). */
  dataClass: new () => D;
  /** Created once, never changed or deleted through sync (e.g. hand-overs: the chain of custody is append-only). */
  appendOnly: boolean;
  /**
   * Checks the write is allowed (the case is the user's and open, parents exist in that case) and
   * returns the case id. Throws `ChangeRejected` otherwise.
   */
  authorize(ctx: ChangeContext, id: string, data: D | null, existing: E | null): Promise<string>;
  /**
   * The parents an upsert's `data` names, read for the whole batch before its first change (`authorize`
   * then finds them in `ctx.rows`). `data` is not validated yet: only ids that are UUIDs are named.
   */
  parentsOf?(data: Record<string, unknown>): RowRef[];
  /**
   * Copies `data` onto the row; server-owned fields (case link, author, status...) are set when `isNew`.
   * Throws `ChangeRejected` on a forbidden change.
   */
  assign(ctx: ChangeContext, row: E, data: D, target: { caseId: string; isNew: boolean }): void | Promise<void>;
  /**
   * Refuses, with `ChangeRejected`, a delete that `authorize` lets through but this kind of record
   * must not take (records still below it, a permanent file). Called after `authorize`.
   */
  checkDelete?(ctx: ChangeContext, existing: E): Promise<void>;
}

/**
 * Work that must commit or roll back with an applied change (e.g. the mails of a new escalation):
 * called in the change's transaction after the row is saved. Provided under `SYNC_WRITE_LISTENERS`.
 */
export interface SyncWriteListener {
  entity: SyncEntityName;
  afterWrite(manager: EntityManager, row: SyncedRecord, change: { isNew: boolean }): Promise<void>;
}

/** Injection token of the `SyncWriteListener[]` the change applier calls. */
export const SYNC_WRITE_LISTENERS = Symbol('SYNC_WRITE_LISTENERS');
