import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { SyncRecordDto } from './sync-record.dto';

export const CHANGE_STATUSES = ['applied', 'duplicate', 'conflict', 'rejected'] as const;
export type ChangeStatus = (typeof CHANGE_STATUSES)[number];

/** What happened to one pushed change. */
export class ChangeResultDto {
  @ApiProperty({ description: 'As sent (even when it was not a valid UUID)' })
  changeId: string;

  @ApiProperty({ enum: CHANGE_STATUSES })
  status: ChangeStatus;

  @ApiPropertyOptional({ enum: ['applied', 'conflict', 'rejected'], description: 'For a duplicate: the status of the first delivery' })
  firstStatus?: Exclude<ChangeStatus, 'duplicate'>;

  @ApiPropertyOptional({ description: 'The record version after an applied change' })
  version?: number;

  @ApiPropertyOptional({ description: 'Why a change was rejected or conflicted' })
  reason?: string;

  @ApiPropertyOptional({ type: SyncRecordDto, description: 'For a conflict: the current server record' })
  server?: SyncRecordDto;
}

/** The answer to a push: one result per change, in the order sent. */
export class PushResponseDto {
  @ApiProperty({ type: ChangeResultDto, isArray: true })
  results: ChangeResultDto[];
}
