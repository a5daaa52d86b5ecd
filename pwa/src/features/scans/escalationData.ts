import type { IdentifyResult } from '@siteband/shared';
import type { EscalationData } from '../../db/escalationsTable';

/**
 * The escalation a result requires, or null when it requires none. The hazard classes are those
 * of the triggering candidates' caution cards; a trigger resting on a flag outside GHS (e.g. an
 * explosive precursor) names its rule instead, so the list is never empty.
 */
export function escalationData(result: IdentifyResult, owner: { caseId: string; scanId: string; raisedAt: string }): EscalationData | null {
  if (!result.escalation.required) return null;
  const triggered = new Set(result.escalation.triggers.map((t) => t.compoundId));
  const classes = new Set<string>();
  for (const candidate of result.candidates) {
    if (!triggered.has(candidate.id)) continue;
    for (const card of candidate.hazards) for (const c of card.classifications) classes.add(c.hazardClass);
  }
  if (classes.size === 0) result.escalation.triggers.forEach((t) => classes.add(t.ruleId));
  const reason = result.escalation.triggers.map((t) => `${t.name}: ${t.reason}`).join('; ');
  return { caseId: owner.caseId, scanId: owner.scanId, raisedAt: owner.raisedAt, reason: reason.slice(0, 2000), hazardClasses: [...classes].slice(0, 50) };
}
