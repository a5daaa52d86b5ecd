import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Matches, Max, Min } from 'class-validator';
import { SyncRecordDto } from './sync-record.dto';

export const DEFAULT_PULL_LIMIT = 500;
export const MAX_PULL_LIMIT = 1000;

/** `GET /api/sync/pull` query. */
export class PullQueryDto {
  @ApiPropertyOptional({ description: 'The cursor of the previous pull; omit (or 0) for everything', example: '0' })
  @IsOptional()
  @Matches(/^\d{1,15}$/, { message: 'cursor must be the cursor string of a previous pull (digits)' })
  cursor?: string;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PULL_LIMIT, default: DEFAULT_PULL_LIMIT })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(MAX_PULL_LIMIT)
  limit?: number;
}

/** Records changed after the cursor, oldest write first. */
export class PullResponseDto {
  @ApiProperty({ type: SyncRecordDto, isArray: true })
  changes: SyncRecordDto[];

  @ApiProperty({ description: 'Send this as `cursor` next time' })
  cursor: string;

  @ApiProperty({ description: 'true when more changes wait: pull again at once with the new cursor' })
  hasMore: boolean;
}
