/** Siteband's offline computation: pure TypeScript, shared by the PWA and the API. */
export * from './roles.js';
export * from './password-policy.js';
export * from './photo-caption.js';
export * from './symmetry/index.js';
export * from './spectrum/index.js';
export * from './instrument-check/index.js';
export * from './library/index.js';
export * from './identify/index.js';
export * from './hazards/index.js';
export * from './structure/index.js';
export * from './structure-check/index.js';
export * from './chem/index.js';
export * from './contours/index.js';
export * from './symmetry/detect/index.js';
export * from './case-archive/index.js';
export * from './table/index.js';
export * from './retry/index.js';
