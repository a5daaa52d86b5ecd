/** The spectrum pipeline: import, units, export, processing and the quality verdict. */
export * from './types.js';
export { SpectrumImportError, type SpectrumImportErrorCode, type SpectrumImportErrorLocation } from './import-error.js';
export { importSpectrum, importJcampAll } from './import.js';
export type { JcampBlock, JcampImport } from './import-jcamp.js';
export { checkJcampExpansion, MAX_JCAMP_POINTS } from './jcamp-expansion.js';
export { DEFAULT_MAX_IMPORT_BYTES, DEFAULT_MIN_POINTS, type ImportOptions } from './import-options.js';
export {
  nmToCm1,
  umToCm1,
  ramanShiftFromAbsoluteCm1,
  ramanShiftFromWavelengthNm,
  transmittanceToAbsorbance,
  absorbanceToTransmittance,
  detectXUnit,
  detectYUnit,
  type XUnit,
  type YUnit,
} from './units.js';
export { xyAscending, resampleUniform, medianSpacing, isUniform, AxisOrderError, type ResampleOptions } from './axis.js';
export { spectrumToJcamp, spectrumToCsv } from './export.js';
export { noiseSigma, median } from './noise.js';
export { smoothSavitzkyGolay, smoothingNoiseGain, DEFAULT_SMOOTH, type SmoothOptions } from './smooth.js';
export { estimateBaseline, DEFAULT_BASELINE, type BaselineOptions } from './baseline.js';
export { keepBroadBands, type BroadBandFit } from './broad-bands.js';
export { removeSpikes, DEFAULT_SPIKES, type SpikeOptions } from './spikes.js';
export { detectSaturation, DEFAULT_SATURATION, type SaturationOptions } from './saturation.js';
export { atrCorrection, DEFAULT_ATR, type AtrOptions } from './atr.js';
export {
  interferenceRegions,
  separateFlaggedPeaks,
  DEFAULT_INTERFERENCE,
  type InterferenceRegion,
  type InterferenceOptions,
} from './interferences.js';
export { pickPeaks, DEFAULT_PEAKS, type PeakOptions } from './peaks.js';
export { peakProminence, halfHeightWidth } from './prominence.js';
export { processScan, type ProcessedScan } from './process-scan.js';
export {
  defaultWindowPoints,
  type ProcessOptions,
  type ProcessParameters,
  type QualityOptions,
} from './process-options.js';
export { processOptionsFromRecord, ProcessingRecordError, RECORDED_PROCESSING_BOUNDS } from './recorded-processing.js';
export { validateSpectrum } from './validate.js';
export { SCAN_CAUTIONS, scanCautions } from './cautions.js';
