import { ApiProperty } from '@nestjs/swagger';
import type { FlatRecord } from '../../cases/dto/case-list.dto';
import { BundleDecisionDto, DecisionDto } from './decision.dto';

/** Everything of a case for its review page. */
export class CaseBundleDto {
  @ApiProperty({ type: Object })
  case: FlatRecord;

  @ApiProperty({ type: Object, isArray: true, description: 'Samples, each with its hand-overs (chain of custody) as `handovers`' })
  samples: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  instrumentChecks: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true, description: 'Scans with result, serverResult, resultMismatch, mismatch and rawAttachmentId' })
  scans: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  notes: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true, description: 'Escalations, each with its notes (oldest first) as `notes`' })
  escalations: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true, description: 'Attachment metadata (bytes through /api/attachments/:id/content)' })
  attachments: FlatRecord[];

  @ApiProperty({ type: BundleDecisionDto, isArray: true, description: 'Every decision, oldest revision first, each marked whether it was made on an earlier submission' })
  decisions: BundleDecisionDto[];

  @ApiProperty({
    type: Object,
    description: 'The current decision of each scan decided on the latest submission, by scan id (its highest revision since then); decisions on an earlier submission do not count towards sign-off',
  })
  currentDecisions: Record<string, DecisionDto>;
}
