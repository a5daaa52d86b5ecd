/** The arithmetic of band agreement, shared by the fast pass and the detailed scoring. */
import { AGAINST_PENALTY, EDGE_MATCH_CREDIT } from './constants.js';

/** Match window of one band: the scan tolerance, or a quarter of a broad band's width if larger. */
export function bandWindow(toleranceCm1: number, halfWidthCm1: number): number {
  return halfWidthCm1 > toleranceCm1 ? halfWidthCm1 : toleranceCm1;
}

/** Credit of a match |Δ| inside a window: 1 when centred, EDGE_MATCH_CREDIT at the edge, 0 outside. */
export function closeness(deltaCm1: number, windowCm1: number): number {
  const r = Math.abs(deltaCm1) / windowCm1;
  return r > 1 ? 0 : 1 - (1 - EDGE_MATCH_CREDIT) * r * r;
}

/**
 * Band agreement from its parts: the geometric mean of the intensity-weighted share of expected
 * bands found and the height-weighted share of observed peaks explained, reduced by evidence against.
 */
export function bandAgreement(bandsFound: number, peaksExplained: number, againstShare: number): number {
  const base = Math.sqrt(Math.max(0, bandsFound) * Math.max(0, peaksExplained));
  return base * Math.max(0, 1 - AGAINST_PENALTY * againstShare);
}

export { lowerBound } from '../spectrum/search.js';
