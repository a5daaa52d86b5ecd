/**
 * Detailed band agreement of one candidate: which observed peaks its expected bands explain,
 * which expected strong bands are missing, and which observed peaks sit where the technique
 * forbids its bands (evidence against).
 */
import type { BandIntensity } from '../library/types.js';
import { AGAINST_MIN_RELATIVE_HEIGHT, MISSING_REPORT_WEIGHT } from './constants.js';
import type { CompoundBands, ExpectedBand } from './expected-bands.js';
import type { ObservedPeaks } from './observed-peaks.js';
import { bandAgreement, bandWindow, closeness, lowerBound } from './scoring.js';

/** One observed peak ↔ expected band pair. */
export interface ExplainedPeak {
  readonly x: number;
  readonly relativeHeight: number;
  readonly expectedCm1: number;
  readonly deltaCm1: number;
  readonly label: string | null;
  readonly mode: string | null;
  readonly assignment: string;
  readonly intensity: BandIntensity;
}

/** An expected band of at least medium intensity with no observed peak in its window. */
export interface MissingBand {
  readonly expectedCm1: number;
  readonly label: string | null;
  readonly mode: string | null;
  readonly assignment: string;
  readonly intensity: BandIntensity;
}

/** An observed peak at a position where this technique forbids the candidate's band. */
export interface AgainstPeak {
  readonly x: number;
  readonly relativeHeight: number;
  readonly forbiddenCm1: number;
  readonly label: string | null;
  readonly mode: string | null;
  readonly reason: string;
}

/** The parts band agreement is built from, each 0..1. */
export interface ScoreParts {
  /** Intensity-weighted share of the expected bands found (closeness-weighted). */
  readonly bandsFound: number;
  /** Height-weighted share of the observed peaks that the candidate explains. */
  readonly peaksExplained: number;
  /** Height-weighted share of the observed peaks that argue against the candidate. */
  readonly againstShare: number;
  readonly expectedBands: number;
  readonly matchedBands: number;
  /** Pearson's r against the library's reference spectrum; null when the library holds none or no scan was given. */
  readonly spectrumCorrelation: number | null;
  /** Factor for the compound's phases against the scan's: 1, or PHASE_MISMATCH_FACTOR when the library never meets it in that phase. */
  readonly phaseFactor: number;
}

/** A candidate's band agreement with its evidence. */
export interface CandidateScore {
  readonly score: number;
  readonly parts: ScoreParts;
  readonly explained: readonly ExplainedPeak[];
  readonly missing: readonly MissingBand[];
  readonly against: readonly AgainstPeak[];
}

function nearestWithin(sorted: Float64Array, cm1: number, window: number): number {
  const i = lowerBound(sorted, cm1 - window);
  let best = -1;
  let bestDelta = Infinity;
  for (let j = i; j < sorted.length && sorted[j]! <= cm1 + window; j++) {
    const d = Math.abs(sorted[j]! - cm1);
    if (d < bestDelta) {
      bestDelta = d;
      best = j;
    }
  }
  return best;
}

const ref = (b: ExpectedBand) => ({ label: b.label ?? null, mode: b.mode ?? null });

/** Score one candidate's expected bands against the observed peaks. */
export function scoreCandidate(bands: CompoundBands, obs: ObservedPeaks, toleranceCm1: number, technique: 'ir' | 'raman'): CandidateScore {
  const explainedFlag = new Uint8Array(obs.xCm1.length);
  const explained: ExplainedPeak[] = [];
  const missing: MissingBand[] = [];
  let found = 0;
  let total = 0;
  for (const b of bands.expected) {
    total += b.weight;
    const window = bandWindow(toleranceCm1, b.halfWidthCm1);
    const j = nearestWithin(obs.xCm1, b.cm1, window);
    if (j < 0) {
      const p = b.halfWidthCm1 === 0 ? nearestWithin(obs.pairs.midCm1, b.cm1, window) : -1;
      if (p >= 0) {
        found += b.weight * closeness(obs.pairs.midCm1[p]! - b.cm1, window);
        for (const [k, branch] of [[obs.pairs.first[p]!, 'P'], [obs.pairs.second[p]!, 'R']] as const) {
          explainedFlag[k] = 1;
          explained.push({
            x: obs.xCm1[k]!,
            relativeHeight: obs.relativeHeight[k]!,
            expectedCm1: b.cm1,
            deltaCm1: obs.xCm1[k]! - b.cm1,
            ...ref(b),
            assignment: `${b.assignment} (${branch} branch maximum)`,
            intensity: b.intensity,
          });
        }
        continue;
      }
      if (b.weight >= MISSING_REPORT_WEIGHT) missing.push({ expectedCm1: b.cm1, ...ref(b), assignment: b.assignment, intensity: b.intensity });
      continue;
    }
    found += b.weight * closeness(obs.xCm1[j]! - b.cm1, window);
    explainedFlag[j] = 1;
    explained.push({
      x: obs.xCm1[j]!,
      relativeHeight: obs.relativeHeight[j]!,
      expectedCm1: b.cm1,
      deltaCm1: obs.xCm1[j]! - b.cm1,
      ...ref(b),
      assignment: b.assignment,
      intensity: b.intensity,
    });
  }
  let explainedHeight = 0;
  for (let j = 0; j < explainedFlag.length; j++) if (explainedFlag[j]) explainedHeight += obs.relativeHeight[j]!;
  const against: AgainstPeak[] = [];
  let againstHeight = 0;
  const other = technique === 'ir' ? 'Raman' : 'IR';
  const here = technique === 'ir' ? 'IR' : 'Raman';
  for (const b of bands.forbidden) {
    const j = nearestWithin(obs.xCm1, b.cm1, toleranceCm1);
    if (j < 0 || explainedFlag[j] || obs.relativeHeight[j]! < AGAINST_MIN_RELATIVE_HEIGHT) continue;
    if (!against.some((a) => a.x === obs.xCm1[j])) againstHeight += obs.relativeHeight[j]!;
    against.push({
      x: obs.xCm1[j]!,
      relativeHeight: obs.relativeHeight[j]!,
      forbiddenCm1: b.cm1,
      ...ref(b),
      reason: `${b.mode ?? 'band'} (${b.label ?? '?'}) at ${b.cm1} cm⁻¹ is ${other}-only by symmetry: ${here} should not show it`,
    });
  }
  const totalHeight = obs.totalHeight > 0 ? obs.totalHeight : 1;
  const parts: ScoreParts = {
    bandsFound: total > 0 ? found / total : 0,
    peaksExplained: explainedHeight / totalHeight,
    againstShare: againstHeight / totalHeight,
    expectedBands: bands.expected.length,
    matchedBands: explained.length,
    spectrumCorrelation: null,
    phaseFactor: 1,
  };
  return { score: bandAgreement(parts.bandsFound, parts.peaksExplained, parts.againstShare), parts, explained, missing, against };
}
