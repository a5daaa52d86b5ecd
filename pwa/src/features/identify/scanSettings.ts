/** What the inspector sets before importing a scan, and the processing parameters they may tune. */
import { DEFAULT_BASELINE, DEFAULT_PEAKS, type ProcessOptions, type Technique, type Phase } from '@siteband/shared';

/** Excitation wavelengths offered as one tap; anything else is typed in. */
export const COMMON_EXCITATIONS_NM = [785, 1064] as const;

/** The scan's technique and how it was taken. */
export interface ScanSettings {
  readonly technique: Technique;
  readonly phase: Phase;
  /** IR only: taken on a diamond ATR accessory. */
  readonly atr: boolean;
  /** Raman only: laser wavelength in nm. */
  readonly excitationNm: number;
}

/** The three processing parameters the screen offers; each null means the pipeline's own default. */
export interface ProcessingSettings {
  /** Baseline stiffness (arPLS λ at a 1 cm⁻¹ grid). */
  readonly baselineLambda: number | null;
  /** Savitzky–Golay window in points (odd, ≥ 5). */
  readonly smoothingWindow: number | null;
  /** Peak threshold as a multiple of the noise σ. */
  readonly peakThresholdSigma: number | null;
}

/** A handheld IR scan of a solid or liquid on ATR is the most common start (common practice). */
export const DEFAULT_SCAN_SETTINGS: ScanSettings = { technique: 'ir', phase: 'condensed', atr: true, excitationNm: 785 };

/** Every processing parameter left to the pipeline. */
export const DEFAULT_PROCESSING: ProcessingSettings = { baselineLambda: null, smoothingWindow: null, peakThresholdSigma: null };

/** The pipeline's default for each parameter, to show beside the inputs. */
export function processingDefaults(technique: Technique): { baselineLambda: number; peakThresholdSigma: number } {
  return { baselineLambda: DEFAULT_BASELINE[technique].lambda, peakThresholdSigma: DEFAULT_PEAKS.thresholdSigma };
}

/** Refuses settings the pipeline cannot use, with a message naming the field. */
export function validateScanSettings(scan: ScanSettings, processing: ProcessingSettings): void {
  if (scan.technique === 'raman' && !(scan.excitationNm >= 200 && scan.excitationNm <= 2000)) {
    throw new RangeError(`The excitation wavelength must be between 200 and 2000 nm, got ${scan.excitationNm}`);
  }
  const { baselineLambda, smoothingWindow, peakThresholdSigma } = processing;
  if (baselineLambda !== null && !(baselineLambda > 0 && Number.isFinite(baselineLambda))) {
    throw new RangeError(`The baseline stiffness must be a positive number, got ${baselineLambda}`);
  }
  if (smoothingWindow !== null && !(Number.isInteger(smoothingWindow) && smoothingWindow >= 5 && smoothingWindow % 2 === 1 && smoothingWindow <= 51)) {
    throw new RangeError(`The smoothing window must be an odd whole number of points from 5 to 51, got ${smoothingWindow}`);
  }
  if (peakThresholdSigma !== null && !(peakThresholdSigma > 0 && peakThresholdSigma <= 100)) {
    throw new RangeError(`The peak threshold must be above 0 and at most 100 × noise, got ${peakThresholdSigma}`);
  }
}

/** The pipeline's options for a scan with these settings. */
export function toProcessOptions(scan: ScanSettings, processing: ProcessingSettings): ProcessOptions {
  return {
    technique: scan.technique,
    phase: scan.phase,
    atr: scan.technique === 'ir' && scan.atr,
    ...(processing.baselineLambda !== null ? { baseline: { lambda: processing.baselineLambda } } : {}),
    ...(processing.smoothingWindow !== null ? { smoothing: { windowSize: processing.smoothingWindow } } : {}),
    ...(processing.peakThresholdSigma !== null ? { peaks: { thresholdSigma: processing.peakThresholdSigma } } : {}),
  };
}
