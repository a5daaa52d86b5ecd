/** identifyScan: the likely compounds for one scan, with mixtures, caution cards and escalation. */
import { cautionCard } from '../hazards/caution-card.js';
import { escalationFor } from '../hazards/escalation.js';
import { engineAnalyser } from '../library/engine-analyser.js';
import { loadLibrary } from '../library/load.js';
import type { SymmetryAnalyser } from '../library/symmetry-source.js';
import type { Compound } from '../library/types.js';
import type { Library } from '../library/validate-library.js';
import {
  IDENTIFY_METHOD_VERSION,
  MAX_CANDIDATES,
  MAX_EXTRA_HAZARDOUS,
  MIN_CANDIDATE_SCORE,
  MIXTURE_MIN_CANDIDATE_SCORE,
  MIXTURE_MIN_GAIN,
  MIXTURE_POOL_SIZE,
  PLAUSIBLE_HAZARD_SCORE,
} from './constants.js';
import { hasEscalationEvidence } from './escalation-evidence.js';
import { libraryIndexFor } from './index-cache.js';
import type { LibraryIndex } from './library-index.js';
import { findMixture } from './mixture.js';
import { observedPeaks } from './observed-peaks.js';
import { rankLibrary, type RankedCompound } from './rank.js';
import { resultCautions } from './result-cautions.js';
import type { Candidate, IdentifyInput, IdentifyResult, Mixture } from './types.js';
import { resolveTolerance, validateIdentifyInput } from './validate-input.js';

/** Where identifyScan takes its library and symmetry analysis from (defaults: the bundled library, the engine). */
export interface IdentifyOptions {
  readonly library?: Library;
  readonly analyser?: SymmetryAnalyser;
}

function toCandidate(index: LibraryIndex, r: RankedCompound, rank: number, listedForCaution: boolean): Candidate {
  const c = index.compounds[r.index]!;
  return {
    id: c.id,
    name: c.name,
    cas: c.cas,
    formula: c.formula,
    rank,
    score: r.score,
    parts: r.parts,
    explained: r.explained,
    missing: r.missing,
    against: r.against,
    hazards: [cautionCard(c)],
    listedForCaution,
    phaseMismatch: r.phaseMismatch,
    escalationEvidence: hasEscalationEvidence(r.explained, r.parts.peaksExplained),
  };
}

function pickListed(index: LibraryIndex, ranked: readonly RankedCompound[]): Candidate[] {
  const plausible = ranked.filter((r) => r.score >= MIN_CANDIDATE_SCORE);
  const top = plausible.slice(0, MAX_CANDIDATES).map((r, i) => toCandidate(index, r, i + 1, false));
  // Err on the side of caution: a plausible hazardous compound is shown even when it ranks low.
  const extra = plausible
    .slice(MAX_CANDIDATES)
    .map((r, i) => ({ r, rank: MAX_CANDIDATES + i + 1 }))
    .filter(({ r }) => r.score >= PLAUSIBLE_HAZARD_SCORE && index.compounds[r.index]!.hazards.classifications.length > 0)
    .slice(0, MAX_EXTRA_HAZARDOUS)
    .map(({ r, rank }) => toCandidate(index, r, rank, true));
  return [...top, ...extra];
}

function mixtureOf(index: LibraryIndex, ranked: readonly RankedCompound[], obs: ReturnType<typeof observedPeaks>, tol: number): Mixture | null {
  // A mixture must explain MIXTURE_MIN_GAIN more than the best single compound: when that one
  // already explains nearly all observed peak height, there is nothing left to gain.
  if (ranked.length === 0 || ranked[0]!.parts.peaksExplained > 1 - MIXTURE_MIN_GAIN) return null;
  const pool = ranked.filter((r) => r.score >= MIXTURE_MIN_CANDIDATE_SCORE).slice(0, MIXTURE_POOL_SIZE);
  const found = findMixture(pool.map((r) => index.bands[r.index]!), obs, tol);
  if (found === null) return null;
  return {
    components: found.members.map((m, k) => {
      const c = index.compounds[pool[m]!.index]!;
      return { id: c.id, name: c.name, cas: c.cas, share: found.shares[k]!, score: pool[m]!.score };
    }),
    explainedShare: found.explainedShare,
    bestSingleShare: found.bestSingleShare,
    minGain: MIXTURE_MIN_GAIN,
  };
}

/** Rank the compound library for one scan; throws on malformed input, never on a poor scan. */
export function identifyScan(input: IdentifyInput, options: IdentifyOptions = {}): IdentifyResult {
  validateIdentifyInput(input);
  const library = options.library ?? loadLibrary();
  const { toleranceCm1, toleranceFrom } = resolveTolerance(input);
  const peaks = input.peaks.map((p) => ({ x: p.x, height: p.height, relativeHeight: p.relativeHeight, widthCm1: p.widthCm1 }));
  const reasons = [...(input.quality?.reasons ?? [])];
  if (input.peaks.length === 0) reasons.push('no peaks were picked from the scan');
  const reliable = input.quality?.reliable !== false && input.peaks.length > 0;
  let candidates: Candidate[] = [];
  let mixture: Mixture | null = null;
  let hazardSources: readonly Compound[] = [];
  if (reliable) {
    const index = libraryIndexFor(library, options.analyser ?? engineAnalyser, input.technique, input.phase);
    const obs = observedPeaks(input.peaks, input.phase === 'gas');
    const ranked = rankLibrary(index, obs, toleranceCm1, input.spectrum);
    candidates = pickListed(index, ranked);
    mixture = mixtureOf(index, ranked, obs, toleranceCm1);
    hazardSources = ranked.map((r) => index.compounds[r.index]!);
  }
  const hazardsOf = new Map(hazardSources.map((c) => [c.id, c.hazards]));
  const listedIds = new Set(candidates.map((c) => c.id));
  // A candidate resting on one minor peak keeps its caution card but does not escalate.
  const escalating = candidates.filter((c) => c.escalationEvidence);
  const escalationCandidates = [...escalating, ...(mixture?.components ?? []).filter((m) => !listedIds.has(m.id))].map((c) => ({
    id: c.id,
    name: c.name,
    score: c.score,
    hazards: hazardsOf.get(c.id)!,
  }));
  return {
    technique: input.technique,
    phase: input.phase,
    peaks,
    candidates,
    mixture,
    cautions: resultCautions(input.technique, reliable, candidates, mixture),
    escalation: escalationFor(escalationCandidates, library.escalationRules),
    reliable,
    reasons,
    libraryVersion: library.version,
    parameters: { toleranceCm1, toleranceFrom, methodVersion: IDENTIFY_METHOD_VERSION, libraryCompounds: library.compounds.length },
  };
}
