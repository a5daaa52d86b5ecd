/** Checks atoms on entry and finds where each group operation sends each atom. */
import type { Atom, Mat3 } from './types.js';
import type { PointGroup } from './group-types.js';
import { apply } from './mat3.js';
import { AtomMatcher, atomKind } from './atom-matcher.js';

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

/**
 * Index of the atom each atom is sent to by op; throws when some atom has no equivalent partner
 * within the matcher's tolerance or two atoms land on the same one.
 */
function permutationUnder(matcher: AtomMatcher, op: Mat3, atoms: readonly Atom[], opName: string, groupName: string): number[] {
  const tolerance = matcher.tolerance;
  const used = new Uint8Array(atoms.length);
  return atoms.map((a, i) => {
    const target = apply(op, a.position);
    const best = matcher.nearest(target, i, tolerance);
    const within = best >= 0 && matcher.lastDistance <= tolerance;
    if (!within || used[best]) {
      // The matcher only looks within the tolerance; the message names the true nearest distance.
      const bestD = within ? matcher.lastDistance : matcher.nearestDistance(target, i);
      throw new RangeError(
        `structure is not symmetric under ${opName} of ${groupName}: atom ${i + 1} (${a.element}) lands ${bestD.toFixed(3)} Å from the nearest equivalent atom (tolerance ${tolerance} Å); check the point group and the standard orientation`,
      );
    }
    used[best] = 1;
    return best;
  });
}

/** Permutation of the atoms under every operation of the group (same order as group.operations). */
export function atomPermutations(group: PointGroup, atoms: readonly Atom[], tolerance = DEFAULT_SYMMETRY_TOLERANCE): number[][] {
  const matcher = new AtomMatcher(atoms.map((a) => a.position), atoms.map(atomKind), tolerance);
  return group.operations.map((o) => permutationUnder(matcher, o.matrix, atoms, group.classes[o.classIndex].label, group.name));
}

/** Whether the atom is left where it is by op. */
export function isUnmoved(op: Mat3, atom: Atom, tolerance: number): boolean {
  const p = atom.position;
  const q = apply(op, p);
  return Math.hypot(q[0] - p[0], q[1] - p[1], q[2] - p[2]) <= tolerance;
}
