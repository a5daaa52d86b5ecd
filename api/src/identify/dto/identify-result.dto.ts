import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { PHASES, TECHNIQUES } from './identify-request.dto';

/**
 * The answer of POST /api/identify: the shared `identifyScan` result, plus for a file or spectrum the
 * pipeline's quality verdict and parameters — the same object as the command line's `identify --json`.
 */
export class IdentifyResultDto {
  @ApiPropertyOptional({ example: 'drum-3.csv', description: 'The uploaded file’s name' })
  file?: string;

  @ApiProperty({ enum: TECHNIQUES })
  technique: string;

  @ApiProperty({ enum: PHASES })
  phase: string;

  @ApiProperty({ type: 'object', isArray: true, additionalProperties: true, description: 'Peaks used: { x, height, relativeHeight, widthCm1 }' })
  peaks: Record<string, unknown>[];

  @ApiProperty({
    type: 'object',
    isArray: true,
    additionalProperties: true,
    description: 'Likely compounds, best first: id, name, cas, formula, rank, score (band agreement 0–1), parts, explained, missing, against, hazards (caution cards), listedForCaution',
  })
  candidates: Record<string, unknown>[];

  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true, description: 'Two or three compounds that together explain the scan clearly better' })
  mixture: Record<string, unknown> | null;

  @ApiProperty({ type: String, isArray: true })
  cautions: string[];

  @ApiProperty({ type: 'object', additionalProperties: true, description: '{ required, triggers, rulesVersion }' })
  escalation: Record<string, unknown>;

  @ApiProperty({ description: 'False: no reliable result (see reasons), no ranking' })
  reliable: boolean;

  @ApiProperty({ type: String, isArray: true })
  reasons: string[];

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Version of the library in force the ranking used' })
  libraryVersion: Record<string, unknown>;

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'toleranceCm1, toleranceFrom, methodVersion, libraryCompounds' })
  parameters: Record<string, unknown>;

  @ApiPropertyOptional({ type: 'object', additionalProperties: true, description: 'File or spectrum only: snr, saturated, spikesRemoved, reliable, reasons' })
  quality?: Record<string, unknown>;

  @ApiPropertyOptional({ type: 'object', additionalProperties: true, description: 'File or spectrum only: every processing parameter used' })
  processing?: Record<string, unknown>;
}
