/**
 * Mixture search: can two or three candidates together explain the scan clearly better than the
 * best single compound? Each candidate becomes a band model (Gaussians at its expected bands on a
 * grid), the observed peaks another; non-negative least squares (ml-fcnnls) finds the amounts.
 */
import { fcnnlsVector } from 'ml-fcnnls';
import {
  MIXTURE_GRID_STEP_CM1,
  MIXTURE_MIN_GAIN,
  MIXTURE_MIN_SHARE,
  MIXTURE_SIGMA_FRACTION,
  MIXTURE_THIRD_COMPONENT_GAIN,
} from './constants.js';
import type { CompoundBands } from './expected-bands.js';
import type { ObservedPeaks } from './observed-peaks.js';
import { bandWindow } from './scoring.js';

/** A mixture as found: which pool members, the share of observed intensity each explains, and the total. */
export interface MixtureFit {
  readonly members: readonly number[];
  readonly shares: readonly number[];
  readonly explainedShare: number;
  /** What the best single pool member explains on the same model, for comparison. */
  readonly bestSingleShare: number;
}

function gaussianInto(out: Float64Array, x0: number, grid0: number, centre: number, height: number, sigma: number): void {
  const from = Math.max(0, Math.floor((centre - 4 * sigma - grid0) / MIXTURE_GRID_STEP_CM1));
  const to = Math.min(out.length - 1, Math.ceil((centre + 4 * sigma - grid0) / MIXTURE_GRID_STEP_CM1));
  for (let i = from; i <= to; i++) {
    const d = (x0 + i * MIXTURE_GRID_STEP_CM1 - centre) / sigma;
    out[i] += height * Math.exp(-0.5 * d * d);
  }
}

interface Models {
  readonly y: number[];
  readonly columns: Float64Array[];
}

function buildModels(pool: readonly CompoundBands[], obs: ObservedPeaks, toleranceCm1: number): Models {
  const positions = [...obs.xCm1, ...pool.flatMap((b) => b.expected.map((e) => e.cm1))];
  const lo = Math.min(...positions) - 5 * toleranceCm1 - 200;
  const hi = Math.max(...positions) + 5 * toleranceCm1 + 200;
  const n = Math.ceil((hi - lo) / MIXTURE_GRID_STEP_CM1) + 1;
  const yFull = new Float64Array(n);
  obs.xCm1.forEach((x, j) => gaussianInto(yFull, lo, lo, x, obs.relativeHeight[j]!, MIXTURE_SIGMA_FRACTION * toleranceCm1));
  const full = pool.map((b) => {
    const col = new Float64Array(n);
    for (const e of b.expected) gaussianInto(col, lo, lo, e.cm1, e.weight, MIXTURE_SIGMA_FRACTION * bandWindow(toleranceCm1, e.halfWidthCm1));
    return col;
  });
  // Rows where neither the scan nor any model has signal add nothing to the fit: drop them.
  const keep: number[] = [];
  for (let i = 0; i < n; i++) if (yFull[i]! > 1e-4 || full.some((c) => c[i]! > 1e-4)) keep.push(i);
  return { y: keep.map((i) => yFull[i]!), columns: full.map((c) => Float64Array.from(keep, (i) => c[i]!)) };
}

interface Normal {
  /** Gram matrix of the model columns, AᵀA. */
  readonly gram: number[][];
  /** Aᵀy. */
  readonly aty: number[];
}

function normalEquations(models: Models): Normal {
  const { y, columns } = models;
  const k = columns.length;
  const gram = columns.map(() => new Array<number>(k).fill(0));
  const aty = new Array<number>(k).fill(0);
  for (let a = 0; a < k; a++) {
    const ca = columns[a]!;
    for (let i = 0; i < y.length; i++) aty[a] += ca[i]! * y[i]!;
    for (let b = a; b < k; b++) {
      const cb = columns[b]!;
      let s = 0;
      for (let i = 0; i < y.length; i++) s += ca[i]! * cb[i]!;
      gram[a]![b] = s;
      gram[b]![a] = s;
    }
  }
  return { gram, aty };
}

