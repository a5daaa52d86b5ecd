/** The cautions at the top of every result: general, laser, mixture and hazardous-alternative notes. */
import { GENERAL_CAUTIONS, NO_RELIABLE_RESULT_CAUTION, RAMAN_LASER_CAUTION } from '../hazards/general-cautions.js';
import type { Technique } from '../spectrum/types.js';
import { PLAUSIBLE_HAZARD_SCORE } from './constants.js';
import type { Candidate, Mixture } from './types.js';

/** Cautions for a result; the general ones always, the laser caution on every Raman scan. */
export function resultCautions(technique: Technique, reliable: boolean, candidates: readonly Candidate[], mixture: Mixture | null): string[] {
  const out = [...GENERAL_CAUTIONS];
  if (technique === 'raman') out.push(RAMAN_LASER_CAUTION);
  if (!reliable) {
    out.push(NO_RELIABLE_RESULT_CAUTION);
    return out;
  }
  if (candidates.length === 0) out.push('No compound of the compound library matches this scan: the sample may be outside the library; treat it as unknown.');
  const top = candidates[0];
  const hazardousOthers = candidates.filter((c, i) => i > 0 && c.score >= PLAUSIBLE_HAZARD_SCORE && c.hazards.some((h) => h.hazardous));
  if (top !== undefined && hazardousOthers.length > 0) {
    out.push(`Hazardous alternatives are also plausible (${hazardousOthers.map((c) => c.name).join(', ')}): read their caution cards, not only the first candidate's.`);
  }
  const thin = candidates.filter((c) => !c.escalationEvidence && c.score >= PLAUSIBLE_HAZARD_SCORE && c.hazards.some((h) => h.hazardous));
  if (thin.length > 0) {
    out.push(`${thin.map((c) => c.name).join(', ')}: plausible on a single minor band only, so not escalated; read the caution card all the same.`);
  }
  if (mixture !== null) out.push('The scan looks like a mixture: the hazards of every component apply, and mixtures can react.');
  return out;
}
