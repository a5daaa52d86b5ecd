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
  const cutoff = factor * 2 * Math.max(...radii);
  const cells = cellIndex(atoms, cutoff);
  const bonds: Bond[] = [];
  atoms.forEach((a, i) => {
    const p = a.position;
    // Only the 27 cells around the atom can hold a partner: bonded pairs are never farther apart than the cutoff.
    const partners: number[] = [];
    for (const j of neighbours(cells, p, cutoff)) {
      if (j <= i) continue;
      const q = atoms[j].position;
      const d = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
      if (d <= factor * (radii[i] + radii[j])) partners.push(j);
    }
    for (const j of partners.sort((x, y) => x - y)) bonds.push([i, j]);
  });
  return bonds;
}

const cellKey = (ix: number, iy: number, iz: number) => `${ix},${iy},${iz}`;

/** Atom indices by cubic cell of edge `size`. */
function cellIndex(atoms: readonly Atom[], size: number): Map<string, number[]> {
  const cells = new Map<string, number[]>();
  atoms.forEach((a, i) => {
    const key = cellKey(...(a.position.map((x) => Math.floor(x / size)) as [number, number, number]));
    const list = cells.get(key);
    if (list) list.push(i);
    else cells.set(key, [i]);
  });
  return cells;
}

/** Indices of the atoms in the cell of p and its 26 neighbours. */
function* neighbours(cells: Map<string, number[]>, p: readonly number[], size: number): Generator<number> {
  const [cx, cy, cz] = p.map((x) => Math.floor(x / size));
  for (let ix = cx - 1; ix <= cx + 1; ix++) {
    for (let iy = cy - 1; iy <= cy + 1; iy++) {
      for (let iz = cz - 1; iz <= cz + 1; iz++) yield* cells.get(cellKey(ix, iy, iz)) ?? [];
    }
  }
}
