import { ApiProperty } from '@nestjs/swagger';
import { CASE_STATUSES, DECISION_KINDS, type CaseStatus, type DecisionKind } from '@siteband/shared';

/** One review decision, as the review screens see it (the same fields tablets pull as `decision`). */
export class DecisionDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ format: 'uuid' })
  caseId: string;

  @ApiProperty({ type: String, format: 'uuid', nullable: true })
  scanId: string | null;

  @ApiProperty({ enum: DECISION_KINDS })
  kind: DecisionKind;

  @ApiProperty({ type: String, nullable: true })
  compoundId: string | null;

  @ApiProperty({ type: String, nullable: true })
  compoundName: string | null;

  @ApiProperty({ type: String, nullable: true })
  reason: string | null;

  @ApiProperty({ type: String, nullable: true })
  comment: string | null;

  @ApiProperty({ description: '1, 2, 3… per case' })
  revision: number;

  @ApiProperty({ format: 'uuid' })
  decidedBy: string;

  @ApiProperty()
  decidedByName: string;

  @ApiProperty({ type: String, format: 'date-time' })
  decidedAt: string;
}

/** A decision in a case's bundle: whether it was made on an earlier submission (before a return the inspector has answered by submitting again). */
export class BundleDecisionDto extends DecisionDto {
  @ApiProperty({ description: 'Made on an earlier submission: history, shown, but it does not count towards sign-off' })
  earlier: boolean;
}

/** The case after a decision: its status and the version to decide on next. */
export class DecidedCaseDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: CASE_STATUSES })
  status: CaseStatus;

  @ApiProperty()
  version: number;
}

/** Answer of `POST /api/review/cases/:caseId/decisions`. */
export class DecisionResultDto {
  @ApiProperty({ type: DecisionDto })
  decision: DecisionDto;

  @ApiProperty({ type: DecidedCaseDto })
  case: DecidedCaseDto;
}
