import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { HAZARD_RANK_LABELS, MAX_HAZARD_RANK, type HazardRank, type HazardRankLabel } from '@siteband/shared';
import { Transform, Type } from 'class-transformer';
import { ArrayNotEmpty, IsIn, IsInt, IsISO8601, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';
import { CASE_STATUSES, type CaseStatus } from '@siteband/shared';
import { PageQuery, type PageLimits } from '../../common/page-query';

/** Review queue pages: 25 cases unless asked, at most 100. */
export const QUEUE_PAGE: PageLimits = { defaultPageSize: 25, maxPageSize: 100 };
export const QUEUE_SORTS = ['startedAt', 'submittedAt', 'siteName', 'inspector', 'status', 'highestHazard'] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];
/** Without a status filter the queue shows every case that left the tablet (all but `open`). */
export const DEFAULT_QUEUE_STATUSES = CASE_STATUSES.filter((status) => status !== 'open');

/** `GET /api/review/queue` and `GET /api/review/queue.csv`: paging (ignored by the CSV), sort and filters. */
export class QueueQueryDto extends PageQuery(QUEUE_PAGE) {
  @ApiPropertyOptional({ enum: QUEUE_SORTS, default: 'highestHazard' })
  @IsOptional()
  @IsIn(QUEUE_SORTS, { message: `sort must be one of ${QUEUE_SORTS.join(', ')}` })
  sort?: QueueSort;

  @ApiPropertyOptional({ enum: ['asc', 'desc'], description: 'Default desc for highestHazard, asc otherwise' })
  @IsOptional()
  @IsIn(['asc', 'desc'], { message: 'order must be asc or desc' })
  order?: 'asc' | 'desc';

  @ApiPropertyOptional({ description: `Comma-separated statuses (${CASE_STATUSES.join(', ')}); default all but open`, example: 'submitted,in_review' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.split(',').map((part) => part.trim()) : value))
  @ArrayNotEmpty({ message: 'status must list at least one status' })
  @IsIn(CASE_STATUSES, { each: true, message: `status must be a comma-separated list of ${CASE_STATUSES.join(', ')}` })
  status?: CaseStatus[];

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID(undefined, { message: 'inspectorId must be a user id (UUID)' })
  inspectorId?: string;

  @ApiPropertyOptional({ description: 'Part of the site name' })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  site?: string;

  @ApiPropertyOptional({ description: 'Visits started at or after (ISO 8601 date or date-time)' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'from must be an ISO 8601 date or date-time' })
  from?: string;

  @ApiPropertyOptional({ description: 'Visits started at or before (ISO 8601; a date alone includes that whole day, UTC)' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'to must be an ISO 8601 date or date-time' })
  to?: string;

  @ApiPropertyOptional({ minimum: 0, maximum: MAX_HAZARD_RANK, description: 'Minimum highest-hazard rank' })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: `hazard must be a rank from 0 to ${MAX_HAZARD_RANK}` })
  @Min(0, { message: `hazard must be a rank from 0 to ${MAX_HAZARD_RANK}` })
  @Max(MAX_HAZARD_RANK, { message: `hazard must be a rank from 0 to ${MAX_HAZARD_RANK}` })
  hazard?: number;

  @ApiPropertyOptional({ description: 'A likely compound: its library id, or part of its name' })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  compound?: string;

  @ApiPropertyOptional({ description: 'Free text in the site name or address' })
  @IsOptional()
  @IsString()
  @Length(1, 200)
  q?: string;
}

export class QueueInspectorDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  displayName: string;
}

export class HighestHazardDto {
  @ApiProperty({ minimum: 0, maximum: MAX_HAZARD_RANK, description: '3 escalation, 2 Danger, 1 Warning, 0 none' })
  rank: HazardRank;

  @ApiProperty({ enum: HAZARD_RANK_LABELS })
  label: HazardRankLabel;
}

export class CompoundRefDto {
  @ApiProperty()
  id: string;

  @ApiProperty()
  name: string;
}

/** One row of the review queue. */
export class QueueItemDto {
  @ApiProperty({ format: 'uuid' })
  caseId: string;

  @ApiProperty()
  siteName: string;

  @ApiProperty({ type: String, nullable: true })
  address: string | null;

  @ApiProperty({ enum: CASE_STATUSES })
  status: CaseStatus;

  @ApiProperty({ type: QueueInspectorDto })
  inspector: QueueInspectorDto;

  @ApiProperty({ type: String, format: 'date-time' })
  startedAt: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  submittedAt: string | null;

  @ApiProperty({ type: HighestHazardDto })
  highestHazard: HighestHazardDto;

  @ApiProperty({ type: CompoundRefDto, isArray: true, description: 'First likely compound of each scan, distinct, at most 5' })
  likelyCompounds: CompoundRefDto[];

  @ApiProperty()
  samples: number;

  @ApiProperty()
  scans: number;

  @ApiProperty()
  openEscalations: number;

  @ApiProperty({ description: 'The case version: send it as baseVersion with a decision' })
  version: number;
}

/** One page of the review queue. */
export class QueuePageDto {
  @ApiProperty({ type: QueueItemDto, isArray: true })
  items: QueueItemDto[];

  @ApiProperty({ description: 'Matching cases in all pages' })
  total: number;

  @ApiProperty()
  page: number;

  @ApiProperty()
  pageSize: number;
}
