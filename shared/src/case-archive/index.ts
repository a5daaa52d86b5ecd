/** Case archives: one case with its records and files in a single ZIP, for days without a network (SPEC.md). */
export * from './format.js';
export { CaseArchiveError, type CaseArchiveErrorCode } from './case-archive-error.js';
export { buildCaseArchive, type CaseArchiveInput } from './build-case-archive.js';
export { readCaseArchive } from './read-case-archive.js';
export { archiveChangeId } from './archive-change-id.js';
export { archiveOwnerProblem } from './archive-owner.js';
export { sha256Hex } from './sha256-hex.js';
