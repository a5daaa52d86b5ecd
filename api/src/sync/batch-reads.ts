import type { EntityManager, FindOptionsSelect, FindOptionsWhere } from 'typeorm';
import type { SyncedRecord } from './synced-record';

/**
 * The parent rows a batch's changes look up (their case, sample, scan, instrument check, raw file), each
 * read once per batch: the next change below the same case or scan takes the row already read. A change
 * of the batch that writes a record forgets it, so the next lookup reads it again. Every other writer of
 * synced records takes the sync counter first, which the batch holds until it commits, so a row read
 * once stays as read until the batch itself writes it.
 */
export class BatchReads {
  /** By `Entity:id`, the rows read with each column selection (`*` for whole rows). */
  private readonly rows = new Map<string, Map<string, SyncedRecord | null>>();

  constructor(private readonly manager: EntityManager) {}

  /**
   * The row with this id (null: not on the server), whole or with the `select`ed columns only (for a
   * parent whose large JSON columns the check does not need).
   */
  async findOne<E extends SyncedRecord>(target: new () => E, id: string, select?: FindOptionsSelect<E>): Promise<E | null> {
    const key = `${target.name}:${id}`;
    const columns = select ? Object.keys(select).sort().join(',') : '*';
    const read = this.rows.get(key);
    if (read?.has(columns)) return read.get(columns) as E | null;
    const where = { id } as FindOptionsWhere<E>;
    const row = select ? await this.manager.findOne(target, { select, where }) : await this.manager.findOneBy(target, where);
    this.rows.set(key, (read ?? new Map()).set(columns, row));
    return row;
  }

  /** A change of this batch wrote the record: the next lookup reads it again. */
  forget(target: new () => SyncedRecord, id: string): void {
    this.rows.delete(`${target.name}:${id}`);
  }
}
