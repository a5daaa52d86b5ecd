import type { Peak, ScanQuality, Technique } from './types.js';

/** What the quality verdict looks at. */
export interface QualityInput {
  readonly peaks: readonly Peak[];
  readonly noiseSigma: number;
  readonly saturation: { readonly saturated: boolean; readonly longestRun: number };
  readonly spikesRemoved: number;
  readonly technique: Technique;
  readonly minSnr: number;
  readonly minPeaks: number;
  readonly singlePeakMinSnr: number;
}

/** Decide whether a processed scan can be used for identification, with a reason for each failure. */
export function judgeQuality(input: QualityInput): ScanQuality {
  const tallest = input.peaks.reduce((m, p) => Math.max(m, p.height), 0);
  const snr = input.noiseSigma > 0 ? tallest / input.noiseSigma : tallest > 0 ? Infinity : 0;
  const reasons: string[] = [];
  if (snr < input.minSnr) {
    reasons.push(`low signal-to-noise: ${snr.toFixed(1)} (at least ${input.minSnr} needed); rescan with longer integration or more sample`);
  }
  if (input.saturation.saturated) {
    const remedy =
      input.technique === 'raman'
        ? 'shorten the integration time; lower the laser power rather than raising it (dark samples can heat and ignite)'
        : 'use a thinner layer or less sample';
    reasons.push(`detector saturation: flat top over ${input.saturation.longestRun} points; ${remedy}`);
  }
  // One clear band is evidence enough for single-band compounds; noise never reaches that SNR.
  const singleStrongPeak = input.peaks.length >= 1 && snr >= input.singlePeakMinSnr;
  if (input.peaks.length < input.minPeaks && !singleStrongPeak) {
    reasons.push(
      `too few peaks: ${input.peaks.length} found, at least ${input.minPeaks} needed (or one with signal-to-noise ≥ ${input.singlePeakMinSnr})`,
    );
  }
  return { snr, saturated: input.saturation.saturated, spikesRemoved: input.spikesRemoved, reliable: reasons.length === 0, reasons };
}
