/**
 * Bond stretches as internal coordinates: the representation they span (a bond counts under R when R
 * sends it onto itself, ends kept or swapped) and symmetry-adapted combinations by projection.
 */
import type { PointGroup } from './group-types.js';
import type { Bond } from './bonds.js';
import { reduceCharacters, type Representation } from './representation.js';

/** Symmetry-adapted combinations of bond stretches of one irrep: coefficients per bond, each normalised. */
export interface StretchCombinations {
  readonly irrep: string;
  readonly combinations: readonly (readonly number[])[];
}

const bondKey = (i: number, j: number) => (i < j ? `${i}-${j}` : `${j}-${i}`);

/** Image of every bond under every operation (from the atom permutations); throws when the bond set is not symmetric. */
export function bondPermutations(group: PointGroup, bonds: readonly Bond[], atomPermutations: readonly (readonly number[])[]): number[][] {
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

/** Γstretch: per class, the number of bonds the representative operation sends onto themselves. */
export function stretchRepresentation(group: PointGroup, bondPerms: readonly (readonly number[])[]): Representation {
  const characters = group.classes.map((_, c) => {
    const o = group.operations.findIndex((op) => op.classIndex === c);
    return bondPerms[o].filter((image, k) => image === k).length;
  });
  return { characters, decomposition: reduceCharacters(group, characters) };
}

/**
 * Projection-operator combinations P^Γ b = (d/h) Σ_R χ^Γ(R) R·b, orthonormalised against those already
 * found, until the irrep's share of the stretch space (multiplicity × dimension) is filled.
 */
export function stretchCombinations(
  group: PointGroup,
  bondPerms: readonly (readonly number[])[],
  gammaStretch: Representation,
): StretchCombinations[] {
  const nBonds = bondPerms[0]?.length ?? 0;
  return Object.entries(gammaStretch.decomposition).map(([label, n]) => {
    const ir = group.irreps.find((i) => i.label === label)!;
    const weight = ir.complexCharacters ? 1 : ir.dimension;
    const wanted = n * ir.dimension;
    const basis: number[][] = [];
    for (let b = 0; b < nBonds && basis.length < wanted; b++) {
      const v = new Array<number>(nBonds).fill(0);
      group.operations.forEach((op, o) => (v[bondPerms[o][b]] += (weight * ir.characters[op.classIndex]) / group.order));
      // Gram–Schmidt against earlier combinations (orthonormal partners, as tables print them); a zero remainder adds nothing.
      let r = [...v];
      for (const e of basis) {
        const d = r.reduce((s, x, i) => s + x * e[i], 0);
        r = r.map((x, i) => x - d * e[i]);
      }
      const norm = Math.hypot(...r);
      if (norm < 1e-8) continue;
      basis.push(r.map((x) => x / norm));
    }
    return { irrep: label, combinations: basis.map((e) => e.map(round)) };
  });
}

const round = (x: number) => Math.round(x * 1e6) / 1e6 + 0;
