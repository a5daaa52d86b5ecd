import type { Technique } from '../spectrum/types.js';

/** How far a value was checked (the tags of the project's reference-value file). */
export type Confidence = 'READ' | 'READ-2nd' | 'MEMORY' | 'COMPUTED' | 'common practice';

/** One band of a reference standard with its acceptance tolerance and where both come from. */
export interface ReferenceBand {
  readonly positionCm1: number;
  readonly positionSource: string;
  readonly positionConfidence: Confidence;
  /** Acceptance half-width: the band passes when |found − position| ≤ toleranceCm1. */
  readonly toleranceCm1: number;
  readonly toleranceSource: string;
  readonly toleranceConfidence: Confidence;
  /** Inter-laboratory standard deviation of the position, where the standard gives one. */
  readonly sigmaCm1?: number;
}

/** A material used to check an instrument's wavenumber or Raman-shift scale. */
export interface ReferenceStandard {
  readonly id: string;
  readonly name: string;
  readonly technique: Technique;
  readonly bands: readonly ReferenceBand[];
  /** Whether the tolerances are published or our settable common-practice choice. */
  readonly toleranceBasis: 'published' | 'common practice';
  /** Widest distance from a band at which a peak is taken as that band, in cm⁻¹. */
  readonly searchWindowCm1: number;
  readonly notes: readonly string[];
}
