import { DEFAULT_ATR, type AtrOptions } from './atr.js';
import { DEFAULT_BASELINE, type BaselineOptions } from './baseline.js';
import { DEFAULT_INTERFERENCE, type InterferenceOptions } from './interferences.js';
import { DEFAULT_PEAKS, type PeakOptions } from './peaks.js';
import { DEFAULT_SATURATION, type SaturationOptions } from './saturation.js';
import { DEFAULT_SMOOTH, type SmoothOptions } from './smooth.js';
import { DEFAULT_SPIKES, type SpikeOptions } from './spikes.js';
import type { Phase, Technique } from './types.js';

/** Thresholds of the quality verdict. */
export interface QualityOptions {
  /** Lowest tallest-peak signal-to-noise ratio for a usable scan. Default 10 (common practice). */
  minSnr?: number;
  /** Fewest sample peaks for a usable scan. Default 2 for condensed phase, 1 for gas. */
  minPeaks?: number;
  /**
   * A scan with fewer than minPeaks peaks is still usable when its tallest peak reaches this
   * signal-to-noise ratio: a sulfate, nitrate or chlorine Raman scan shows essentially one band.
   * Default 50 (five times minSnr, an engineering choice: noise alone stays far below it).
   */
  singlePeakMinSnr?: number;
}

/** Options of processScan: one object per step, every field optional except technique and phase. */
export interface ProcessOptions {
  technique: Technique;
  phase: Phase;
  /** IR only: the scan was taken on a diamond ATR accessory (correction and diamond-region flag). Default false. */
  atr?: boolean | AtrOptions;
  /** Uniform grid step in cm⁻¹. Default: the scan's median point spacing (at least span / (4 × points)). */
  gridStepCm1?: number;
  /** Transmittance below this fraction is clamped before A = −log10(T). Default 1e-4 (A = 4). */
  transmittanceFloor?: number;
  baseline?: BaselineOptions;
  smoothing?: SmoothOptions;
  peaks?: Omit<PeakOptions, 'noiseSigma'>;
  /** Raman only: cosmic-ray removal. */
  spikes?: SpikeOptions;
  saturation?: SaturationOptions;
  interference?: InterferenceOptions;
  quality?: QualityOptions;
}

/** Every parameter processScan actually used, for the scan's record and to reproduce it. */
export interface ProcessParameters {
  readonly technique: Technique;
  readonly phase: Phase;
  readonly gridStepCm1: number;
  readonly pointCount: number;
  readonly transmittanceFloor: number;
  readonly atr: { readonly enabled: boolean; readonly referenceCm1: number };
  readonly spikes: Required<SpikeOptions> & { readonly enabled: boolean };
  readonly saturation: Required<SaturationOptions>;
  readonly baseline: Required<BaselineOptions> & { readonly iterations: number };
  readonly smoothing: Required<SmoothOptions>;
  readonly peaks: Required<Omit<PeakOptions, 'noiseSigma'>> & { readonly noiseSigma: number; readonly threshold: number };
  readonly interference: Required<InterferenceOptions>;
  readonly quality: Required<QualityOptions>;
}

/**
 * Default Savitzky–Golay window for a grid: about 8 cm⁻¹ wide (9 points at 1 cm⁻¹), never
 * fewer than 5 points, so narrow Raman bands are not flattened on coarse grids.
 */
export function defaultWindowPoints(gridStepCm1: number): number {
  const points = Math.round(8 / gridStepCm1) + 1;
  const odd = points % 2 === 0 ? points + 1 : points;
  return Math.min(Math.max(odd, 5), 21);
}

/** The settings of every step with defaults filled in, for a scan on the given grid. */
export function resolveProcessOptions(options: ProcessOptions, gridStepCm1: number) {
  const { technique, phase } = options;
  if (!(gridStepCm1 > 0) || !Number.isFinite(gridStepCm1)) throw new RangeError(`grid step must be a positive number, got ${gridStepCm1}`);
  if (technique !== 'ir' && technique !== 'raman') throw new RangeError(`technique must be 'ir' or 'raman', got ${String(technique)}`);
  if (phase !== 'condensed' && phase !== 'gas') throw new RangeError(`phase must be 'condensed' or 'gas', got ${String(phase)}`);
  if (options.atr && technique !== 'ir') throw new RangeError('ATR correction applies to IR scans only');
  const atrOptions = typeof options.atr === 'object' ? options.atr : {};
  const transmittanceFloor = options.transmittanceFloor ?? 1e-4;
  if (!(transmittanceFloor > 0 && transmittanceFloor < 1)) {
    throw new RangeError(`transmittanceFloor must be between 0 and 1, got ${transmittanceFloor}`);
  }
  const quality = { minSnr: 10, minPeaks: phase === 'gas' ? 1 : 2, singlePeakMinSnr: 50, ...options.quality };
  if (!(quality.minSnr >= 0) || !(quality.minPeaks >= 0) || !(quality.singlePeakMinSnr >= 0)) throw new RangeError('quality thresholds must be ≥ 0');
  const window = defaultWindowPoints(gridStepCm1);
  const peaks = { ...DEFAULT_PEAKS, derivativeWindow: window, ...options.peaks };
  if (!(peaks.thresholdSigma > 0)) throw new RangeError(`peaks.thresholdSigma must be positive, got ${peaks.thresholdSigma}`);
  return {
    technique,
    phase,
    transmittanceFloor,
    atr: { enabled: Boolean(options.atr), ...DEFAULT_ATR, ...atrOptions },
    spikes: { enabled: technique === 'raman', ...DEFAULT_SPIKES, ...options.spikes },
    saturation: { ...DEFAULT_SATURATION, ...options.saturation },
    baseline: { ...DEFAULT_BASELINE[technique], ...options.baseline },
    smoothing: { ...DEFAULT_SMOOTH, windowSize: window, ...options.smoothing },
    peaks,
    interference: { ...DEFAULT_INTERFERENCE, ...options.interference },
    quality,
  };
}
