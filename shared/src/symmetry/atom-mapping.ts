/** Checks atoms on entry and finds where each group operation sends each atom. */
import type { Atom, Mat3 } from './types.js';
import type { PointGroup } from './group-types.js';
import { apply } from './mat3.js';

/** Default distance (Å) within which a moved atom must land on an equivalent atom. */
export const DEFAULT_SYMMETRY_TOLERANCE = 0.05;

/** Throws TypeError/RangeError describing the first malformed atom. */
export function validateAtoms(atoms: readonly Atom[]): void {
  if (!Array.isArray(atoms) || atoms.length === 0) throw new RangeError('structure has no atoms');
  atoms.forEach((a, i) => {
    if (typeof a?.element !== 'string' || !/^[A-Z][a-z]{0,2}$/.test(a.element)) {
      throw new TypeError(`atom ${i + 1}: element must be a symbol such as "C" or "Cl", got ${JSON.stringify(a?.element)}`);
    }
    if (a.isotope !== undefined && (!Number.isInteger(a.isotope) || a.isotope <= 0)) {
      throw new TypeError(`atom ${i + 1} (${a.element}): isotope must be a positive mass number, got ${a.isotope}`);
    }
    if (!Array.isArray(a.position) || a.position.length !== 3 || !a.position.every(Number.isFinite)) {
      throw new TypeError(`atom ${i + 1} (${a.element}): position must be three finite numbers in Å`);
    }
  });
}

/** Atoms are equivalent only when element and isotope both match. */
const sameKind = (a: Atom, b: Atom) => a.element === b.element && a.isotope === b.isotope;

const distance = (p: readonly number[], q: readonly number[]) => Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);

/** Index of the atom each atom is sent to by op; throws when some atom has no equivalent partner. */
export function atomPermutation(op: Mat3, atoms: readonly Atom[], tolerance: number, opName: string, groupName: string): number[] {
  const used = new Set<number>();
  return atoms.map((a, i) => {
    const target = apply(op, a.position);
    let best = -1;
    let bestD = Infinity;
    atoms.forEach((b, j) => {
      if (!sameKind(a, b)) return;
      const d = distance(target, b.position);
      if (d < bestD) [best, bestD] = [j, d];
    });
    if (best < 0 || bestD > tolerance || used.has(best)) {
      throw new RangeError(
        `structure is not symmetric under ${opName} of ${groupName}: atom ${i + 1} (${a.element}) lands ${bestD.toFixed(3)} Å from the nearest equivalent atom (tolerance ${tolerance} Å); check the point group and the standard orientation`,
      );
    }
    used.add(best);
    return best;
  });
}

/** Permutation of the atoms under every operation of the group (same order as group.operations). */
export function atomPermutations(group: PointGroup, atoms: readonly Atom[], tolerance = DEFAULT_SYMMETRY_TOLERANCE): number[][] {
  return group.operations.map((o) => atomPermutation(o.matrix, atoms, tolerance, group.classes[o.classIndex].label, group.name));
}

/** Whether the atom is left where it is by op. */
export function isUnmoved(op: Mat3, atom: Atom, tolerance: number): boolean {
  return distance(apply(op, atom.position), atom.position) <= tolerance;
}
