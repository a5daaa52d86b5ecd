import { decisionsInForce, type CaseStatus } from '@siteband/shared';
import type { DecisionRow } from '../../db/decisionsTable';

/** What the supervisor's decisions mean for the inspector's view of a case. */
export interface ReviewOutcome {
  /** The current decision of each scan decided on the latest submission (the server's sign-off rule). */
  byScan: ReadonlyMap<string, DecisionRow>;
  /** For a scan without a current decision: its last decision on an earlier submission, shown as history. */
  earlierByScan: ReadonlyMap<string, DecisionRow>;
  /** The latest decision about the whole case (return, sign-off, reopen), if any. */
  caseDecision: DecisionRow | undefined;
}

/**
 * Reads a case's decisions as the server does (`decisionsInForce` in shared), with the case's status on
 * this tablet: after a return and a new submission, what was decided before the return is history.
 */
export function reviewOutcome(decisions: readonly DecisionRow[], status: CaseStatus): ReviewOutcome {
  const { current } = decisionsInForce(decisions, status);
  const earlierByScan = new Map<string, DecisionRow>();
  let caseDecision: DecisionRow | undefined;
  for (const decision of [...decisions].sort((a, b) => b.revision - a.revision)) {
    if (decision.scanId === null) caseDecision ??= decision;
    // A scan with no current decision has only earlier ones: the newest of them is kept.
    else if (!current.has(decision.scanId) && !earlierByScan.has(decision.scanId)) earlierByScan.set(decision.scanId, decision);
  }
  return { byScan: current, earlierByScan, caseDecision };
}
