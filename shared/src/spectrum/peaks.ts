import { gsd, type GSDPeak } from 'ml-gsd';
import { noiseSigma } from './noise.js';
import { halfHeightWidth, peakProminence } from './prominence.js';
import type { Peak } from './types.js';

/** Options of {@link pickPeaks}. */
export interface PeakOptions {
  /** Noise standard deviation in y units; estimated with noiseSigma when omitted. */
  noiseSigma?: number;
  /** A peak must stand this many noise σ above zero and above its bases (prominence). Default 5. */
  thresholdSigma?: number;
  /** Savitzky–Golay window of the derivative used to locate maxima, in points. Default 9 (processScan: defaultWindowPoints of the grid). */
  derivativeWindow?: number;
  /** Polynomial order of that derivative filter. Default 3. */
  derivativePolynomial?: number;
  /**
   * How ml-gsd proposes candidates: 'second' (minima of the second derivative, default) or
   * 'first' (zero crossings of the first derivative, which missed whole bands on coarse grids
   * in our tests). Candidates are then moved to the nearest local maximum and filtered.
   */
  detection?: 'first' | 'second';
}

/** Peak-picking defaults. */
export const DEFAULT_PEAKS: Required<Omit<PeakOptions, 'noiseSigma'>> = {
  thresholdSigma: 5,
  derivativeWindow: 9,
  derivativePolynomial: 3,
  detection: 'second',
};

/**
 * Pick peaks from a baseline-corrected, uniformly spaced, ascending scan: candidates from
 * ml-gsd moved to their local maximum, top refined by a parabola through three points, kept when both height and prominence exceed
 * thresholdSigma × noise σ; width is the FWHM above zero. End points are never peaks.
 */
export function pickPeaks(xCm1: ArrayLike<number>, y: ArrayLike<number>, options: PeakOptions = {}): Peak[] {
  const settings = { ...DEFAULT_PEAKS, ...options };
  const sigma = options.noiseSigma ?? noiseSigma(y);
  if (!(sigma >= 0) || !Number.isFinite(sigma)) throw new RangeError(`noise σ must be a finite number ≥ 0, got ${sigma}`);
  const threshold = settings.thresholdSigma * sigma;
  const n = y.length;
  const found = gsd(
    { x: Array.from(xCm1), y: Array.from(y) },
    {
      noiseLevel: threshold,
      peakDetectionAlgorithm: settings.detection,
      sgOptions: { windowSize: settings.derivativeWindow, polynomial: settings.derivativePolynomial },
    },
  );
  const peaks: { x: number; height: number; widthCm1: number }[] = [];
  const used = new Set<number>();
  for (const candidate of found) {
    const index = topOfCandidate(y, candidate);
    if (index <= 0 || index >= n - 1 || used.has(index)) continue;
    const { prominence, leftBase, rightBase } = peakProminence(y, index);
    const { x, height } = parabolicTop(xCm1, y, index);
    if (height <= threshold || prominence <= threshold) continue;
    used.add(index);
    peaks.push({ x, height, widthCm1: halfHeightWidth(xCm1, y, index, height, leftBase, rightBase) });
  }
  const tallest = peaks.reduce((m, p) => Math.max(m, p.height), 0);
  return peaks.map((p) => ({ ...p, relativeHeight: tallest > 0 ? p.height / tallest : 0 }));
}

// Vertex of the parabola through the top point and its neighbours (uniform grid): sub-point
// position and height, the usual three-point refinement.
function parabolicTop(x: ArrayLike<number>, y: ArrayLike<number>, i: number): { x: number; height: number } {
  const curvature = y[i - 1] - 2 * y[i] + y[i + 1];
  if (!(curvature < 0)) return { x: x[i], height: y[i] };
  const offset = (0.5 * (y[i - 1] - y[i + 1])) / curvature;
  return { x: x[i] + offset * (x[i + 1] - x[i]), height: y[i] - 0.25 * (y[i - 1] - y[i + 1]) * offset };
}

// gsd's candidate can sit off the top, and on a noisy broad band the nearest local maximum is
// a noise ripple: take the highest point between the candidate's inflection points, then
// climb to the local maximum. A shoulder climbs onto its parent band and is then dropped as a
// duplicate.
function topOfCandidate(y: ArrayLike<number>, candidate: GSDPeak): number {
  const from = Math.max(0, Math.min(candidate.index, candidate.inflectionPoints.from.index) - 2);
  const to = Math.min(y.length - 1, Math.max(candidate.index, candidate.inflectionPoints.to.index) + 2);
  let i = Math.min(Math.max(candidate.index, 0), y.length - 1);
  for (let k = from; k <= to; k++) if (y[k] > y[i]) i = k;
  for (;;) {
    if (i + 1 < y.length && y[i + 1] > y[i]) i++;
    else if (i > 0 && y[i - 1] > y[i]) i--;
    else return i;
  }
}
