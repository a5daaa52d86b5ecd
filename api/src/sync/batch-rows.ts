import { isUUID } from 'class-validator';
import { In, type EntityManager, type FindOptionsSelect, type FindOptionsWhere } from 'typeorm';
import type { SyncedRecord } from './synced-record';

/**
 * Characters of row values per INSERT of several new rows: well below the server's packet limit
 * (MariaDB's max_allowed_packet, 16 MiB by default; from memory) even with every character escaped.
 */
const INSERT_CHARS = 4_000_000;

/** About how many characters a row's values take in an INSERT (JSON columns as JSON text). */
function rowChars(row: SyncedRecord): number {
  let chars = 0;
  for (const value of Object.values(row)) {
    if (typeof value === 'string') chars += value.length;
    else if (value !== null && typeof value === 'object' && !(value instanceof Date)) chars += JSON.stringify(value).length;
    else chars += 24;
  }
  return chars;
}

/** A row a change looks up: its kind, its id, and the columns it needs (with the id; all when none are named). */
export interface RowRef<E extends SyncedRecord = SyncedRecord> {
  target: new () => E;
  id: string;
  select?: FindOptionsSelect<E>;
}

/** The refs of the ids that are UUIDs (a change's data before validation may name anything). */
export function refsOf<E extends SyncedRecord>(target: new () => E, ids: readonly unknown[], select?: FindOptionsSelect<E>): RowRef<E>[] {
  return ids.flatMap((id) => (typeof id === 'string' && isUUID(id) ? [{ target, id, ...(select ? { select } : {}) }] : []));
}

/** The key of a column selection in what was read. */
const columnsOf = (select: object | undefined) => (select ? Object.keys(select).sort().join(',') : '*');

/** New rows of one kind, made one after the other, written by one INSERT. */
interface InsertRun {
  target: new () => SyncedRecord;
  rows: SyncedRecord[];
  chars: number;
}

/**
 * The rows a batch works on, in its transaction.
 *
 * Parents (a change's case, sample, scan, instrument check, raw file) are read once per batch: the next
 * change below the same case or scan takes the row already read. The parents the batch's changes name
 * (`SyncHandler.parentsOf`) are read together before the first change (`prefetch`). Every other writer of synced records
 * takes the sync counter first, which the batch holds until it commits, so a row read once stays as read
 * until the batch itself writes it; a write of the batch forgets it, and the next lookup reads it again.
 *
 * New rows are written together: consecutive creates of one kind go in one INSERT, sent before anything
 * reads that kind of record again (`findOne`, `reread`) and, by `flush`, before any other write or read of
 * the batch that may depend on them (updates, delete checks, listeners, the end of the batch).
 */
export class BatchRows {
  /** By `Entity:id`, the rows read with each column selection (`*` for whole rows). */
  private readonly read = new Map<string, Map<string, SyncedRecord | null>>();
  /** New rows not written yet, in the order they were made. */
  private pending: InsertRun[] = [];

  constructor(private readonly manager: EntityManager) {}

  /**
   * The row with this id (null: not on the server) as a parent, whole or with the `select`ed columns
   * only (for a parent whose large JSON columns the check does not need).
   */
  async findOne<E extends SyncedRecord>(target: new () => E, id: string, select?: FindOptionsSelect<E>): Promise<E | null> {
    const columns = columnsOf(select);
    const known = this.read.get(`${target.name}:${id}`);
    if (known?.has(columns)) return known.get(columns) as E | null;
    await this.flushBefore(target);
    const where = { id } as FindOptionsWhere<E>;
    const row = select ? await this.manager.findOne(target, { select, where }) : await this.manager.findOneBy(target, where);
    this.remember(target, id, columns, row);
    return row;
  }

  /**
   * Reads rows the batch's changes will look up, together: one query per kind of record and column
   * selection instead of one per row. Rows already read are left as they are.
   */
  async prefetch(refs: readonly RowRef[]): Promise<void> {
    const groups = new Map<string, { target: new () => SyncedRecord; select?: FindOptionsSelect<SyncedRecord>; ids: Set<string> }>();
    for (const ref of refs) {
      const columns = columnsOf(ref.select);
      if (this.read.get(`${ref.target.name}:${ref.id}`)?.has(columns)) continue;
      const key = `${ref.target.name}|${columns}`;
      let group = groups.get(key);
      if (!group) groups.set(key, (group = { target: ref.target, select: ref.select as FindOptionsSelect<SyncedRecord> | undefined, ids: new Set<string>() }));
      group.ids.add(ref.id);
    }
    for (const { target, select, ids } of groups.values()) {
      await this.flushBefore(target);
      const where = { id: In([...ids]) };
      const rows = select ? await this.manager.find(target, { select, where }) : await this.manager.findBy(target, where);
      const columns = columnsOf(select);
      // null: looked up and not on the server.
      for (const id of ids) this.remember(target, id, columns, null);
      for (const row of rows) this.remember(target, row.id, columns, row);
    }
  }

  /** The whole row as it is now, read again (a record a change of this batch already wrote). */
  async reread<E extends SyncedRecord>(target: new () => E, id: string): Promise<E | null> {
    await this.flushBefore(target);
    return this.manager.findOneBy(target, { id } as FindOptionsWhere<E>);
  }

  /** A new row, written with the next new rows of its kind (at the latest by `flush`). */
  insert(target: new () => SyncedRecord, row: SyncedRecord): void {
    this.forget(target, row.id);
    const chars = rowChars(row);
    const last = this.pending.at(-1);
    if (last && last.target === target && last.chars + chars <= INSERT_CHARS) {
      last.rows.push(row);
      last.chars += chars;
    } else {
      this.pending.push({ target, rows: [row], chars });
    }
  }

  /** A change of this batch wrote the record: the next lookup reads it again. */
  forget(target: new () => SyncedRecord, id: string): void {
    this.read.delete(`${target.name}:${id}`);
  }

  /** Writes the new rows, in the order they were made (parents before their children). */
  async flush(): Promise<void> {
    const runs = this.pending;
    this.pending = [];
    for (const run of runs) {
      // Plain INSERTs: the rows are known to be new, and nothing the answers need is generated by the database.
      await this.manager.createQueryBuilder().insert().into(run.target).values(run.rows).updateEntity(false).execute();
    }
  }

  private remember(target: new () => SyncedRecord, id: string, columns: string, row: SyncedRecord | null): void {
    const key = `${target.name}:${id}`;
    this.read.set(key, (this.read.get(key) ?? new Map<string, SyncedRecord | null>()).set(columns, row));
  }

  /** Writes the new rows before a read of `target` when some are of that kind. */
  private async flushBefore(target: new () => SyncedRecord): Promise<void> {
    if (this.pending.some((run) => run.target === target)) await this.flush();
  }
}
