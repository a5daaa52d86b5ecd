/** Options of {@link detectSaturation}. */
export interface SaturationOptions {
  /** Fewest consecutive points at the maximum that make a flat top. Default 4. */
  minRunPoints?: number;
  /** Points within this fraction of the data range below the maximum count as "at the maximum". Default 1e-4. */
  relativeTolerance?: number;
}

/** Saturation-check defaults. */
export const DEFAULT_SATURATION: Required<SaturationOptions> = { minRunPoints: 4, relativeTolerance: 1e-4 };

/**
 * Detect detector saturation: a flat top where several consecutive points sit at the scan's
 * maximum. Real bands are rounded at their top; a clipped detector or a totally absorbing
 * band is flat.
 */
export function detectSaturation(y: ArrayLike<number>, options: SaturationOptions = {}): { saturated: boolean; longestRun: number } {
  const { minRunPoints, relativeTolerance } = { ...DEFAULT_SATURATION, ...options };
  let max = -Infinity;
  let min = Infinity;
  for (let i = 0; i < y.length; i++) {
    if (y[i] > max) max = y[i];
    if (y[i] < min) min = y[i];
  }
  const range = max - min;
  if (!(range > 0)) return { saturated: false, longestRun: 0 };
  const level = max - relativeTolerance * range;
  let run = 0;
  let longest = 0;
  for (let i = 0; i < y.length; i++) {
    run = y[i] >= level ? run + 1 : 0;
    if (run > longest) longest = run;
  }
  return { saturated: longest >= minRunPoints, longestRun: longest };
}
