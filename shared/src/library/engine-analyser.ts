/**
 * The default SymmetryAnalyser: the symmetry engine's answer for a library geometry. The XYZ
 * text is read by the structure reader, the point group detected and the molecule oriented by
 * detectPointGroup, and Γvib with each species' IR/Raman activity reduced by analyseVibrations.
 */
import { parseXyz } from '../structure/xyz.js';
import { analyseVibrations } from '../symmetry/analyse.js';
import { detectPointGroup } from '../symmetry/detect/detect-point-group.js';
import type { PlanarConvention } from '../symmetry/types.js';
import { cachedAnalyser, type MoleculeSymmetry } from './symmetry-source.js';

function analyse(xyz: string, convention: PlanarConvention = 'yz'): MoleculeSymmetry {
  const detection = detectPointGroup(parseXyz(xyz), { convention });
  const result = analyseVibrations(detection.pointGroup, detection.oriented);
  return {
    pointGroup: result.pointGroup,
    species: result.vibrations.modes.map((m) => ({ label: m.label, count: m.count, ir: m.ir, raman: m.raman })),
  };
}

/** Γvib with IR/Raman activity per species from the symmetry engine, cached per geometry and convention. */
export const engineAnalyser = cachedAnalyser(analyse);
