import type { DecisionRow } from '../../db/decisionsTable';

/** What the supervisor's decisions mean for the inspector's view of a case. */
export interface ReviewOutcome {
  /** The current decision of each scan: its highest revision. */
  byScan: ReadonlyMap<string, DecisionRow>;
  /** The latest decision about the whole case (return, sign-off, reopen), if any. */
  caseDecision: DecisionRow | undefined;
  /** Every decision, newest revision first. */
  history: readonly DecisionRow[];
}

/** Reads a case's decisions: the current one per scan and the latest one about the whole case. */
export function reviewOutcome(decisions: readonly DecisionRow[]): ReviewOutcome {
  const history = [...decisions].sort((a, b) => b.revision - a.revision);
  const byScan = new Map<string, DecisionRow>();
  let caseDecision: DecisionRow | undefined;
  for (const decision of history) {
    if (decision.scanId === null) caseDecision ??= decision;
    else if (!byScan.has(decision.scanId)) byScan.set(decision.scanId, decision);
  }
  return { byScan, caseDecision, history };
}
