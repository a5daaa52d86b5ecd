import { IsIn, IsISO8601, IsNumber, IsObject, IsOptional, IsUUID, Matches, Max, Min, ValidateIf } from 'class-validator';
import { MaxJsonLength } from '../../sync/json-field.validators';
import { SCAN_PHASES, SCAN_TECHNIQUES, type ScanPhase, type ScanTechnique } from '../scan.entity';
import { IsIdentificationResult } from './identification-result.validator';

/** Upper bound of the free-form JSON a scan carries (summary and result each). */
export const MAX_SCAN_JSON_CHARS = 200_000;

/** A scan as the tablet sends it. */
export class ScanDataDto {
  @IsUUID()
  sampleId: string;

  @IsIn(SCAN_TECHNIQUES, { message: 'technique must be ir or raman' })
  technique: ScanTechnique;

  @IsIn(SCAN_PHASES, { message: 'phase must be condensed or gas' })
  phase: ScanPhase;

  /** Required for Raman; common laser lines lie from the UV to 1064 nm, so 200–1100 nm bounds typos (common practice). */
  @ValidateIf((data: ScanDataDto) => data.technique === 'raman' || data.excitationNm != null)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'excitationNm (laser wavelength in nm) is required for a Raman scan' })
  @Min(200)
  @Max(1100)
  excitationNm?: number | null;

  @IsISO8601({ strict: true })
  recordedAt: string;

  @IsOptional()
  @IsUUID()
  instrumentCheckId?: string | null;

  @IsOptional()
  @IsUUID()
  rawAttachmentId?: string | null;

  @ValidateIf((data: ScanDataDto) => data.rawAttachmentId != null || data.rawSha256 != null)
  @Matches(/^[0-9a-f]{64}$/, { message: 'rawSha256 must be the lower-case hex SHA-256 of the raw file (64 characters)' })
  rawSha256?: string | null;

  @IsOptional()
  @IsObject()
  @MaxJsonLength(MAX_SCAN_JSON_CHARS)
  parsedSummary?: Record<string, unknown> | null;

  @IsOptional()
  @IsIdentificationResult()
  @MaxJsonLength(MAX_SCAN_JSON_CHARS)
  result?: Record<string, unknown> | null;

  @IsOptional()
  @IsISO8601({ strict: true })
  inspectorAcknowledgedAt?: string | null;
}
