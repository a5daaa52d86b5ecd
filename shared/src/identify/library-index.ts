/**
 * The compound library prepared for one technique and phase: every compound's expected bands,
 * and all band positions in sorted typed arrays so each observed peak finds its matches by
 * binary search instead of a pass over the library.
 */
import type { SymmetryAnalyser } from '../library/symmetry-source.js';
import type { Compound } from '../library/types.js';
import type { Phase, Technique } from '../spectrum/types.js';
import { BROAD_BAND_WINDOW_FRACTION } from './constants.js';
import { compoundBands, type CompoundBands } from './expected-bands.js';

/** Sorted band positions with their owner compound, weight and broad-band half window. */
export interface BandTable {
  readonly positionCm1: Float64Array;
  readonly owner: Int32Array;
  readonly weight: Float64Array;
  readonly halfWidthCm1: Float64Array;
  readonly maxHalfWidthCm1: number;
}

/** The library ready for ranking scans of one technique and phase. */
export interface LibraryIndex {
  readonly technique: Technique;
  readonly phase: Phase;
  readonly compounds: readonly Compound[];
  readonly bands: readonly CompoundBands[];
  /** Σ weight of each compound's expected bands. */
  readonly totalWeight: Float64Array;
  /** Sharp bands, searched within the scan tolerance. */
  readonly sharp: BandTable;
  /** Broad bands (a quarter-width wider than any tolerance we accept), searched with their own windows. */
  readonly broad: BandTable;
}

function table(entries: { cm1: number; owner: number; weight: number; half: number }[]): BandTable {
  entries.sort((a, b) => a.cm1 - b.cm1);
  const n = entries.length;
  const t = {
    positionCm1: new Float64Array(n),
    owner: new Int32Array(n),
    weight: new Float64Array(n),
    halfWidthCm1: new Float64Array(n),
    maxHalfWidthCm1: 0,
  };
  entries.forEach((e, i) => {
    t.positionCm1[i] = e.cm1;
    t.owner[i] = e.owner;
    t.weight[i] = e.weight;
    t.halfWidthCm1[i] = e.half;
    if (e.half > t.maxHalfWidthCm1) t.maxHalfWidthCm1 = e.half;
  });
  return t;
}

/** Prepare the library for one technique and phase (activity from the symmetry engine). */
export function buildLibraryIndex(compounds: readonly Compound[], technique: Technique, phase: Phase, analyse: SymmetryAnalyser): LibraryIndex {
  const bands = compounds.map((c) => compoundBands(c, technique, phase, analyse, BROAD_BAND_WINDOW_FRACTION));
  const totalWeight = new Float64Array(compounds.length);
  const sharp: { cm1: number; owner: number; weight: number; half: number }[] = [];
  const broad: typeof sharp = [];
  bands.forEach((b, owner) => {
    for (const e of b.expected) {
      totalWeight[owner] += e.weight;
      (e.halfWidthCm1 > 0 ? broad : sharp).push({ cm1: e.cm1, owner, weight: e.weight, half: e.halfWidthCm1 });
    }
  });
  return { technique, phase, compounds, bands, totalWeight, sharp: table(sharp), broad: table(broad) };
}

/** A pass over every band position of the index (the bench's yardstick for the ranking's cost). */
export function sumBandPositions(index: LibraryIndex): number {
  let s = 0;
  for (const t of [index.sharp, index.broad]) for (let i = 0; i < t.positionCm1.length; i++) s += t.positionCm1[i]!;
  return s;
}
