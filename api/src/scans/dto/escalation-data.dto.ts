import { ArrayMaxSize, IsArray, IsISO8601, IsOptional, IsString, IsUUID, Length } from 'class-validator';

/** An escalation as the tablet raises it. */
export class EscalationDataDto {
  @IsUUID()
  caseId: string;

  @IsOptional()
  @IsUUID()
  scanId?: string | null;

  @IsISO8601({ strict: true })
  raisedAt: string;

  @IsString()
  @Length(1, 2000)
  reason: string;

  @IsArray()
  @ArrayMaxSize(50)
  @IsString({ each: true })
  @Length(1, 120, { each: true })
  hazardClasses: string[];
}
