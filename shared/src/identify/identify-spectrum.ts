/** From a raw spectrum to likely compounds: the pipeline's processScan, then identifyScan. */
import { processScan, type ProcessedScan } from '../spectrum/process-scan.js';
import type { ProcessOptions } from '../spectrum/process-options.js';
import type { Spectrum } from '../spectrum/types.js';
import { identifyScan, type IdentifyOptions } from './identify-scan.js';
import type { IdentifyResult } from './types.js';

/** Options of identifySpectrum: the pipeline's options plus the ranking's. */
export interface IdentifySpectrumOptions extends IdentifyOptions {
  readonly process: ProcessOptions;
  readonly toleranceCm1?: number;
  readonly resolutionCm1?: number;
}

/** Process a raw scan (baseline, smoothing, peak picking, quality) and rank the library for it. */
export function identifySpectrum(spectrum: Spectrum, options: IdentifySpectrumOptions): { processed: ProcessedScan; result: IdentifyResult } {
  const processed = processScan(spectrum, options.process);
  const result = identifyScan(
    {
      technique: options.process.technique,
      phase: options.process.phase,
      peaks: processed.peaks,
      spectrum: processed.spectrum,
      quality: processed.quality,
      ...(options.toleranceCm1 !== undefined ? { toleranceCm1: options.toleranceCm1 } : {}),
      ...(options.resolutionCm1 !== undefined ? { resolutionCm1: options.resolutionCm1 } : {}),
    },
    options,
  );
  return { processed, result };
}
