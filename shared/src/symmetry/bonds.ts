/** Bonds of a structure: checked when the file lists them, otherwise derived from covalent radii. */
import type { Atom } from './types.js';

export type Bond = readonly [number, number];

/** Bonded when the distance is at most this factor times the sum of covalent radii (common practice). */
export const COVALENT_BOND_FACTOR = 1.2;

/** Checks listed bonds (0-based atom indices); throws RangeError on the first bad one. */
export function validateBonds(bonds: readonly Bond[], atomCount: number): void {
  const seen = new Set<string>();
  bonds.forEach(([i, j], k) => {
    if (![i, j].every((x) => Number.isInteger(x) && x >= 0 && x < atomCount) || i === j) {
      throw new RangeError(`bond ${k + 1} (${i}, ${j}) must join two different atoms among 0 … ${atomCount - 1}`);
    }
    const key = `${Math.min(i, j)}-${Math.max(i, j)}`;
    if (seen.has(key)) throw new RangeError(`bond ${k + 1} (${i}, ${j}) is listed twice`);
    seen.add(key);
  });
}

/** Pairs closer than COVALENT_BOND_FACTOR × (r_i + r_j); `radiusOf` returns a covalent radius in Å. */
export function deriveBonds(atoms: readonly Atom[], radiusOf: (element: string) => number | undefined, factor = COVALENT_BOND_FACTOR): Bond[] {
  const radii = atoms.map((a, i) => {
    const r = radiusOf(a.element);
    if (r === undefined || !(r > 0)) throw new RangeError(`atom ${i + 1}: no covalent radius known for element ${a.element}`);
    return r;
  });
  const bonds: Bond[] = [];
  for (let i = 0; i < atoms.length; i++) {
    for (let j = i + 1; j < atoms.length; j++) {
      const [p, q] = [atoms[i].position, atoms[j].position];
      const d = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
      if (d <= factor * (radii[i] + radii[j])) bonds.push([i, j]);
    }
  }
  return bonds;
}
