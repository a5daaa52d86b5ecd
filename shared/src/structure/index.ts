/** Reading structure files (XYZ, MOL V2000) into the symmetry engine's Structure. */
export { parseXyz } from './xyz.js';
export { parseMolV2000 } from './mol-v2000.js';
export { parseStructure, detectStructureFormat, type StructureFormat } from './parse-structure.js';
export { StructureError } from './structure-error.js';
export { MAX_ATOMS, DUPLICATE_DISTANCE } from './limits.js';
