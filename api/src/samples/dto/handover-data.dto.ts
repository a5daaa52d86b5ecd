import { IsISO8601, IsOptional, IsString, IsUUID, Length, MaxLength } from 'class-validator';

/** A hand-over as the tablet sends it: who passed the sample to whom, when, under which seal. */
export class HandoverDataDto {
  @IsUUID()
  sampleId: string;

  @IsString()
  @Length(1, 120)
  from: string;

  @IsString()
  @Length(1, 120)
  to: string;

  @IsISO8601({ strict: true })
  at: string;

  @IsOptional()
  @IsString()
  @MaxLength(60)
  sealNumber?: string | null;

  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string | null;
}
