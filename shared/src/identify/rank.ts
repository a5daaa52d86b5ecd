/**
 * Ranking a scan against the whole library in two steps: a fast pass that, peak by peak, finds
 * the bands in reach by binary search and accumulates an upper bound of each touched compound's
 * band agreement (evidence against is left out, so the bound never under-estimates); then the
 * detailed scoring of the best DETAIL_POOL_SIZE only.
 */
import type { Spectrum } from '../spectrum/types.js';
import { CORRELATION_WEIGHT, DETAIL_POOL_SIZE } from './constants.js';
import { referenceFor, spectrumCorrelation } from './correlation.js';
import type { BandTable, LibraryIndex } from './library-index.js';
import type { ObservedPeaks } from './observed-peaks.js';
import { phaseFit } from './phase-fit.js';
import { scoreCandidate, type CandidateScore } from './score-candidate.js';
import { bandAgreement, bandWindow, closeness, lowerBound } from './scoring.js';

/** A scored compound, by its position in the index. */
export interface RankedCompound extends CandidateScore {
  readonly index: number;
  /** Why the compound's library phases argue against the scan's phase; null when they agree. */
  readonly phaseMismatch: string | null;
}

/** Upper bounds of band agreement for every compound with at least one band in reach of a peak. */
export function fastPass(index: LibraryIndex, obs: ObservedPeaks, toleranceCm1: number): { touched: number[]; upper: Float64Array } {
  const n = index.compounds.length;
  const tables: readonly BandTable[] = [index.sharp, index.broad];
  const best = tables.map((t) => new Float64Array(t.positionCm1.length));
  const explainedHeight = new Float64Array(n);
  // lastPeak[c] === j marks peak j as already counted for compound c, across both tables.
  const lastPeak = new Int32Array(n).fill(-1);
  const touched: number[] = [];
  for (let j = 0; j < obs.xCm1.length; j++) {
    const x = obs.xCm1[j]!;
    tables.forEach((t, k) => {
      const reach = Math.max(toleranceCm1, t.maxHalfWidthCm1);
      const bestK = best[k]!;
      for (let i = lowerBound(t.positionCm1, x - reach); i < t.positionCm1.length && t.positionCm1[i]! <= x + reach; i++) {
        const c = closeness(x - t.positionCm1[i]!, bandWindow(toleranceCm1, t.halfWidthCm1[i]!));
        if (c === 0) continue;
        if (c > bestK[i]!) bestK[i] = c;
        const owner = t.owner[i]!;
        if (lastPeak[owner] !== j) {
          if (lastPeak[owner] === -1) touched.push(owner);
          lastPeak[owner] = j;
          explainedHeight[owner] += obs.relativeHeight[j]!;
        }
      }
    });
  }
  // Gas scans: a P/R pair probes at its midpoint and, when it matches, explains both peaks.
  const pairs = obs.pairs;
  const lastPair = new Int32Array(n).fill(-1);
  const sharp = index.sharp;
  const bestSharp = best[0]!;
  for (let p = 0; p < pairs.midCm1.length; p++) {
    const x = pairs.midCm1[p]!;
    for (let i = lowerBound(sharp.positionCm1, x - toleranceCm1); i < sharp.positionCm1.length && sharp.positionCm1[i]! <= x + toleranceCm1; i++) {
      const c = closeness(x - sharp.positionCm1[i]!, toleranceCm1);
      if (c > bestSharp[i]!) bestSharp[i] = c;
      const owner = sharp.owner[i]!;
      if (lastPair[owner] !== p) {
        if (lastPeak[owner] === -1 && lastPair[owner] === -1) touched.push(owner);
        lastPair[owner] = p;
        explainedHeight[owner] += obs.relativeHeight[pairs.first[p]!]! + obs.relativeHeight[pairs.second[p]!]!;
      }
    }
  }
  const found = new Float64Array(n);
  tables.forEach((t, k) => {
    const bestK = best[k]!;
    for (let i = 0; i < bestK.length; i++) if (bestK[i]! > 0) found[t.owner[i]!] += t.weight[i]! * bestK[i]!;
  });
  const upper = new Float64Array(n);
  const totalHeight = obs.totalHeight > 0 ? obs.totalHeight : 1;
  for (const c of touched) {
    const w = index.totalWeight[c]!;
    upper[c] = bandAgreement(w > 0 ? found[c]! / w : 0, Math.min(1, explainedHeight[c]! / totalHeight), 0);
  }
  return { touched, upper };
}

/** The k touched compounds with the highest upper bounds (a bounded insertion list: k ≪ touched). */
function topByUpperBound(touched: readonly number[], upper: Float64Array, k: number): number[] {
  const top: number[] = [];
  for (const c of touched) {
    const u = upper[c]!;
    if (top.length === k && u <= upper[top[k - 1]!]!) continue;
    let i = top.length < k ? top.length : k - 1;
    while (i > 0 && upper[top[i - 1]!]! < u) {
      if (i < k) top[i] = top[i - 1]!;
      i--;
    }
    top[i] = c;
  }
  return top;
}

function withCorrelation(s: CandidateScore, r: number | null): CandidateScore {
  if (r === null) return s;
  return { ...s, score: (1 - CORRELATION_WEIGHT) * s.score + CORRELATION_WEIGHT * Math.max(0, r), parts: { ...s.parts, spectrumCorrelation: r } };
}

/**
 * Rank the library for the observed peaks, best first (ties: hazardous compounds first, then id).
 * With the processed scan, candidates of the detail pool that have a reference spectrum in the
 * library also get the full-spectrum correlation. A compound never met in the scan's phase has
 * its band agreement scaled by the phase factor (the fast pass leaves it out: still an upper bound).
 */
export function rankLibrary(index: LibraryIndex, obs: ObservedPeaks, toleranceCm1: number, scan?: Spectrum): RankedCompound[] {
  const { touched, upper } = fastPass(index, obs, toleranceCm1);
  const pool = topByUpperBound(touched, upper, DETAIL_POOL_SIZE);
  const ranked = pool.map((i): RankedCompound => {
    const detailed = scoreCandidate(index.bands[i]!, obs, toleranceCm1, index.technique);
    const reference = scan === undefined ? undefined : referenceFor(index.compounds[i]!.referenceSpectra, index.technique, index.phase);
    const scored = withCorrelation(detailed, reference === undefined ? null : spectrumCorrelation(scan!, reference));
    const fit = phaseFit(index.compounds[i]!.phases, index.phase);
    return { index: i, ...scored, score: scored.score * fit.factor, parts: { ...scored.parts, phaseFactor: fit.factor }, phaseMismatch: fit.reason };
  });
  const hazardous = (i: number) => (index.compounds[i]!.hazards.classifications.length > 0 ? 0 : 1);
  return ranked.sort((a, b) => b.score - a.score || hazardous(a.index) - hazardous(b.index) || index.compounds[a.index]!.id.localeCompare(index.compounds[b.index]!.id));
}
