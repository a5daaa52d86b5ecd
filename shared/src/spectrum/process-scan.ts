import { atrCorrection } from './atr.js';
import { scanCautions } from './cautions.js';
import { medianSpacing, resampleUniform } from './axis.js';
import { estimateBaseline } from './baseline.js';
import { interferenceRegions, separateFlaggedPeaks } from './interferences.js';
import { noiseSigma } from './noise.js';
import { pickPeaks } from './peaks.js';
import { resolveProcessOptions, type ProcessOptions, type ProcessParameters } from './process-options.js';
import { judgeQuality } from './quality.js';
import { detectSaturation } from './saturation.js';
import { smoothingNoiseGain, smoothSavitzkyGolay } from './smooth.js';
import { removeSpikes } from './spikes.js';
import { transmittanceToAbsorbance } from './units.js';
import { validateSpectrum } from './validate.js';
import type { FlaggedPeak, Peak, ScanQuality, Spectrum } from './types.js';

/** What processScan returns. */
export interface ProcessedScan {
  /** Baseline-corrected, smoothed scan on the uniform grid (IR as absorbance). */
  readonly spectrum: Spectrum;
  /** The subtracted baseline on the same grid. */
  readonly baseline: Float64Array;
  /** The sample's peaks, ascending in x; empty when the scan is too noisy to trust. */
  readonly peaks: Peak[];
  /** Peaks set apart as atmospheric residues or ATR-crystal absorption. */
  readonly flaggedPeaks: FlaggedPeak[];
  readonly quality: ScanQuality;
  readonly parameters: ProcessParameters;
  /** Safety cautions to show with any result from this scan. */
  readonly cautions: readonly string[];
}

/**
 * Process one scan for identification: uniform grid, absorbance, saturation check, cosmic-ray
 * removal (Raman), ATR correction (IR), arPLS baseline, Savitzky–Golay smoothing, noise-based
 * peak picking with FWHM, interference flags and a quality verdict.
 */
export function processScan(input: Spectrum, options: ProcessOptions): ProcessedScan {
  validateSpectrum(input);
  const gridStepCm1 = options.gridStepCm1 ?? defaultGridStep(input.xCm1);
  const settings = resolveProcessOptions(options, gridStepCm1);
  const span = input.xCm1[input.xCm1.length - 1] - input.xCm1[0];
  if (span / gridStepCm1 > MAX_GRID_POINTS) {
    throw new RangeError(`a ${gridStepCm1} cm⁻¹ grid over ${span.toFixed(1)} cm⁻¹ would need more than ${MAX_GRID_POINTS} points`);
  }
  if (input.ordinate !== 'intensity' && settings.technique === 'raman') {
    throw new RangeError(`a Raman scan must hold intensity, but this one holds ${input.ordinate}`);
  }
  if (input.ordinate === 'intensity' && settings.technique === 'ir') {
    throw new RangeError('an IR scan must hold absorbance or transmittance, but this one holds intensity');
  }
  const grid = resampleUniform(input.xCm1, toAbsorbance(input, settings.transmittanceFloor), { stepCm1: gridStepCm1 });
  if (grid.x.length < settings.smoothing.windowSize + 2) {
    throw new RangeError(`the scan has ${grid.x.length} grid points; processing needs at least ${settings.smoothing.windowSize + 2}`);
  }
  const saturation = detectSaturation(grid.y, settings.saturation);
  const despiked = settings.spikes.enabled ? removeSpikes(grid.y, settings.spikes) : { y: grid.y, spikesRemoved: 0 };
  const signal = settings.atr.enabled ? atrCorrection(grid.x, despiked.y, settings.atr) : despiked.y;
  const baseline = estimateBaseline(grid.x, signal, gridStepCm1, settings.baseline);
  const smoothed = smoothSavitzkyGolay(baseline.corrected, settings.smoothing);

  // σ of the raw corrected scan gives the signal-to-noise ratio; the peak threshold applies to
  // the smoothed scan, whose white-noise σ is the raw σ times the filter's noise gain.
  const rawSigma = noiseSigma(baseline.corrected);
  const smoothedSigma = rawSigma * smoothingNoiseGain(settings.smoothing);
  const picked = pickPeaks(grid.x, smoothed, { ...settings.peaks, noiseSigma: smoothedSigma });
  const split = separateFlaggedPeaks(picked, interferenceRegions(settings.technique, settings.phase, settings.atr.enabled, settings.interference));
  const sample = withRelativeHeights(split.peaks);
  const quality = judgeQuality({
    peaks: sample,
    noiseSigma: rawSigma,
    saturation,
    spikesRemoved: despiked.spikesRemoved,
    technique: settings.technique,
    ...settings.quality,
  });
  const parameters: ProcessParameters = {
    technique: settings.technique,
    phase: settings.phase,
    gridStepCm1,
    pointCount: grid.x.length,
    transmittanceFloor: settings.transmittanceFloor,
    atr: { enabled: settings.atr.enabled, referenceCm1: settings.atr.referenceCm1 },
    spikes: settings.spikes,
    saturation: settings.saturation,
    baseline: { ...settings.baseline, iterations: baseline.iterations },
    smoothing: settings.smoothing,
    peaks: { ...settings.peaks, noiseSigma: smoothedSigma, threshold: settings.peaks.thresholdSigma * smoothedSigma },
    interference: settings.interference,
    quality: settings.quality,
  };
  const lowSignal = quality.snr < settings.quality.minSnr;
  return {
    spectrum: {
      xCm1: grid.x,
      y: smoothed,
      ordinate: settings.technique === 'ir' ? 'absorbance' : 'intensity',
      technique: settings.technique,
      ...(input.excitationNm !== undefined ? { excitationNm: input.excitationNm } : {}),
      ...(input.title !== undefined ? { title: input.title } : {}),
      ...(input.meta !== undefined ? { meta: input.meta } : {}),
    },
    baseline: baseline.baseline,
    // Peaks of a scan below the signal-to-noise floor would be noise presented as evidence.
    peaks: lowSignal ? [] : sample,
    flaggedPeaks: lowSignal ? [] : split.flaggedPeaks,
    quality,
    parameters,
    cautions: scanCautions(settings.technique),
  };
}

// Largest uniform grid processScan builds; handheld scans have a few thousand points.
const MAX_GRID_POINTS = 200_000;

// The median spacing, but never so fine that a few clustered points would blow the grid up
// to more than four times the scan's own point count.
function defaultGridStep(x: Float64Array): number {
  const span = x[x.length - 1] - x[0];
  return Math.max(medianSpacing(x), span / (4 * x.length));
}

function toAbsorbance(spectrum: Spectrum, floor: number): Float64Array {
  if (spectrum.ordinate !== 'transmittance') return spectrum.y;
  return spectrum.y.map((t) => transmittanceToAbsorbance(Math.max(t, floor)));
}

function withRelativeHeights(peaks: readonly Peak[]): Peak[] {
  const tallest = peaks.reduce((m, p) => Math.max(m, p.height), 0);
  return peaks.map((p) => ({ ...p, relativeHeight: tallest > 0 ? p.height / tallest : 0 }));
}
