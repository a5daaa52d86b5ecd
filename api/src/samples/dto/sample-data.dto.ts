import { Type } from 'class-transformer';
import { IsIn, IsISO8601, IsObject, IsOptional, IsString, IsUUID, Length, MaxLength, ValidateNested } from 'class-validator';

/** Physical states a collector can record. */
export const SAMPLE_STATES = ['solid', 'powder', 'liquid', 'paste', 'gas', 'mixed', 'unknown'] as const;

/** What the collector saw. No odour: unknown substances are never sniffed, so there is no field for it. */
export class SampleObservationsDto {
  @IsOptional()
  @IsString()
  @MaxLength(120)
  colour?: string;

  @IsOptional()
  @IsIn(SAMPLE_STATES, { message: `state must be one of ${SAMPLE_STATES.join(', ')}` })
  state?: string;

  @IsOptional()
  @IsString()
  @MaxLength(2000)
  notes?: string;
}

/** A sample as the tablet sends it. */
export class SampleDataDto {
  @IsUUID()
  caseId: string;

  @IsString()
  @Length(1, 120)
  label: string;

  @IsOptional()
  @IsString()
  @MaxLength(200)
  container?: string | null;

  @IsOptional()
  @IsString()
  @MaxLength(5000)
  description?: string | null;

  @IsOptional()
  @IsString()
  @MaxLength(500)
  locationOnSite?: string | null;

  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => SampleObservationsDto)
  observations?: SampleObservationsDto;

  @IsString()
  @Length(1, 120)
  collectedBy: string;

  @IsISO8601({ strict: true })
  collectedAt: string;

  @IsOptional()
  @IsString()
  @MaxLength(60)
  sealNumber?: string | null;
}
