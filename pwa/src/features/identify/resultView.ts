/**
 * Turns an identify result into what the result panel shows. The safety rules of the display live
 * here, once: no ranking without a reliable scan, a caution card beside every hazardous candidate,
 * and the general cautions on every result whatever the ranking says.
 */
import { GENERAL_CAUTIONS, type Candidate, type CautionCard, type IdentifyResult, type Mixture } from '@siteband/shared';

/** One card of the likely compounds. */
export interface CandidateView {
  readonly candidate: Candidate;
  /** The caution card to show beside it; null only for a candidate whose card marks nothing hazardous. */
  readonly cautionCard: CautionCard | null;
  readonly hazardous: boolean;
  /** Expected band positions (explained and missing), for the plot's overlay. */
  readonly expectedCm1: readonly number[];
}

/** The result panel's content. */
export type ResultView =
  | { readonly status: 'no-reliable-result'; readonly reasons: readonly string[]; readonly cautions: readonly string[] }
  | {
      readonly status: 'ranked';
      readonly candidates: readonly CandidateView[];
      readonly mixture: Mixture | null;
      readonly cautions: readonly string[];
      /** Caution cards that must be acknowledged before the scan is marked reviewed. */
      readonly cautionCards: readonly CautionCard[];
      readonly escalation: IdentifyResult['escalation'];
    };

/** The general cautions first, then the result's own, each once. */
export function cautionsFor(result: IdentifyResult): string[] {
  return [...new Set([...GENERAL_CAUTIONS, ...result.cautions])];
}

function candidateView(candidate: Candidate): CandidateView {
  const card = candidate.hazards.find((h) => h.hazardous) ?? null;
  const expected = [...candidate.explained.map((e) => e.expectedCm1), ...candidate.missing.map((m) => m.expectedCm1)];
  return { candidate, cautionCard: card, hazardous: card !== null, expectedCm1: [...new Set(expected)].sort((a, b) => a - b) };
}

/** Maps a result to its view; an unreliable scan gets its reasons and no ranking at all. */
export function resultView(result: IdentifyResult): ResultView {
  const cautions = cautionsFor(result);
  if (!result.reliable) return { status: 'no-reliable-result', reasons: result.reasons, cautions };
  const candidates = result.candidates.map(candidateView);
  return {
    status: 'ranked',
    candidates,
    mixture: result.mixture,
    cautions,
    cautionCards: candidates.flatMap((c) => (c.cautionCard ? [c.cautionCard] : [])),
    escalation: result.escalation,
  };
}
