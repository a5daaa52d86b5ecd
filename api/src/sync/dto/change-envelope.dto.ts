import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsObject, IsUUID, Min, ValidateIf } from 'class-validator';
import { SYNC_ENTITIES, type SyncEntityName } from '../sync-handler';
import { TakenAsIs } from '../validate-data';

export const SYNC_OPS = ['upsert', 'delete'] as const;
export type SyncOp = (typeof SYNC_OPS)[number];

/** One change in a push: which record, what to do, and the server version the client started from. */
export class ChangeEnvelopeDto {
  @ApiProperty({ format: 'uuid', description: 'Made once per change and kept until an answer is read: a re-sent change is answered, not re-applied' })
  @IsUUID()
  changeId: string;

  @ApiProperty({ enum: SYNC_ENTITIES })
  @IsIn(SYNC_ENTITIES, { message: `entity must be one of ${SYNC_ENTITIES.join(', ')}` })
  entity: SyncEntityName;

  @ApiProperty({ enum: SYNC_OPS })
  @IsIn(SYNC_OPS, { message: 'op must be upsert or delete' })
  op: SyncOp;

  @ApiProperty({ format: 'uuid', description: 'The record id (client-generated)' })
  @IsUUID()
  id: string;

  /** null for a record the server has never seen; otherwise the version the client edited. */
  @ApiProperty({ type: Number, nullable: true, minimum: 1, description: 'null for a new record, else the server version the change was made from' })
  @ValidateIf((change: ChangeEnvelopeDto) => change.baseVersion !== null)
  @IsInt({ message: 'baseVersion must be null (new record) or the server version the change was made from' })
  @Min(1)
  baseVersion: number | null;

  /** The whole record (not a patch) for an upsert; ignored for a delete. */
  @ApiPropertyOptional({ type: Object, description: 'The whole record for an upsert (see src/sync/PROTOCOL.md); ignored for a delete' })
  @ValidateIf((change: ChangeEnvelopeDto) => change.op === 'upsert' || change.data !== undefined)
  @IsObject()
  @TakenAsIs()
  data?: Record<string, unknown>;
}
