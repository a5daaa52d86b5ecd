import { temperatureFromPrSeparation } from './temperature.js';

/** Options of {@link analyseContour}. */
export interface ContourAnalysisOptions {
  /** Rotational constant B (cm⁻¹) of the molecule, to estimate the temperature. */
  bCm1?: number;
  /** Smallest prominence of a branch maximum, as a fraction of the band maximum. Default 0.01. */
  minProminence?: number;
  /** A maximum near the band centre narrower (FWHM) than this fraction of the band's RMS width counts as a sharp Q branch. Default 0.5. */
  sharpQFraction?: number;
}

/** What a gas-phase band's contour shows. */
export interface ContourAnalysis {
  /** 'PR': two maxima with a central gap; 'PQR': a sharp central Q branch between them; 'unknown': neither. */
  readonly kind: 'PR' | 'PQR' | 'unknown';
  readonly pMaximumCm1?: number;
  readonly rMaximumCm1?: number;
  readonly qMaximumCm1?: number;
  /** R maximum − P maximum, cm⁻¹. */
  readonly separationCm1?: number;
  /** From Δν = 2.358·√(B·T) when B was given (parallel bands of linear molecules; rough for others). */
  readonly temperatureK?: number;
  readonly reason: string;
}

interface Maximum {
  readonly x: number;
  readonly height: number;
  readonly prominence: number;
}

/**
 * Recognise the branch structure of one observed band (ascending x, absorption upwards): find the
 * band's centroid and RMS width, look for a sharp maximum within half an RMS width of the centre
 * (a Q branch), take the
 * tallest maxima on either side as the P and R maxima (on the envelope of line tips when lines
 * are resolved, refined by a parabola), and estimate the temperature from their separation.
 */
export function analyseContour(xCm1: ArrayLike<number>, y: ArrayLike<number>, options: ContourAnalysisOptions = {}): ContourAnalysis {
  if (xCm1.length !== y.length || xCm1.length < 5) throw new RangeError('a contour needs at least 5 points and equal x and y lengths');
  const minProminence = options.minProminence ?? 0.01;
  const sharpQFraction = options.sharpQFraction ?? 0.5;
  const { ex, ey } = envelope(xCm1, y);
  const top = Math.max(...ey);
  if (!(top > 0)) return { kind: 'unknown', reason: 'the band has no positive signal' };
  const { centroid, rmsWidth } = moments(xCm1, y);
  const maxima = localMaxima(ex, ey).filter((m) => m.prominence >= minProminence * top);
  const central = maxima.filter((m) => Math.abs(m.x - centroid) < 0.5 * rmsWidth).sort((a, b) => b.height - a.height)[0];
  const qWidth = central ? widthAtHalf(xCm1, y, nearestIndex(xCm1, central.x)) : Infinity;
  const q = central && qWidth < sharpQFraction * rmsWidth ? central : undefined;
  const leftLimit = q ? q.x - qWidth : centroid;
  const rightLimit = q ? q.x + qWidth : centroid;
  const tallest = (list: Maximum[]) => list.sort((a, b) => b.height - a.height)[0];
  const p = tallest(maxima.filter((m) => m.x < leftLimit));
  const r = tallest(maxima.filter((m) => m.x > rightLimit));
  if (!p || !r) {
    return { kind: 'unknown', reason: `no ${p ? 'R' : 'P'}-branch maximum found ${p ? 'above' : 'below'} the band centre (${centroid.toFixed(1)} cm⁻¹)` };
  }
  const separationCm1 = r.x - p.x;
  const base = {
    pMaximumCm1: p.x,
    rMaximumCm1: r.x,
    separationCm1,
    ...(options.bCm1 !== undefined ? { temperatureK: temperatureFromPrSeparation(separationCm1, options.bCm1) } : {}),
  };
  if (q) {
    const qMaximumCm1 = refineOnGrid(xCm1, y, nearestIndex(xCm1, q.x));
    return { ...base, kind: 'PQR', qMaximumCm1, reason: `sharp Q branch at ${qMaximumCm1.toFixed(2)} cm⁻¹ between P and R maxima ${separationCm1.toFixed(2)} cm⁻¹ apart` };
  }
  return { ...base, kind: 'PR', reason: `P and R maxima ${separationCm1.toFixed(2)} cm⁻¹ apart with no sharp central Q branch` };
}

