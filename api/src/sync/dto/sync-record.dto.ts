import { ApiProperty } from '@nestjs/swagger';
import { SYNC_ENTITIES, type PulledKind, type SyncEntityName } from '../sync-handler';
import type { SyncedRecord } from '../synced-record';

/** One record as the server holds it: in pulls, and as `server` in a conflict. */
export class SyncRecordDto {
  @ApiProperty({ enum: SYNC_ENTITIES })
  entity: SyncEntityName;

  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ description: 'Row version: send it as baseVersion when changing this record' })
  version: number;

  @ApiProperty({ description: 'Sync sequence number of the last write' })
  syncSeq: number;

  @ApiProperty({ description: 'true for a tombstone: the record was deleted' })
  deleted: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;

  @ApiProperty({ type: Object, description: 'The record fields (the upsert data plus server-owned fields)' })
  data: Record<string, unknown>;

  /** The client view of a row, through its handler. */
  static of(handler: PulledKind, row: SyncedRecord): SyncRecordDto {
    return Object.assign(new SyncRecordDto(), {
      entity: handler.entity,
      id: row.id,
      version: row.version,
      syncSeq: row.syncSeq,
      deleted: row.deletedAt !== null,
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
      data: handler.toData(row),
    });
  }
}
