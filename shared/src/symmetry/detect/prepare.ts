/** Centre of mass, principal axes and sets of possibly equivalent atoms: the input to the element search. */
import type { Atom, Structure, Vec3 } from '../types.js';
import { atomMass } from '../../chem/isotopes.js';
import { atomKind } from '../atom-matcher.js';
import { inertiaEigen } from '../inertia.js';

/** A structure moved to its centre of mass, with what the search needs to know about it. */
export interface PreparedStructure {
  readonly atoms: readonly Atom[];
  /** Positions relative to the centre of mass (input axes), Å. */
  readonly positions: readonly Vec3[];
  readonly masses: readonly number[];
  /** Element plus isotope: only atoms of the same kind can be exchanged by an operation. */
  readonly kinds: readonly string[];
  readonly centre: Vec3;
  /** Principal moments (u·Å², ascending) and their unit axes in the input frame. */
  readonly moments: readonly [number, number, number];
  readonly axes: readonly [Vec3, Vec3, Vec3];
  /** Atoms of one kind at one distance from the centre (within the tolerance), centre atoms excluded; smallest first, then farthest. */
  readonly classes: readonly (readonly number[])[];
}

/** Masses, centre of mass, inertia tensor eigen-decomposition and equivalence classes of `structure`. */
export function prepareStructure(structure: Structure, tolerance: number): PreparedStructure {
  const atoms = structure.atoms;
  const masses = atoms.map((a, i) => {
    const m = atomMass(a.element, a.isotope);
    if (m === undefined) throw new RangeError(`atom ${i + 1}: no mass known for ${a.isotope ?? ''}${a.element}`);
    return m;
  });
  const total = masses.reduce((s, m) => s + m, 0);
  const centre = [0, 1, 2].map((k) => atoms.reduce((s, a, i) => s + masses[i] * a.position[k], 0) / total) as unknown as Vec3;
  const positions = atoms.map((a): Vec3 => [a.position[0] - centre[0], a.position[1] - centre[1], a.position[2] - centre[2]]);
  const kinds = atoms.map(atomKind);

  const { values, axes } = inertiaEigen(positions, masses);
  const moments = values.map((v) => Math.max(0, v)) as unknown as [number, number, number];

  return { atoms, positions, masses, kinds, centre, moments, axes, classes: equivalenceClasses(positions, kinds, tolerance) };
}

function equivalenceClasses(positions: readonly Vec3[], kinds: readonly string[], tolerance: number): number[][] {
  const radius = positions.map((p) => Math.hypot(p[0], p[1], p[2]));
  const byKind = new Map<string, number[]>();
  radius.forEach((r, i) => {
    if (r < tolerance) return; // an atom at the centre is fixed by every operation
    const members = byKind.get(kinds[i]);
    if (members) members.push(i);
    else byKind.set(kinds[i], [i]);
  });
  const classes: number[][] = [];
  for (const members of byKind.values()) {
    members.sort((a, b) => radius[a] - radius[b]);
    let current = [members[0]];
    for (let k = 1; k < members.length; k++) {
      // Symmetry-equivalent atoms share a radius up to the noise, so a gap wider than the tolerance separates sets.
      if (radius[members[k]] - radius[members[k - 1]] > tolerance) {
        classes.push(current);
        current = [];
      }
      current.push(members[k]);
    }
    classes.push(current);
  }
  // Smallest first; among equal sizes the farthest from the centre, whose direction noise disturbs least.
  return classes.sort((a, b) => a.length - b.length || radius[b[0]] - radius[a[0]]);
}
