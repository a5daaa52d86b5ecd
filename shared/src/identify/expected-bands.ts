/**
 * The bands a scan can show for one compound: for molecules with a geometry, the fundamentals
 * the symmetry engine allows for the technique (the others become forbidden positions); for the
 * rest, the library's observed characteristic bands. Values are taken for the scan's phase.
 */
import { DEFAULT_INTENSITY, INTENSITY_WEIGHT } from './constants.js';
import type { Phase, Technique } from '../spectrum/types.js';
import type { SymmetryAnalyser } from '../library/symmetry-source.js';
import type { Band, BandIntensity, Compound, Fundamental, MatterPhase } from '../library/types.js';

/** One band as the ranking uses it. */
export interface ExpectedBand {
  readonly cm1: number;
  /** Weight from the tabulated intensity, 0..1. */
  readonly weight: number;
  readonly intensity: BandIntensity;
  /** Symmetry species, when known. */
  readonly label?: string;
  /** Mode name (ν1…) for fundamentals. */
  readonly mode?: string;
  readonly assignment: string;
  /** Half-window for a broad band, cm⁻¹ (0 for sharp bands). */
  readonly halfWidthCm1: number;
  /** Phase of the tabulated value actually used. */
  readonly phase: MatterPhase;
}

/** Expected bands of one compound for one technique and scan phase, ascending in cm1. */
export interface CompoundBands {
  readonly expected: readonly ExpectedBand[];
  /** Fundamentals the technique forbids but the other technique shows: an observed peak there argues against. */
  readonly forbidden: readonly ExpectedBand[];
}

const PHASE_ORDER: Readonly<Record<Phase, readonly MatterPhase[]>> = {
  gas: ['gas', 'liquid', 'solid'],
  condensed: ['liquid', 'solid', 'gas'],
};

function pickValue(f: Fundamental, phase: Phase): { cm1: number; phase: MatterPhase } | undefined {
  for (const p of PHASE_ORDER[phase]) {
    const v = f.cm1[p];
    if (v !== undefined) return { cm1: v, phase: p };
  }
  return undefined;
}

function fromFundamental(f: Fundamental, intensity: BandIntensity, phase: Phase, quarter: number): ExpectedBand | undefined {
  const value = pickValue(f, phase);
  if (value === undefined) return undefined;
  return {
    cm1: value.cm1,
    weight: INTENSITY_WEIGHT[intensity],
    intensity,
    label: f.label,
    mode: f.mode,
    assignment: f.assignment,
    halfWidthCm1: (f.widthCm1 ?? 0) * quarter,
    phase: value.phase,
  };
}

function bandsForPhase(bands: readonly Band[], technique: Technique, phase: Phase): Band[] {
  const mine = bands.filter((b) => b.technique === technique);
  const wanted = phase === 'gas' ? (b: Band) => b.phase === 'gas' : (b: Band) => b.phase !== 'gas';
  const inPhase = mine.filter(wanted);
  return inPhase.length > 0 ? inPhase : mine;
}

/** Expected and forbidden bands of a compound for a technique and phase (activity from the engine). */
export function compoundBands(
  compound: Compound,
  technique: Technique,
  phase: Phase,
  analyse: SymmetryAnalyser,
  broadFraction: number,
): CompoundBands {
  const expected: ExpectedBand[] = [];
  const forbidden: ExpectedBand[] = [];
  if (compound.geometry !== undefined && compound.fundamentals !== undefined) {
    const species = analyse(compound.geometry.xyz, compound.geometry.planarConvention).species;
    for (const f of compound.fundamentals) {
      if (f.matchable === false) continue;
      const s = species.find((x) => x.label === f.label);
      if (s === undefined) throw new RangeError(`${compound.id}: ${f.mode} has label ${f.label}, which is not a species of its Γvib`);
      const here = technique === 'ir' ? s.ir : s.raman;
      const there = technique === 'ir' ? s.raman : s.ir;
      const given = technique === 'ir' ? f.ir : f.raman;
      const band = fromFundamental(f, here ? (given ?? DEFAULT_INTENSITY) : ((technique === 'ir' ? f.raman : f.ir) ?? DEFAULT_INTENSITY), phase, broadFraction);
      if (band === undefined) continue;
      if (here) expected.push(band);
      else if (there) forbidden.push(band);
    }
  }
  for (const b of bandsForPhase(compound.bands ?? [], technique, phase)) {
    expected.push({
      cm1: b.cm1,
      weight: INTENSITY_WEIGHT[b.intensity],
      intensity: b.intensity,
      ...(b.label !== undefined ? { label: b.label } : {}),
      assignment: b.assignment,
      halfWidthCm1: (b.widthCm1 ?? 0) * broadFraction,
      phase: b.phase,
    });
  }
  const byPosition = (a: ExpectedBand, b: ExpectedBand) => a.cm1 - b.cm1;
  return { expected: expected.sort(byPosition), forbidden: forbidden.sort(byPosition) };
}
