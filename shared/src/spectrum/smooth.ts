import { Matrix, solve } from 'ml-matrix';
import savitzkyGolayModule from 'ml-savitzky-golay';

// The package ships CommonJS (Node wraps its default export in the module object) and ESM
// (bundlers hand over the function itself); accept both.
const savitzkyGolay = (
  typeof savitzkyGolayModule === 'function' ? savitzkyGolayModule : savitzkyGolayModule.default
) as typeof savitzkyGolayModule.default;

/** Options of {@link smoothSavitzkyGolay}. */
export interface SmoothOptions {
  /** Odd window length in points, ≥ 5. Default 9 (processScan: defaultWindowPoints of the grid). */
  windowSize?: number;
  /** Polynomial order, < windowSize. Default 3. */
  polynomial?: number;
}

/** The smoothing defaults, shared by processScan and its parameter record. */
export const DEFAULT_SMOOTH: Required<SmoothOptions> = { windowSize: 9, polynomial: 3 };

/**
 * Savitzky–Golay smoothing of uniformly spaced data. Interior points are the usual
 * convolution; the first and last half-windows are the values of a polynomial fitted to the
 * first and last window, the same edge rule as scipy's savgol_filter in its default mode.
 */
export function smoothSavitzkyGolay(y: ArrayLike<number>, options: SmoothOptions = {}): Float64Array {
  const { windowSize, polynomial } = { ...DEFAULT_SMOOTH, ...options };
  if (!Number.isInteger(windowSize) || windowSize < 5 || windowSize % 2 === 0) {
    throw new RangeError(`windowSize must be an odd integer ≥ 5, got ${windowSize}`);
  }
  if (!Number.isInteger(polynomial) || polynomial < 1 || polynomial >= windowSize) {
    throw new RangeError(`polynomial must be an integer from 1 to windowSize − 1, got ${polynomial}`);
  }
  if (y.length < windowSize) throw new RangeError(`smoothing needs at least ${windowSize} points, got ${y.length}`);
  const half = (windowSize - 1) / 2;
  const interior = savitzkyGolay(Array.from(y), 1, { windowSize, polynomial, derivative: 0, pad: 'none' });
  const out = new Float64Array(y.length);
  out.set(interior, half);
  fitEdge(y, 0, windowSize, polynomial, out, 0, half);
  fitEdge(y, y.length - windowSize, windowSize, polynomial, out, y.length - half, y.length);
  return out;
}

// Least-squares polynomial through y[start … start+windowSize), evaluated at [from, to).
function fitEdge(
  y: ArrayLike<number>,
  start: number,
  windowSize: number,
  polynomial: number,
  out: Float64Array,
  from: number,
  to: number,
): void {
  const design = new Matrix(windowSize, polynomial + 1);
  const values = new Matrix(windowSize, 1);
  for (let i = 0; i < windowSize; i++) {
    const t = i - (windowSize - 1) / 2;
    for (let p = 0; p <= polynomial; p++) design.set(i, p, t ** p);
    values.set(i, 0, y[start + i]);
  }
  const coefficients = solve(design, values, true);
  for (let k = from; k < to; k++) {
    const t = k - start - (windowSize - 1) / 2;
    let v = 0;
    for (let p = polynomial; p >= 0; p--) v = v * t + coefficients.get(p, 0);
    out[k] = v;
  }
}

/**
 * Factor by which smoothing scales the standard deviation of white noise in the interior:
 * the Euclidean norm of the filter's coefficients.
 */
export function smoothingNoiseGain(options: SmoothOptions = {}): number {
  const { windowSize } = { ...DEFAULT_SMOOTH, ...options };
  const impulse = new Float64Array(3 * windowSize);
  impulse[Math.floor(impulse.length / 2)] = 1;
  const response = smoothSavitzkyGolay(impulse, options);
  let sum = 0;
  for (let i = windowSize; i < 2 * windowSize; i++) sum += response[i] ** 2;
  return Math.sqrt(sum);
}
