import { IsIn, IsInt, IsObject, IsUUID, Min, ValidateIf } from 'class-validator';
import { SYNC_ENTITIES, type SyncEntityName } from '../sync-handler';

export const SYNC_OPS = ['upsert', 'delete'] as const;
export type SyncOp = (typeof SYNC_OPS)[number];

/** One change in a push: which record, what to do, and the server version the client started from. */
export class ChangeEnvelopeDto {
  @IsUUID()
  changeId: string;

  @IsIn(SYNC_ENTITIES, { message: `entity must be one of ${SYNC_ENTITIES.join(', ')}` })
  entity: SyncEntityName;

  @IsIn(SYNC_OPS, { message: 'op must be upsert or delete' })
  op: SyncOp;

  @IsUUID()
  id: string;

  /** null for a record the server has never seen; otherwise the version the client edited. */
  @ValidateIf((change: ChangeEnvelopeDto) => change.baseVersion !== null)
  @IsInt({ message: 'baseVersion must be null (new record) or the server version the change was made from' })
  @Min(1)
  baseVersion: number | null;

  /** The whole record (not a patch) for an upsert; ignored for a delete. */
  @ValidateIf((change: ChangeEnvelopeDto) => change.op === 'upsert' || change.data !== undefined)
  @IsObject()
  data?: Record<string, unknown>;
}
