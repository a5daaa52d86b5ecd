/**
 * Types of the compound library: one entry per compound with its sources, its fundamentals (for
 * molecules with a geometry) or characteristic bands, and its hazard data.
 */
import type { CompoundHazards, SourceRef } from '../hazards/types.js';
import type { Technique } from '../spectrum/types.js';

/** Phase of matter of a band value; a scan's `condensed` covers liquid and solid. */
export type MatterPhase = 'gas' | 'liquid' | 'solid';

/** Relative band intensity as the literature words it. */
export type BandIntensity = 'vs' | 's' | 'm' | 'w' | 'vw';

/** Broad families, for the library screens. */
export type CompoundGroup = 'toxic-industrial' | 'gas' | 'solvent-fuel' | 'oxidiser-energetic' | 'acid-base' | 'look-alike';

/**
 * One fundamental of a molecule with a geometry. The label is the irrep as the symmetry engine
 * spells it (ASCII primes, `g`/`u`, `+`/`-`); whether it shows in IR or Raman is the engine's
 * answer, never typed here. `ir`/`raman` give the relative intensity where the mode is active.
 */
export interface Fundamental {
  readonly mode: string;
  readonly label: string;
  readonly cm1: Readonly<Partial<Record<MatterPhase, number>>>;
  readonly ir?: BandIntensity;
  readonly raman?: BandIntensity;
  readonly assignment: string;
  /** False when the fundamental is not seen at its own position (e.g. Fermi resonance): not matched. */
  readonly matchable?: boolean;
  /** Typical FWHM in cm⁻¹ of a broad band (hydrogen-bonded stretches); widens the match window. */
  readonly widthCm1?: number;
  readonly source?: SourceRef;
}

/** An observed characteristic band: a group frequency, a lattice band, or a resonance component. */
export interface Band {
  readonly technique: Technique;
  readonly cm1: number;
  readonly phase: MatterPhase;
  readonly intensity: BandIntensity;
  readonly assignment: string;
  /** Symmetry label when the band belongs to a species of the molecule's point group. */
  readonly label?: string;
  readonly widthCm1?: number;
  readonly source?: SourceRef;
}

/** A measured reference spectrum (baseline-corrected), for a full-spectrum correlation. */
export interface ReferenceSpectrum {
  readonly technique: Technique;
  readonly phase: MatterPhase;
  /** Ascending wavenumbers, cm⁻¹. */
  readonly xCm1: readonly number[];
  readonly y: readonly number[];
  readonly source: SourceRef;
}

/** Idealised structure in XYZ format, for the symmetry engine. */
export interface Geometry {
  readonly xyz: string;
  readonly source: SourceRef;
  /** Which plane the labels of a planar C2v/D2h molecule assume (Mulliken 1955 `yz`). */
  readonly planarConvention?: 'yz' | 'xz';
}

/** One compound of the compound library. */
export interface Compound {
  readonly id: string;
  readonly name: string;
  readonly synonyms: readonly string[];
  readonly cas: string;
  readonly casSource: SourceRef;
  /** For a solution whose CAS RN is that of the dissolved compound: that compound's id. */
  readonly solutionOf?: string;
  readonly formula: string;
  readonly group: CompoundGroup;
  readonly phases: readonly MatterPhase[];
  readonly geometry?: Geometry;
  readonly fundamentalsSource?: SourceRef;
  readonly fundamentals?: readonly Fundamental[];
  readonly bandsSource?: SourceRef;
  readonly bands?: readonly Band[];
  readonly hazards: CompoundHazards;
  /** Reference spectra where the library holds them; the ranking then adds a full-spectrum correlation. */
  readonly referenceSpectra?: readonly ReferenceSpectrum[];
  readonly notes?: readonly string[];
}

/** Version stamp recorded with every result, so a ranking can be reproduced. */
export interface LibraryVersion {
  readonly version: string;
  readonly date: string;
  /** SHA-256 of the canonical library content (compounds, sources, escalation rules). */
  readonly contentHash: string;
}
