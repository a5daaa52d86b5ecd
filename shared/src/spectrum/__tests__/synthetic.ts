/**
 * Synthetic test signals (invented data, not measurements): seeded noise and bands of known
 * position, height and width, so tests know the true answer.
 */
import type { Spectrum, Technique } from '../types.js';

/** Seeded uniform generator in [0, 1) (mulberry32), so every test run sees the same data. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Seeded standard-normal generator (Box–Muller). */
export function seededGaussian(seed: number): () => number {
  const uniform = seededRandom(seed);
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

/** One band of a synthetic scan. */
export interface Band {
  readonly x: number;
  readonly height: number;
  readonly fwhm: number;
}

/** Options of {@link syntheticSpectrum}. */
export interface SyntheticOptions {
  readonly from: number;
  readonly to: number;
  readonly step: number;
  readonly bands: readonly Band[];
  readonly noise?: number;
  readonly seed?: number;
  readonly shape?: 'gaussian' | 'lorentzian';
  readonly background?: (x: number) => number;
  readonly technique?: Technique;
}

/** Build a synthetic scan on a uniform ascending grid from band parameters. */
export function syntheticSpectrum(options: SyntheticOptions): Spectrum {
  const n = Math.round((options.to - options.from) / options.step) + 1;
  const xCm1 = new Float64Array(n);
  const y = new Float64Array(n);
  const noise = seededGaussian(options.seed ?? 1);
  for (let i = 0; i < n; i++) {
    const x = options.from + i * options.step;
    xCm1[i] = x;
    let v = options.background ? options.background(x) : 0;
    for (const b of options.bands) v += b.height * bandShape(x - b.x, b.fwhm, options.shape ?? 'lorentzian');
    y[i] = v + (options.noise ?? 0) * noise();
  }
  const technique = options.technique ?? 'ir';
  return { xCm1, y, ordinate: technique === 'ir' ? 'absorbance' : 'intensity', technique, title: 'synthetic (invented) scan' };
}

function bandShape(dx: number, fwhm: number, shape: 'gaussian' | 'lorentzian'): number {
  const h = fwhm / 2;
  return shape === 'gaussian' ? Math.exp(-Math.LN2 * (dx / h) ** 2) : 1 / (1 + (dx / h) ** 2);
}
