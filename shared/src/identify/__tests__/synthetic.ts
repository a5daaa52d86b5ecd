/**
 * Invented synthetic scans for tests (not measured data): Lorentzian bands at a compound's
 * expected positions with random heights, small shifts, dropped weak bands, a sloping baseline
 * and white noise, on a 4,096-point axis, from a seeded PRNG so every run sees the same cases.
 */
import type { Spectrum, Phase, Technique } from '../../spectrum/types.js';
import type { CompoundBands } from '../expected-bands.js';

/** mulberry32: a small seeded PRNG (public-domain algorithm), uniform in [0, 1). */
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

/** Standard normal deviate from two uniforms (Box–Muller). */
export function gaussian(random: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

/** The scan axis of every synthetic case: 4,096 points, 100–4000 cm⁻¹. */
export const AXIS_POINTS = 4096;
export const axisCm1 = Float64Array.from({ length: AXIS_POINTS }, (_, i) => 100 + (i * 3900) / (AXIS_POINTS - 1));

/** One synthetic component: a compound's bands and how much of it is in the scan. */
export interface SyntheticComponent {
  readonly bands: CompoundBands;
  readonly amount: number;
}

/** Options of a synthetic scan. */
export interface SyntheticOptions {
  readonly technique: Technique;
  readonly phase: Phase;
  /** Largest random shift of each band, cm⁻¹ (default 3). */
  readonly maxShiftCm1?: number;
  /** Probability of dropping each weak (w, vw) band (default 0.5). */
  readonly dropWeak?: number;
  /** Noise σ relative to the tallest band (default 0.004). */
  readonly noise?: number;
  /** IR: record as a diamond ATR accessory would, absorbance × 1000 cm⁻¹ / ν (what processScan's ATR correction undoes). */
  readonly atr?: boolean;
  /** Raman: a broad fluorescence hump this many times the tallest band (default 0). */
  readonly fluorescence?: number;
}

/** A synthetic spectrum for one or more components (IR as absorbance, Raman as intensity). */
export function syntheticSpectrum(components: readonly SyntheticComponent[], options: SyntheticOptions, random: () => number): Spectrum {
  const shift = options.maxShiftCm1 ?? 3;
  const dropWeak = options.dropWeak ?? 0.5;
  const fwhmSharp = options.phase === 'gas' ? 4 : 10;
  const y = new Float64Array(AXIS_POINTS);
  for (const { bands, amount } of components) {
    for (const b of bands.expected) {
      if ((b.intensity === 'w' || b.intensity === 'vw') && random() < dropWeak) continue;
      const centre = b.cm1 + (2 * random() - 1) * shift;
      const height = amount * b.weight * (0.7 + 0.6 * random());
      const half = Math.max(fwhmSharp, b.halfWidthCm1 * 4) / 2;
      for (let i = 0; i < AXIS_POINTS; i++) {
        const d = (axisCm1[i]! - centre) / half;
        y[i] += height / (1 + d * d);
      }
    }
  }
  const tallest = y.reduce((m, v) => Math.max(m, v), 0) || 1;
  const a = 0.2 * random() * tallest;
  const slope = (0.5 * random() - 0.2) * tallest;
  const sigma = (options.noise ?? 0.004) * tallest;
  const hump = (options.fluorescence ?? 0) * tallest;
  const humpCentre = 1000 + 1000 * random();
  for (let i = 0; i < AXIS_POINTS; i++) {
    const x = axisCm1[i]!;
    if (options.atr) y[i] = (y[i]! * 1000) / x;
    y[i] += a + (slope * (x - 100)) / 3900 + hump * Math.exp(-(((x - humpCentre) / 1500) ** 2)) + sigma * gaussian(random);
  }
  return { xCm1: axisCm1, y, ordinate: options.technique === 'ir' ? 'absorbance' : 'intensity', technique: options.technique, title: 'synthetic (invented) scan' };
}
