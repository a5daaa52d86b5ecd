/**
 * The default SymmetryAnalyser: the symmetry engine's Γvib and activity for a library geometry.
 * Library geometries are written in the engine's standard orientation, so the point group is the
 * largest catalogue group whose every operation maps the structure onto itself (the engine's own
 * check in analyseVibrations); the engine then reduces Γ3N and gives each species' activity.
 */
import { analyseVibrations } from '../symmetry/analyse.js';
import { pointGroup, pointGroupNames } from '../symmetry/catalogue.js';
import type { Atom } from '../symmetry/types.js';
import { cachedAnalyser, type MoleculeSymmetry } from './symmetry-source.js';

function readXyz(xyz: string): Atom[] {
  const lines = xyz.split('\n');
  const n = Number(lines[0]);
  if (!Number.isInteger(n) || n < 1) throw new RangeError('XYZ geometry: the first line must be the atom count');
  const atoms: Atom[] = [];
  for (let i = 0; i < n; i++) {
    const parts = (lines[i + 2] ?? '').trim().split(/\s+/);
    const [x, y, z] = parts.slice(1, 4).map(Number);
    if (parts.length < 4 || ![x, y, z].every((v) => Number.isFinite(v))) throw new RangeError(`XYZ geometry: atom line ${i + 1} must be "element x y z"`);
    atoms.push({ element: parts[0]!, position: [x!, y!, z!] });
  }
  return atoms;
}

function analyse(xyz: string): MoleculeSymmetry {
  const atoms = readXyz(xyz);
  const groups = pointGroupNames()
    .map((name) => pointGroup(name))
    .sort((a, b) => b.order - a.order);
  for (const group of groups) {
    let result;
    try {
      result = analyseVibrations(group.name, atoms);
    } catch {
      continue; // this group's operations do not all map the structure onto itself
    }
    return {
      pointGroup: result.pointGroup,
      species: result.vibrations.modes.map((m) => ({ label: m.label, count: m.count, ir: m.ir, raman: m.raman })),
    };
  }
  throw new RangeError('XYZ geometry: no catalogue point group maps the structure onto itself');
}

/** Γvib with IR/Raman activity per species from the symmetry engine, cached per geometry. */
export const engineAnalyser = cachedAnalyser(analyse);
