import type { CaseStatus } from './case-status.js';
import type { DecisionKind } from './decision-kinds.js';

/** What the rule reads of a decision. */
export interface RevisedDecision {
  scanId: string | null;
  kind: DecisionKind;
  revision: number;
}

/** A case in one of these statuses is with the inspector after a return and has not been submitted again. */
const WITH_INSPECTOR: readonly CaseStatus[] = ['returned', 'open'];

/** Which decisions of a case stand for its latest submission. */
export interface DecisionsInForce<T extends RevisedDecision> {
  /** The current decision of each scan decided on the latest submission: its highest revision since then. */
  current: Map<string, T>;
  /** True for a decision made on an earlier submission: history, shown, but it satisfies nothing. */
  isEarlier: (decision: T) => boolean;
}

/**
 * The sign-off rule's reading of a case's decisions. A `return` sends the submission back; what the
 * supervisor decided on it, the return included, is history once the inspector submits again, so every
 * scan needs a fresh decision on the resubmitted state (a scan the inspector changed after the return
 * above all). Decisions are only taken while a case is submitted or in review, so in those statuses (and
 * accepted) the latest return has been answered by a new submission; while the case is returned or open
 * again, the submission before that return is still the latest one.
 */
export function decisionsInForce<T extends RevisedDecision>(decisions: readonly T[], status: CaseStatus): DecisionsInForce<T> {
  const returns = decisions.filter((decision) => decision.kind === 'return').map((decision) => decision.revision).sort((a, b) => a - b);
  const stillWithInspector = WITH_INSPECTOR.includes(status) ? 1 : 0;
  const lastEarlier = returns[returns.length - 1 - stillWithInspector] ?? 0;
  const isEarlier = (decision: T) => decision.revision <= lastEarlier;
  const current = new Map<string, T>();
  for (const decision of [...decisions].sort((a, b) => a.revision - b.revision)) {
    if (decision.scanId !== null && !isEarlier(decision)) current.set(decision.scanId, decision);
  }
  return { current, isEarlier };
}
