import { pointGroup } from '../symmetry/catalogue.js';
import type { Compound } from './types.js';
import { engineAnalyser } from './engine-analyser.js';
import type { MoleculeSymmetry, SymmetryAnalyser } from './symmetry-source.js';

/**
 * Why a compound's fundamentals and labelled bands disagree with the symmetry engine, one sentence
 * each; empty when they agree or the entry has no geometry. The engine is the authority: the library
 * never types IR/Raman activity by hand, so a save must match the engine's Γvib exactly.
 */
export function geometryProblems(compound: Compound, analyser: SymmetryAnalyser = engineAnalyser): string[] {
  if (compound.geometry === undefined) return [];
  let symmetry: MoleculeSymmetry;
  try {
    symmetry = analyser(compound.geometry.xyz, compound.geometry.planarConvention);
  } catch (error) {
    // The structure reader (StructureError) or the point-group detection (RangeError) refused the geometry.
    if (error instanceof Error) return [`geometry: ${error.message}`];
    throw error;
  }
  const group = symmetry.pointGroup;
  const groupLabels = new Set(pointGroup(group).irreps.map((irrep) => irrep.label));
  const species = new Map(symmetry.species.map((s) => [s.label, s]));
  const problems: string[] = [];

  const listed = new Map<string, number>();
  (compound.fundamentals ?? []).forEach((f, i) => {
    const where = `fundamentals[${i}] (${f.mode})`;
    const s = species.get(f.label);
    if (s === undefined) {
      problems.push(
        groupLabels.has(f.label)
          ? `${where}: ${f.label} has no fundamentals in Γvib of ${group}`
          : `${where}: "${f.label}" is not an irrep of ${group} (its irreps: ${[...groupLabels].join(', ')})`,
      );
      return;
    }
    listed.set(f.label, (listed.get(f.label) ?? 0) + 1);
    if (f.ir !== undefined && !s.ir) problems.push(`${where}: gives an IR intensity, but ${f.label} is IR-inactive in ${group}`);
    if (f.raman !== undefined && !s.raman) problems.push(`${where}: gives a Raman intensity, but ${f.label} is Raman-inactive in ${group}`);
  });
  for (const s of symmetry.species) {
    const n = listed.get(s.label) ?? 0;
    if (n !== s.count) problems.push(`fundamentals: Γvib of ${group} has ${s.count} ${s.label}, the entry lists ${n}`);
  }

  (compound.bands ?? []).forEach((b, i) => {
    if (b.label === undefined) return;
    const s = species.get(b.label);
    const where = `bands[${i}] (${b.technique} ${b.cm1} cm⁻¹)`;
    if (s === undefined) problems.push(`${where}: "${b.label}" is not a vibrational species of ${group}`);
    else if (!(b.technique === 'ir' ? s.ir : s.raman)) problems.push(`${where}: ${b.label} is ${b.technique === 'ir' ? 'IR' : 'Raman'}-inactive in ${group}`);
  });

  return problems;
}
