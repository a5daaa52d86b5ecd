import { ApiProperty } from '@nestjs/swagger';
import { CASE_STATUSES, type CaseStatus } from '../../cases/case.entity';
import { DECISION_KINDS, type DecisionKind } from '../review-decision.entity';

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
