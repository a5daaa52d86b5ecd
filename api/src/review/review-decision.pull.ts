import type { PulledKind } from '../sync/sync-handler';
import { ReviewDecision } from './review-decision.entity';

/** Review decisions as tablets pull them (entity `decision`); they are never pushed. */
export const decisionPull: PulledKind<ReviewDecision> = {
  entity: 'decision',
  target: ReviewDecision,
  caseColumn: 'caseId',
  toData: (row) => ({
    caseId: row.caseId,
    scanId: row.scanId,
    kind: row.kind,
    compoundId: row.compoundId,
    compoundName: row.compoundName,
    reason: row.reason,
    comment: row.comment,
    revision: row.revision,
    decidedBy: row.decidedBy,
    decidedByName: row.decidedByName,
    decidedAt: row.decidedAt.toISOString(),
  }),
};
