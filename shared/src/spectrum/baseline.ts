import airPLS from 'ml-airpls';
import { decimatedArpls, keepBroadBands } from './broad-bands.js';

/** Options of {@link estimateBaseline}. */
export interface BaselineOptions {
  /**
   * 'arpls' (default) is our arPLS. 'airpls' uses the ml-airpls package; on our synthetic
   * scans it lost whole bands on flat IR baselines and left errors of a large fraction of the
   * background under strong Raman fluorescence, so it is offered but not the default.
   */
  method?: 'airpls' | 'arpls';
  /**
   * Stiffness of the baseline at a 1 cm⁻¹ grid; scaled by (1 cm⁻¹ / step)⁴ for other grids so
   * the same curvature in cm⁻¹ is allowed whatever the point density. Larger is stiffer.
   */
  lambda?: number;
  /** Iteration cap of the reweighting. */
  maxIterations?: number;
  /** Stop criterion (airpls: fraction of the summed |y|; arpls: relative change of the weights). */
  tolerance?: number;
  /**
   * arpls only: scans with more points are block-averaged to at most this many before fitting
   * and the baseline is interpolated back, which keeps a 4,096-point scan fast (the baseline is
   * far smoother than the grid). Default 1024 (about 3.5 cm⁻¹ per point on a 4,096-point mid-IR scan).
   */
  maxPoints?: number;
  /**
   * arpls only: a wavenumber window where broad sample bands are expected, [from, to] cm⁻¹, or
   * null for none. Inside it the baseline never rises above a second, stiffer fit
   * (broadBandLambda), so a broad hydrogen-bonded X–H stretch is not taken for background.
   */
  broadBandWindowCm1?: readonly [number, number] | null;
  /** Stiffness of that second fit, at a 1 cm⁻¹ grid like lambda. */
  broadBandLambda?: number;
}

/**
 * Baseline defaults per technique, chosen on synthetic scans: IR has broad bands (O–H stretches
 * 100–400 cm⁻¹ wide keep ≥ 85 % of their height) on gentle slopes, so a stiff baseline; Raman
 * bands are narrow on fluorescence up to ~100 times taller than the bands, so it must bend more,
 * except in the X–H stretching window 2800–3800 cm⁻¹ where hydrogen-bonded O–H and N–H
 * stretches of water, aqueous solutions and hydroxides are broad (common practice).
 */
export const DEFAULT_BASELINE = {
  ir: { method: 'arpls', lambda: 1e7, maxIterations: 50, tolerance: 0.001, maxPoints: 1024, broadBandWindowCm1: null, broadBandLambda: 1e7 },
  raman: { method: 'arpls', lambda: 1e4, maxIterations: 50, tolerance: 0.001, maxPoints: 1024, broadBandWindowCm1: [2800, 3800], broadBandLambda: 1e7 },
} as const satisfies Record<string, Required<BaselineOptions>>;

/** Estimate a baseline under the bands and subtract it. */
export function estimateBaseline(
  xCm1: ArrayLike<number>,
  y: ArrayLike<number>,
  stepCm1: number,
  options: Required<BaselineOptions>,
): { baseline: Float64Array; corrected: Float64Array; iterations: number } {
  if (!(options.lambda > 0)) throw new RangeError(`baseline lambda must be positive, got ${options.lambda}`);
  if (!(stepCm1 > 0)) throw new RangeError(`grid step must be positive, got ${stepCm1}`);
  if (options.method !== 'airpls' && options.method !== 'arpls') {
    throw new RangeError(`baseline method must be 'airpls' or 'arpls', got ${String(options.method)}`);
  }
  if (!(options.maxPoints >= 16)) throw new RangeError(`baseline maxPoints must be at least 16, got ${options.maxPoints}`);
  const lambda = options.lambda / stepCm1 ** 4;
  let baseline: Float64Array;
  let iterations: number;
  if (options.method === 'arpls') {
    const fit = decimatedArpls(y, lambda, options.maxPoints, options.maxIterations, options.tolerance);
    baseline = fit.baseline;
    iterations = fit.iterations;
    if (options.broadBandWindowCm1) {
      const [lo, hi] = options.broadBandWindowCm1;
      if (!(lo < hi)) throw new RangeError(`baseline broadBandWindowCm1 must be [from, to] with from < to, got [${lo}, ${hi}]`);
      if (!(options.broadBandLambda > 0)) throw new RangeError(`baseline broadBandLambda must be positive, got ${options.broadBandLambda}`);
      const { maxIterations, tolerance } = options;
      keepBroadBands(xCm1, y, baseline, { windowCm1: options.broadBandWindowCm1, lambda: options.broadBandLambda / stepCm1 ** 4, maxIterations, tolerance });
    }
  } else {
    const result = airPLS(Array.from(xCm1), Array.from(y), {
      lambda,
      maxIterations: options.maxIterations,
      tolerance: options.tolerance,
    });
    baseline = Float64Array.from(result.baseline);
    iterations = result.iteration;
  }
  const corrected = new Float64Array(y.length);
  for (let i = 0; i < y.length; i++) corrected[i] = y[i] - baseline[i];
  return { baseline, corrected, iterations };
}
