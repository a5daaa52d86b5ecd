/** Likely compounds for a scan: ranking by band agreement, mixtures, caution cards and escalation. */
export * from './types.js';
export * from './constants.js';
export { identifyScan, type IdentifyOptions } from './identify-scan.js';
export { compoundBands, type CompoundBands, type ExpectedBand } from './expected-bands.js';
export { buildLibraryIndex, sumBandPositions, type LibraryIndex, type BandTable } from './library-index.js';
export { observedPeaks, type ObservedPeaks } from './observed-peaks.js';
export { rankLibrary, fastPass, type RankedCompound } from './rank.js';
export { scoreCandidate, type AgainstPeak, type CandidateScore, type ExplainedPeak, type MissingBand, type ScoreParts } from './score-candidate.js';
export { findMixture, type MixtureFit } from './mixture.js';
export { MAX_TOLERANCE_CM1 } from './validate-input.js';
export { identifySpectrum, type IdentifySpectrumOptions } from './identify-spectrum.js';
export { scanResultRecord } from './scan-result-record.js';
export { referenceFor, spectrumCorrelation, MIN_CORRELATION_POINTS } from './correlation.js';
export { warmUpIdentification } from './warm-up.js';
export { phaseFit, type PhaseFit } from './phase-fit.js';
export { hasEscalationEvidence } from './escalation-evidence.js';
