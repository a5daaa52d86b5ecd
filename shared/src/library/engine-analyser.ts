/**
 * The default SymmetryAnalyser: the symmetry engine's answer for a library geometry. The XYZ
 * text is read by the structure reader and analysed by the structure check's own composition
 * (detection, symmetrisation, Γvib with each species' IR/Raman activity).
 */
import { parseXyz } from '../structure/xyz.js';
import { analyseStructure } from '../structure-check/analyse-structure.js';
import type { PlanarConvention } from '../symmetry/types.js';
import { cachedAnalyser, type MoleculeSymmetry } from './symmetry-source.js';

function analyse(xyz: string, convention: PlanarConvention = 'yz'): MoleculeSymmetry {
  const { analysis: result } = analyseStructure(parseXyz(xyz), { convention });
  return {
    pointGroup: result.pointGroup,
    species: result.vibrations.modes.map((m) => ({ label: m.label, count: m.count, ir: m.ir, raman: m.raman })),
  };
}

/** Γvib with IR/Raman activity per species from the symmetry engine, cached per geometry and convention. */
export const engineAnalyser = cachedAnalyser(analyse);
