import { IsISO8601, IsOptional, IsString, IsUUID, Length } from 'class-validator';

/** A site note as the tablet sends it. */
export class SiteNoteDataDto {
  @IsUUID()
  caseId: string;

  @IsOptional()
  @IsUUID()
  sampleId?: string | null;

  @IsString()
  @Length(1, 5000)
  text: string;

  @IsISO8601({ strict: true })
  recordedAt: string;
}
