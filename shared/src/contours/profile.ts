import type { RotationalLine } from './lines.js';

/** Instrument line shape of the convolution. */
export type LineShape = 'gaussian' | 'lorentzian';

/** Options of {@link convolveLines}. */
export interface ProfileOptions {
  /** Instrument resolution as the line shape's FWHM, cm⁻¹. */
  resolutionCm1: number;
  /** Default 'gaussian'. */
  lineShape?: LineShape;
  /** Grid step; default resolution / 10. */
  stepCm1?: number;
  /** Grid limits; default the line range widened by 5 resolutions (Gaussian) or 20 (Lorentzian). */
  fromCm1?: number;
  toCm1?: number;
}

/** Put lines on a uniform grid, each broadened by the instrument line shape; y is scaled to a maximum of 1. */
export function convolveLines(lines: readonly RotationalLine[], options: ProfileOptions): { xCm1: Float64Array; y: Float64Array } {
  const { resolutionCm1 } = options;
  if (!(resolutionCm1 > 0)) throw new RangeError(`resolution must be positive, got ${resolutionCm1}`);
  if (lines.length === 0) throw new RangeError('no lines to convolve');
  const shape = options.lineShape ?? 'gaussian';
  const step = options.stepCm1 ?? resolutionCm1 / 10;
  const reach = (shape === 'gaussian' ? 5 : 20) * resolutionCm1;
  const positions = lines.map((l) => l.positionCm1);
  const from = options.fromCm1 ?? Math.min(...positions) - reach;
  const to = options.toCm1 ?? Math.max(...positions) + reach;
  const n = Math.floor((to - from) / step) + 1;
  if (!(n > 1) || n > 5_000_000) throw new RangeError(`grid of ${n} points is not usable; check the step and limits`);
  const xCm1 = Float64Array.from({ length: n }, (_, i) => from + i * step);
  const y = new Float64Array(n);
  const half = resolutionCm1 / 2;
  for (const line of lines) {
    const lo = Math.max(0, Math.floor((line.positionCm1 - reach - from) / step));
    const hi = Math.min(n - 1, Math.ceil((line.positionCm1 + reach - from) / step));
    for (let i = lo; i <= hi; i++) {
      const u = (xCm1[i] - line.positionCm1) / half;
      y[i] += line.intensity * (shape === 'gaussian' ? Math.exp(-Math.LN2 * u * u) : 1 / (1 + u * u));
    }
  }
  let max = 0;
  for (let i = 0; i < n; i++) max = Math.max(max, y[i]);
  if (max > 0) for (let i = 0; i < n; i++) y[i] /= max;
  return { xCm1, y };
}