/**
 * Least squares depends on the data only through AᵀA and Aᵀy, so each subset is solved by
 * ml-fcnnls on the equivalent k×k system R x ≈ z (AᵀA = RᵀR, z = R⁻ᵀAᵀy) instead of the full grid.
 */
function subsetAmounts(normal: Normal, members: readonly number[]): number[] {
  const k = members.length;
  const g = members.map((a) => members.map((b) => normal.gram[a]![b]!));
  const ridge = 1e-9 * g.reduce((s, row, i) => s + row[i]!, 0);
  const r = g.map(() => new Array<number>(k).fill(0));
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let s = g[i]![j]! + (i === j ? ridge : 0);
      for (let m = 0; m < j; m++) s -= r[i]![m]! * r[j]![m]!;
      r[i]![j] = i === j ? Math.sqrt(Math.max(s, ridge)) : s / r[j]![j]!;
    }
  }
  // r is the lower factor L (G = L Lᵀ); the system is Lᵀ x ≈ L⁻¹ Aᵀy.
  const z = new Array<number>(k).fill(0);
  for (let i = 0; i < k; i++) {
    let s = normal.aty[members[i]!]!;
    for (let m = 0; m < i; m++) s -= r[i]![m]! * z[m]!;
    z[i] = s / r[i]![i]!;
  }
  const lt = r.map((_, i) => r.map((row) => row[i]!));
  return fcnnlsVector(lt, z).K.to1DArray();
}

function fit(models: Models, normal: Normal, members: readonly number[]): { explained: number; shares: number[] } {
  const { y, columns } = models;
  const k = subsetAmounts(normal, members);
  let totalY = 0;
  let explained = 0;
  let totalFit = 0;
  const contribution = members.map(() => 0);
  for (let i = 0; i < y.length; i++) {
    let f = 0;
    members.forEach((m, c) => {
      const v = Math.max(0, k[c]!) * columns[m]![i]!;
      contribution[c] += v;
      f += v;
    });
    totalY += y[i]!;
    totalFit += f;
    explained += Math.min(f, y[i]!);
  }
  const share = totalY > 0 ? explained / totalY : 0;
  return { explained: share, shares: contribution.map((c) => (totalFit > 0 ? (share * c) / totalFit : 0)) };
}

function subsets(n: number, size: number): number[][] {
  if (size === 0) return [[]];
  const out: number[][] = [];
  for (let first = 0; first <= n - size; first++) for (const rest of subsets(n - first - 1, size - 1)) out.push([first, ...rest.map((r) => r + first + 1)]);
  return out;
}

/** The best mixture of two or three pool members, or null when none beats the best single compound by MIXTURE_MIN_GAIN. */
export function findMixture(pool: readonly CompoundBands[], obs: ObservedPeaks, toleranceCm1: number): MixtureFit | null {
  if (pool.length < 2 || obs.xCm1.length < 2) return null;
  const models = buildModels(pool, obs, toleranceCm1);
  const normal = normalEquations(models);
  const best = (size: number) =>
    subsets(pool.length, size)
      .map((members) => ({ members, ...fit(models, normal, members) }))
      .reduce((a, b) => (b.explained > a.explained ? b : a));
  const single = best(1);
  const pair = best(2);
  const triple = pool.length >= 3 ? best(3) : null;
  const chosen = triple !== null && triple.explained - pair.explained >= MIXTURE_THIRD_COMPONENT_GAIN ? triple : pair;
  if (chosen.explained - single.explained < MIXTURE_MIN_GAIN) return null;
  if (chosen.shares.some((s) => s < MIXTURE_MIN_SHARE)) return null;
  return { members: chosen.members, shares: chosen.shares, explainedShare: chosen.explained, bestSingleShare: single.explained };
}
