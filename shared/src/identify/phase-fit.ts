/** Whether a compound is met in the phase a scan was taken in, from the library's `phases`. */
import type { MatterPhase } from '../library/types.js';
import type { Phase } from '../spectrum/types.js';
import { PHASE_MISMATCH_FACTOR } from './constants.js';

/** The factor on band agreement and, when the phases disagree, the reason shown with the candidate. */
export interface PhaseFit {
  readonly factor: number;
  readonly reason: string | null;
}

const FITS: Readonly<Record<Phase, readonly MatterPhase[]>> = { condensed: ['liquid', 'solid'], gas: ['gas'] };

/** Phase fit of a compound (its library phases) for a scan phase. */
export function phaseFit(phases: readonly MatterPhase[], scanPhase: Phase): PhaseFit {
  if (phases.some((p) => FITS[scanPhase].includes(p))) return { factor: 1, reason: null };
  const where = scanPhase === 'gas' ? 'a gas cell' : 'a condensed-phase (liquid or solid) scan';
  return {
    factor: PHASE_MISMATCH_FACTOR,
    reason: `met only as ${phases.join(' or ')} (compound library), not in ${where}: band agreement × ${PHASE_MISMATCH_FACTOR}`,
  };
}
