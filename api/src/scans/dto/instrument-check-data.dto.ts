import { ArrayMaxSize, IsArray, IsBoolean, IsISO8601, IsObject, IsString, IsUUID, Length } from 'class-validator';
import { MaxJsonLength } from '../../sync/json-field.validators';

/** An instrument check as the tablet sends it. */
export class InstrumentCheckDataDto {
  @IsUUID()
  caseId: string;

  @IsString()
  @Length(1, 60)
  standardId: string;

  @IsISO8601({ strict: true })
  performedAt: string;

  @IsBoolean()
  passed: boolean;

  /** One object per reference band (expected and observed position, offset, tolerance...). */
  @IsArray()
  @ArrayMaxSize(200)
  @IsObject({ each: true })
  @MaxJsonLength(50_000)
  offsets: Record<string, unknown>[];
}
