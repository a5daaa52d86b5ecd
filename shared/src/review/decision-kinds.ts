/**
 * What a supervisor can decide. On a scan: `accept` (the first likely compound stands), `replace` (another
 * library compound, with a reason), `needs_lab` (needs laboratory confirmation). On the case: `return`
 * (back to the inspector with a comment), `sign_off` (accepted), `reopen` (accepted → in review, with a reason).
 */
export const SCAN_DECISION_KINDS = ['accept', 'replace', 'needs_lab'] as const;
export const CASE_DECISION_KINDS = ['return', 'sign_off', 'reopen'] as const;
export const DECISION_KINDS = [...SCAN_DECISION_KINDS, ...CASE_DECISION_KINDS] as const;
export type ScanDecisionKind = (typeof SCAN_DECISION_KINDS)[number];
export type CaseDecisionKind = (typeof CASE_DECISION_KINDS)[number];
export type DecisionKind = (typeof DECISION_KINDS)[number];

/** True for a decision that concerns one scan (the others concern the whole case). */
export function isScanDecision(kind: DecisionKind): kind is ScanDecisionKind {
  return (SCAN_DECISION_KINDS as readonly string[]).includes(kind);
}
