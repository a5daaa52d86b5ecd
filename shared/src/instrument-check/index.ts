/** The instrument check: a scan of a reference standard against its published band positions. */
export { runInstrumentCheck, type InstrumentCheckOptions, type InstrumentCheckResult, type BandCheck } from './run-check.js';
export { REFERENCE_STANDARDS, referenceStandard } from './standards.js';
export type { ReferenceBand, ReferenceStandard, Confidence } from './standard.js';
