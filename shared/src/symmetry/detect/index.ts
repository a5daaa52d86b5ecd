/** Point-group detection and standard orientation of structures. */
export { detectPointGroup, DEFAULT_DETECTION_TOLERANCE, type DetectOptions, type PointGroupDetection } from './detect-point-group.js';
export type { SymmetryElement } from './symmetry-elements.js';
export type { TopType } from './top-type.js';
export { standardOperations, inCatalogue, type StandardOperation } from './group-operations.js';
