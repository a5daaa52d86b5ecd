/** Whether a candidate's evidence is enough to escalate it, beyond its band agreement. */
import { ESCALATION_SINGLE_PEAK_MIN_SHARE } from './constants.js';
import type { ExplainedPeak } from './score-candidate.js';

/**
 * True unless the candidate's explained peaks are a single observed peak carrying less than
 * ESCALATION_SINGLE_PEAK_MIN_SHARE of the observed intensity: one minor coincidence does not
 * call a safety officer out, while a one-band compound that dominates the scan still does.
 */
export function hasEscalationEvidence(explained: readonly ExplainedPeak[], peaksExplained: number): boolean {
  const observed = new Set(explained.map((e) => e.x));
  return observed.size >= 2 || (observed.size === 1 && peaksExplained >= ESCALATION_SINGLE_PEAK_MIN_SHARE);
}