// Intensity-weighted centre and RMS width of the contour (negative noise counted as zero).
function moments(x: ArrayLike<number>, y: ArrayLike<number>): { centroid: number; rmsWidth: number } {
  let sum = 0;
  let first = 0;
  for (let i = 0; i < y.length; i++) {
    const v = Math.max(y[i], 0);
    sum += v;
    first += v * x[i];
  }
  const centroid = first / sum;
  let second = 0;
  for (let i = 0; i < y.length; i++) second += Math.max(y[i], 0) * (x[i] - centroid) ** 2;
  return { centroid, rmsWidth: Math.sqrt(second / sum) };
}

// The Q branch is one feature on the raw grid: climb to its top and fit a parabola there.
function refineOnGrid(x: ArrayLike<number>, y: ArrayLike<number>, i: number): number {
  for (;;) {
    if (i + 1 < y.length && y[i + 1] > y[i]) i++;
    else if (i > 0 && y[i - 1] > y[i]) i--;
    else break;
  }
  if (i === 0 || i === y.length - 1) return x[i];
  return parabolaVertex(x[i - 1], y[i - 1], x[i], y[i], x[i + 1], y[i + 1]);
}

// With resolved lines the contour is a comb: its branch maxima are those of the comb's tips.
// Unresolved contours (few tips) are used as they are.
function envelope(x: ArrayLike<number>, y: ArrayLike<number>): { ex: number[]; ey: number[] } {
  const tips: number[] = [];
  for (let i = 1; i < y.length - 1; i++) if (y[i] > y[i - 1] && y[i] >= y[i + 1]) tips.push(i);
  if (tips.length < 12) return { ex: Array.from(x), ey: Array.from(y) };
  return { ex: tips.map((i) => x[i]), ey: tips.map((i) => y[i]) };
}

function localMaxima(x: readonly number[], y: readonly number[]): Maximum[] {
  const out: Maximum[] = [];
  for (let i = 1; i < y.length - 1; i++) {
    if (!(y[i] > y[i - 1] && y[i] >= y[i + 1])) continue;
    let left = y[i];
    for (let k = i - 1; k >= 0 && y[k] <= y[i]; k--) left = Math.min(left, y[k]);
    let right = y[i];
    for (let k = i + 1; k < y.length && y[k] <= y[i]; k++) right = Math.min(right, y[k]);
    const vertex = parabolaVertex(x[i - 1], y[i - 1], x[i], y[i], x[i + 1], y[i + 1]);
    out.push({ x: vertex, height: y[i], prominence: y[i] - Math.max(left, right) });
  }
  return out;
}

// Vertex of the parabola through three points (spacing may be uneven, as for line tips).
function parabolaVertex(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): number {
  const d = (x0 - x1) * (x0 - x2) * (x1 - x2);
  const a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / d;
  const b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / d;
  if (!(a < 0)) return x1;
  const v = -b / (2 * a);
  return v >= x0 && v <= x2 ? v : x1;
}

function nearestIndex(x: ArrayLike<number>, value: number): number {
  let best = 0;
  for (let i = 1; i < x.length; i++) if (Math.abs(x[i] - value) < Math.abs(x[best] - value)) best = i;
  return best;
}

// Full width at half height of the feature at index i on the raw contour.
function widthAtHalf(x: ArrayLike<number>, y: ArrayLike<number>, i: number): number {
  const half = y[i] / 2;
  let l = i;
  while (l > 0 && y[l] > half) l--;
  let r = i;
  while (r < y.length - 1 && y[r] > half) r++;
  return x[r] - x[l];
}
