/**
 * Bond stretches as internal coordinates: the representation they span (a bond counts under R when R
 * sends it onto itself, ends kept or swapped) and symmetry-adapted combinations by projection.
 */
import type { PointGroup } from './group-types.js';
import type { Bond } from './bonds.js';
import { reduceCharacters, type Decomposition, type Representation } from './representation.js';

/** Symmetry-adapted combinations of bond stretches of one irrep: coefficients per bond, each normalised. */
export interface StretchCombinations {
  readonly irrep: string;
  readonly combinations: readonly (readonly number[])[];
}

/** Image of every bond under every operation (from the atom permutations); throws when the bond set is not symmetric. */
export function bondPermutations(group: PointGroup, bonds: readonly Bond[], atomPermutations: readonly (readonly number[])[]): number[][] {
  const atomCount = atomPermutations[0]?.length ?? 0;
  // A number per unordered atom pair: cheaper than string keys for thousands of bonds × operations.
  const bondKey = (i: number, j: number) => (i < j ? i * atomCount + j : j * atomCount + i);
  const index = new Map(bonds.map(([i, j], k) => [bondKey(i, j), k]));
  return atomPermutations.map((perm, o) =>
    bonds.map(([i, j], k) => {
      const image = index.get(bondKey(perm[i], perm[j]));
      if (image === undefined) {
        const op = group.classes[group.operations[o].classIndex].label;
        throw new RangeError(`bond ${k + 1} (atoms ${i + 1}–${j + 1}) has no symmetric partner under ${op}: the bond list does not have ${group.name} symmetry`);
      }
      return image;
    }),
  );
}

/** Per class, how many of the bonds `members` its representative operation sends onto themselves. */
function fixedBondCounts(group: PointGroup, bondPerms: readonly (readonly number[])[], members: readonly number[]): number[] {
  return group.classes.map((_, c) => {
    const perm = bondPerms[group.operations.findIndex((op) => op.classIndex === c)];
    return members.filter((k) => perm[k] === k).length;
  });
}

/** Γstretch: per class, the number of bonds the representative operation sends onto themselves. */
export function stretchRepresentation(group: PointGroup, bondPerms: readonly (readonly number[])[]): Representation {
  const characters = fixedBondCounts(group, bondPerms, bondPerms[0].map((_, k) => k));
  return { characters, decomposition: reduceCharacters(group, characters) };
}

/** The orbit of every bond under the group: the sorted indices of its images, shared by all bonds of one orbit. */
function bondOrbits(bondPerms: readonly (readonly number[])[], nBonds: number): (readonly number[])[] {
  const orbits = new Array<readonly number[]>(nBonds);
  for (let b = 0; b < nBonds; b++) {
    if (orbits[b]) continue;
    const orbit = [...new Set(bondPerms.map((perm) => perm[b]))].sort((p, q) => p - q);
    for (const member of orbit) orbits[member] = orbit;
  }
  return orbits;
}

/** The irreps the stretches of one orbit span (its own Γstretch), so a filled orbit is skipped. */
const orbitDecomposition = (group: PointGroup, bondPerms: readonly (readonly number[])[], orbit: readonly number[]): Decomposition =>
  reduceCharacters(group, fixedBondCounts(group, bondPerms, orbit));

/**
 * Projection-operator combinations P^Γ b = (d/h) Σ_R χ^Γ(R) R·b, orthonormalised against those already
 * found, until the irrep's share of the stretch space (multiplicity × dimension) is filled. A projection
 * lives on the orbit of its bond, so vectors are built and orthogonalised on that orbit only:
 * combinations of other orbits are orthogonal to it already, which keeps large cages linear in bonds.
 */
export function stretchCombinations(
  group: PointGroup,
  bondPerms: readonly (readonly number[])[],
  gammaStretch: Representation,
): StretchCombinations[] {
  const nBonds = bondPerms[0]?.length ?? 0;
  const orbits = bondOrbits(bondPerms, nBonds);
  const spans = new Map([...new Set(orbits)].map((orbit) => [orbit, orbitDecomposition(group, bondPerms, orbit)]));
  const scratch = new Float64Array(nBonds);
  return Object.entries(gammaStretch.decomposition).map(([label, n]) => {
    const ir = group.irreps.find((i) => i.label === label)!;
    const weight = ir.complexCharacters ? 1 : ir.dimension;
    const wanted = n * ir.dimension;
    // Orthonormal combinations found so far, each with the orbit it lives on (values in orbit order).
    const basis: { orbit: readonly number[]; values: number[] }[] = [];
    const byOrbit = new Map<readonly number[], number[][]>();
    for (let b = 0; b < nBonds && basis.length < wanted; b++) {
      const orbit = orbits[b];
      const earlier = byOrbit.get(orbit) ?? [];
      // Further projections from a filled orbit only leave a zero remainder.
      if (earlier.length >= (spans.get(orbit)![label] ?? 0) * ir.dimension) continue;
      group.operations.forEach((op, o) => (scratch[bondPerms[o][b]] += (weight * ir.characters[op.classIndex]) / group.order));
      let r = orbit.map((k) => scratch[k]);
      for (const k of orbit) scratch[k] = 0;
      // Gram–Schmidt against earlier combinations on this orbit (orthonormal partners, as tables print them); a zero remainder adds nothing.
      for (const e of earlier) {
        const d = r.reduce((s, x, i) => s + x * e[i], 0);
        r = r.map((x, i) => x - d * e[i]);
      }
      const norm = Math.hypot(...r);
      if (norm < 1e-8) continue;
      const values = r.map((x) => x / norm);
      earlier.push(values);
      byOrbit.set(orbit, earlier);
      basis.push({ orbit, values });
    }
    return { irrep: label, combinations: basis.map(({ orbit, values }) => spread(orbit, values, nBonds)) };
  });
}

/** A combination as one rounded coefficient per bond, zero off its orbit. */
function spread(orbit: readonly number[], values: readonly number[], nBonds: number): number[] {
  const coefficients = new Array<number>(nBonds).fill(0);
  orbit.forEach((k, i) => (coefficients[k] = round(values[i])));
  return coefficients;
}

const round = (x: number) => Math.round(x * 1e6) / 1e6 + 0;
