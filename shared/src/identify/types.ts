/** Input and result of identifyScan: the likely compounds for one scan, with their evidence. */
import type { CautionCard } from '../hazards/types.js';
import type { Escalation } from '../hazards/escalation.js';
import type { LibraryVersion } from '../library/types.js';
import type { Peak, Phase, Spectrum, Technique } from '../spectrum/types.js';
import type { AgainstPeak, ExplainedPeak, MissingBand, ScoreParts } from './score-candidate.js';

/** The pipeline's quality verdict, as far as the ranking needs it. */
export interface ScanQualityVerdict {
  readonly reliable: boolean;
  readonly reasons: readonly string[];
}

/** One scan to identify. Only technique, phase and peaks are required. */
export interface IdentifyInput {
  readonly technique: Technique;
  readonly phase: Phase;
  readonly peaks: readonly Peak[];
  /** The processed scan, carried for the record (the ranking reads the peaks). */
  readonly spectrum?: Spectrum;
  /** Match window ±cm⁻¹; default from the phase (and never tighter than resolutionCm1). */
  readonly toleranceCm1?: number;
  /** The instrument's spectral resolution, cm⁻¹, when known. */
  readonly resolutionCm1?: number;
  /** The pipeline's quality verdict: `reliable: false` gives "no reliable result" instead of a ranking. */
  readonly quality?: ScanQualityVerdict;
}

/** One likely compound with its band agreement and evidence. */
export interface Candidate {
  readonly id: string;
  readonly name: string;
  readonly cas: string;
  readonly formula: string;
  readonly rank: number;
  /** Band agreement, 0..1. */
  readonly score: number;
  readonly parts: ScoreParts;
  readonly explained: readonly ExplainedPeak[];
  readonly missing: readonly MissingBand[];
  readonly against: readonly AgainstPeak[];
  /** The caution card (one element; a list so screens can show mixture cards the same way). */
  readonly hazards: readonly CautionCard[];
  /** Listed beyond the top candidates because it is hazardous and plausible. */
  readonly listedForCaution: boolean;
  /** Why the compound's library phases argue against the scan's phase (band agreement scaled down); null when they agree. */
  readonly phaseMismatch: string | null;
  /**
   * False when the candidate rests on one minor observed peak: it is then not escalated, though
   * its caution card is shown (ESCALATION_SINGLE_PEAK_MIN_SHARE).
   */
  readonly escalationEvidence: boolean;
}

/** A mixture of two or three candidates that explains the scan clearly better than any one. */
export interface Mixture {
  /** Each component with the share of observed intensity it explains and its own band agreement. */
  readonly components: readonly { readonly id: string; readonly name: string; readonly cas: string; readonly share: number; readonly score: number }[];
  /** Share of the observed intensity the mixture explains, 0..1. */
  readonly explainedShare: number;
  /** What the best single compound explains on the same band models. */
  readonly bestSingleShare: number;
  readonly minGain: number;
}

/** The parameters the ranking actually used, for the record. */
export interface IdentifyParameters {
  readonly toleranceCm1: number;
  readonly toleranceFrom: 'input' | 'phase default' | 'resolution';
  readonly methodVersion: string;
  readonly libraryCompounds: number;
}

/** Result of identifyScan, best candidate first. */
export interface IdentifyResult {
  readonly technique: Technique;
  readonly phase: Phase;
  readonly peaks: readonly { readonly x: number; readonly height: number; readonly relativeHeight: number; readonly widthCm1: number }[];
  readonly candidates: readonly Candidate[];
  readonly mixture: Mixture | null;
  readonly cautions: readonly string[];
  readonly escalation: Escalation;
  readonly reliable: boolean;
  readonly reasons: readonly string[];
  readonly libraryVersion: LibraryVersion;
  readonly parameters: IdentifyParameters;
}
