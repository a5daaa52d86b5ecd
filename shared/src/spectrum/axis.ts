/** Axis order and uniform grids: the pipeline always works on an ascending cm⁻¹ axis. */

/** Thrown when an axis cannot be put in strictly ascending order. */
export class AxisOrderError extends RangeError {
  constructor(readonly duplicateX: number) {
    super(`x axis repeats the value ${duplicateX}; a spectrum needs one y per x`);
    this.name = 'AxisOrderError';
  }
}

/**
 * Return x and y sorted by ascending x (descending files are common in IR). Throws
 * AxisOrderError when two points share an x, since no order can then be trusted.
 */
export function xyAscending(x: ArrayLike<number>, y: ArrayLike<number>): { x: Float64Array; y: Float64Array } {
  if (x.length !== y.length) throw new RangeError(`x has ${x.length} points but y has ${y.length}`);
  const n = x.length;
  let ascending = true;
  let descending = true;
  for (let i = 1; i < n; i++) {
    if (!(x[i] > x[i - 1])) ascending = false;
    if (!(x[i] < x[i - 1])) descending = false;
  }
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  if (ascending || descending) {
    for (let i = 0; i < n; i++) {
      const j = ascending ? i : n - 1 - i;
      xs[i] = x[j];
      ys[i] = y[j];
    }
    return { x: xs, y: ys };
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => x[a] - x[b]);
  for (let i = 0; i < n; i++) {
    xs[i] = x[order[i]];
    ys[i] = y[order[i]];
    if (i > 0 && xs[i] === xs[i - 1]) throw new AxisOrderError(xs[i]);
  }
  return { x: xs, y: ys };
}

/** Options of {@link resampleUniform}. */
export interface ResampleOptions {
  /** Grid step in cm⁻¹. Default: the median spacing of the input axis. */
  stepCm1?: number;
  /** First grid point. Default: the first input x. */
  fromCm1?: number;
  /** Last grid point (included when it falls on the grid). Default: the last input x. */
  toCm1?: number;
}

/**
 * Resample an ascending spectrum onto a uniform grid by linear interpolation; grid points
 * outside the input range are not produced.
 */
export function resampleUniform(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  options: ResampleOptions = {},
): { x: Float64Array; y: Float64Array } {
  const n = x.length;
  if (n < 2 || y.length !== n) throw new RangeError('resampling needs at least 2 points and equal x and y lengths');
  const from = Math.max(options.fromCm1 ?? x[0], x[0]);
  const to = Math.min(options.toCm1 ?? x[n - 1], x[n - 1]);
  const step = options.stepCm1 ?? medianSpacing(x);
  if (!(step > 0) || !Number.isFinite(step)) throw new RangeError(`grid step must be a positive number, got ${step}`);
  if (!(to > from)) throw new RangeError(`grid range is empty: ${from} to ${to}`);
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  const gx = new Float64Array(count);
  const gy = new Float64Array(count);
  let j = 0;
  for (let i = 0; i < count; i++) {
    const xi = from + i * step;
    while (j < n - 2 && x[j + 1] < xi) j++;
    const t = (xi - x[j]) / (x[j + 1] - x[j]);
    gx[i] = xi;
    gy[i] = y[j] + Math.min(Math.max(t, 0), 1) * (y[j + 1] - y[j]);
  }
  return { x: gx, y: gy };
}

/** Median spacing between consecutive points of an ascending axis. */
export function medianSpacing(x: ArrayLike<number>): number {
  const d = new Float64Array(x.length - 1);
  for (let i = 1; i < x.length; i++) d[i - 1] = x[i] - x[i - 1];
  d.sort();
  return d[Math.floor(d.length / 2)];
}

/** True when an ascending axis has the same spacing everywhere (to a relative 1e-6). */
export function isUniform(x: ArrayLike<number>): boolean {
  if (x.length < 3) return true;
  const step = (x[x.length - 1] - x[0]) / (x.length - 1);
  for (let i = 1; i < x.length; i++) {
    if (Math.abs(x[i] - x[i - 1] - step) > 1e-6 * Math.abs(step)) return false;
  }
  return true;
}
