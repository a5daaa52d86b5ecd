import { IsBoolean, IsIn, IsISO8601, IsNumber, IsOptional, IsString, Length, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import type { CaseStatus } from '@siteband/shared';

/** The statuses an inspector may set through sync. */
export const INSPECTOR_CASE_STATUSES = ['open', 'submitted'] as const satisfies readonly CaseStatus[];

/** A case as the tablet sends it (the whole record on every upsert). */
export class CaseDataDto {
  @IsString()
  @Length(1, 200)
  siteName: string;

  @IsOptional()
  @IsString()
  @MaxLength(500)
  address?: string | null;

  /** Latitude and longitude come together or not at all. */
  @ValidateIf((data: CaseDataDto) => data.latitude != null || data.longitude != null)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(-90)
  @Max(90)
  latitude?: number | null;

  @ValidateIf((data: CaseDataDto) => data.latitude != null || data.longitude != null)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(-180)
  @Max(180)
  longitude?: number | null;

  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0)
  @Max(100000)
  locationAccuracyM?: number | null;

  @IsOptional()
  @IsBoolean()
  locationEnteredByHand?: boolean;

  @IsISO8601({ strict: true })
  startedAt: string;

  @IsOptional()
  @IsString()
  @MaxLength(5000)
  weatherNotes?: string | null;

  @IsOptional()
  @IsString()
  @MaxLength(5000)
  accessNotes?: string | null;

  @IsIn(INSPECTOR_CASE_STATUSES, { message: 'status must be open or submitted (review statuses are set by supervisors)' })
  status: (typeof INSPECTOR_CASE_STATUSES)[number];
}
