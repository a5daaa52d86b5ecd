/**
 * Keeping broad sample bands out of a soft baseline: in a window where broad bands are expected
 * (the hydrogen-bonded X–H stretches of Raman scans), a second, stiffer arPLS fit of the window
 * and its margins holds the baseline down where the soft one climbed a band.
 */
import { arplsBaseline } from './arpls.js';
import { blockMeans, expandBlocks } from './decimate.js';
import { noiseSigma } from './noise.js';
import { lowerBound } from './search.js';

/** What the stiff fit needs: its stiffness on the scan's grid and the reweighting settings. */
export interface BroadBandFit {
  readonly windowCm1: readonly [number, number];
  /** λ on the scan's grid (already scaled for the step). */
  readonly lambda: number;
  readonly maxIterations: number;
  readonly tolerance: number;
}

// Data either side of the window that the stiff fit sees, cm⁻¹: a stiff curve follows ~1,500 cm⁻¹
// of a fluorescence tail, not a whole scan.
const MARGIN_CM1 = 300;
// Cosine taper at each edge of the window, cm⁻¹, so no step appears.
const TAPER_CM1 = 150;
// The stiff fit is far smoother than the grid: this many points are plenty.
const MAX_POINTS = 128;
// Outside the window both fits must agree within this many noise σ (RMS), or the stiff one is
// not following the background (strong fluorescence) and is not used.
const AGREEMENT_SIGMA = 3;

/** arPLS on block means of at most maxPoints points (λ / factor⁴ on the coarser grid), brought back to every point. */
export function decimatedArpls(y: ArrayLike<number>, lambda: number, maxPoints: number, maxIterations: number, tolerance: number) {
  const factor = Math.ceil(y.length / maxPoints);
  const fit = arplsBaseline(factor > 1 ? blockMeans(y, factor) : y, lambda / factor ** 4, maxIterations, tolerance);
  return { baseline: factor > 1 ? expandBlocks(fit.baseline, factor, y.length) : fit.baseline, iterations: fit.iterations };
}

/** Lower `baseline` (in place) to the stiff fit inside the window where the soft one rose above it; returns whether it did. */
export function keepBroadBands(xCm1: ArrayLike<number>, y: ArrayLike<number>, baseline: Float64Array, fit: BroadBandFit): boolean {
  const [lo, hi] = fit.windowCm1;
  const from = lowerBound(xCm1, lo - MARGIN_CM1);
  const to = lowerBound(xCm1, hi + MARGIN_CM1);
  if (to - from < 16 || !(xCm1[from]! < hi && xCm1[to - 1]! > lo)) return false;
  const part = Float64Array.prototype.slice.call(y, from, to) as Float64Array;
  const stiff = decimatedArpls(part, fit.lambda, MAX_POINTS, fit.maxIterations, fit.tolerance).baseline;
  const sigma = noiseSigma(part);
  let sumSq = 0;
  let count = 0;
  for (let k = 0; k < stiff.length; k++) {
    const x = xCm1[k + from]!;
    if (x > lo - TAPER_CM1 && x < hi + TAPER_CM1) continue;
    sumSq += (baseline[k + from]! - stiff[k]!) ** 2;
    count++;
  }
  if (count > 0 && Math.sqrt(sumSq / count) > AGREEMENT_SIGMA * sigma) return false;
  for (let k = 0; k < stiff.length; k++) {
    const i = k + from;
    const x = xCm1[i]!;
    const excess = baseline[i]! - stiff[k]!;
    if (excess <= 0 || x <= lo - TAPER_CM1 || x >= hi + TAPER_CM1) continue;
    const edge = Math.min(x - (lo - TAPER_CM1), hi + TAPER_CM1 - x) / TAPER_CM1;
    baseline[i] = baseline[i]! - (edge >= 1 ? 1 : 0.5 - 0.5 * Math.cos(Math.PI * edge)) * excess;
  }
  return true;
}
