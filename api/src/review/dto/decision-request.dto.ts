import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsString, IsUUID, Length, Min, ValidateIf } from 'class-validator';
import { DECISION_KINDS, isScanDecision, type DecisionKind } from '@siteband/shared';

export const MAX_DECISION_TEXT = 2000;

/** `POST /api/review/cases/:caseId/decisions`. Which fields a kind needs is checked here; which it refuses, by the service. */
export class DecisionRequestDto {
  @ApiProperty({ enum: DECISION_KINDS })
  @IsIn(DECISION_KINDS, { message: `kind must be one of ${DECISION_KINDS.join(', ')}` })
  kind: DecisionKind;

  @ApiPropertyOptional({ format: 'uuid', description: 'The scan decided on: required for accept, replace and needs_lab; absent otherwise' })
  @ValidateIf((body: DecisionRequestDto) => body.scanId !== undefined || isScanDecision(body.kind))
  @IsUUID(undefined, { message: 'scanId must be the UUID of a scan of the case (required for accept, replace and needs_lab)' })
  scanId?: string;

  @ApiPropertyOptional({ description: 'A compound id of the library in force: required for replace, refused otherwise' })
  @ValidateIf((body: DecisionRequestDto) => body.compoundId !== undefined || body.kind === 'replace')
  @IsString({ message: 'compoundId must name a compound of the library in force (required for replace)' })
  @Length(1, 64)
  compoundId?: string;

  @ApiPropertyOptional({ maxLength: MAX_DECISION_TEXT, description: 'Why: required for replace and reopen' })
  @ValidateIf((body: DecisionRequestDto) => body.reason !== undefined || body.kind === 'replace' || body.kind === 'reopen')
  @IsString({ message: 'reason must be a text (required for replace and reopen)' })
  @Length(1, MAX_DECISION_TEXT, { message: `reason must be 1 to ${MAX_DECISION_TEXT} characters (required for replace and reopen)` })
  reason?: string;

  @ApiPropertyOptional({ maxLength: MAX_DECISION_TEXT, description: 'For the inspector: required for return' })
  @ValidateIf((body: DecisionRequestDto) => body.comment !== undefined || body.kind === 'return')
  @IsString({ message: 'comment must be a text (required for return)' })
  @Length(1, MAX_DECISION_TEXT, { message: `comment must be 1 to ${MAX_DECISION_TEXT} characters (required for return)` })
  comment?: string;

  @ApiProperty({ minimum: 1, description: "The case's version the decision was made on: 409 when the case has moved on" })
  @IsInt({ message: "baseVersion must be the case's version you decided on" })
  @Min(1)
  baseVersion: number;
}
