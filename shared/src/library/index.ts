/** The compound library: types, validation, the bundled data and its link to the symmetry engine. */
export * from './types.js';
export { CAS_PATTERN, isValidCas } from './cas.js';
export { BAND_RANGE_CM1, validateCompound } from './validate-compound.js';
export { validateLibrary, type Library } from './validate-library.js';
export { loadLibrary } from './load.js';
export { cachedAnalyser, type MoleculeSymmetry, type SpeciesActivity, type SymmetryAnalyser } from './symmetry-source.js';
export { engineAnalyser } from './engine-analyser.js';
export { geometryProblems } from './geometry-check.js';
