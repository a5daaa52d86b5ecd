/**
 * Robust noise level of a scan: the median absolute deviation (MAD) of the first difference,
 * scaled to a Gaussian standard deviation. Common practice: differencing removes the slowly
 * varying signal, and the median ignores the few large steps at band edges.
 */

// 1/Φ⁻¹(3/4) = 1.4826 turns a MAD into σ for Gaussian data; the difference of two independent
// samples has σ·√2, hence the division (standard statistics, from memory).
const MAD_TO_SIGMA = 1.4826;

/** Estimate the standard deviation of the noise in y (same units as y). */
export function noiseSigma(y: ArrayLike<number>): number {
  const n = y.length;
  if (n < 3) throw new RangeError(`noise estimation needs at least 3 points, got ${n}`);
  const d = new Float64Array(n - 1);
  for (let i = 1; i < n; i++) d[i - 1] = y[i] - y[i - 1];
  const med = median(d);
  for (let i = 0; i < d.length; i++) d[i] = Math.abs(d[i] - med);
  return (MAD_TO_SIGMA * median(d)) / Math.SQRT2;
}

/** Median of a numeric array (the input is not modified). */
export function median(values: ArrayLike<number>): number {
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}
