/** The structure check: parse, detect the point group, reduce Γvib, report activity. */
export { checkStructure, hillFormula, type StructureCheck, type StructureCheckElement, type StructureCheckOptions } from './check-structure.js';
export { analyseStructure, type AnalyseStructureOptions, type AnalysedStructure } from './analyse-structure.js';
