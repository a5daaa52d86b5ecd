/**
 * How dangerous a finding is, as one number the review queue can sort and filter by. The one place
 * this rule lives: 3 when the finding is escalated to the safety officer (an escalation-triggering
 * compound, or an escalation still open on the case), 2 for the GHS signal word "Danger", 1 for
 * "Warning", 0 otherwise. Signal words as GHS (UN GHS Rev. 10, section 1.4.10.5.2, from memory) uses them.
 */
export const HAZARD_RANK_LABELS = ['none', 'warning', 'danger', 'escalation'] as const;

export type HazardRank = 0 | 1 | 2 | 3;
export type HazardRankLabel = (typeof HAZARD_RANK_LABELS)[number];

/** The highest possible rank. */
export const MAX_HAZARD_RANK: HazardRank = 3;

/** The rank of one finding: its signal word, raised to 3 when it escalates. */
export function hazardRank(finding: { readonly signalWord: 'Danger' | 'Warning' | null; readonly escalates: boolean }): HazardRank {
  if (finding.escalates) return 3;
  if (finding.signalWord === 'Danger') return 2;
  if (finding.signalWord === 'Warning') return 1;
  return 0;
}

/** The rank with its label, as screens and exports show it. */
export function hazardRankOf(rank: number): { rank: HazardRank; label: HazardRankLabel } {
  if (!Number.isInteger(rank) || rank < 0 || rank > MAX_HAZARD_RANK) throw new RangeError(`A hazard rank is 0 to 3, not ${rank}`);
  return { rank: rank as HazardRank, label: HAZARD_RANK_LABELS[rank] };
}
