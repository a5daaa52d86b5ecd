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
  const cutoff = factor * 2 * radii.reduce((m, r) => Math.max(m, r), 0);
  const grid = new CellGrid(atoms.map((a) => a.position), cutoff);
  const bonds: Bond[] = [];
  atoms.forEach((a, i) => {
    const p = a.position;
    // Bonded atoms are never farther apart than the cutoff, so only the 27 cells around p can hold a partner.
    const partners = grid.around(p).filter((j) => {
      if (j <= i) return false;
      const q = atoms[j].position;
      return Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]) <= factor * (radii[i] + radii[j]);
    });
    for (const j of partners.sort((x, y) => x - y)) bonds.push([i, j]);
  });
  return bonds;
}

/** Point indices by cubic cell of a given edge, numbered exactly within the points' bounding box. */
class CellGrid {
  private readonly cells = new Map<number, number[]>();
  private readonly low: number[];
  private readonly span: number[];

  constructor(
    positions: readonly (readonly number[])[],
    private readonly size: number,
  ) {
    this.low = [0, 1, 2].map((c) => positions.reduce((m, p) => Math.min(m, p[c]), Infinity));
    const high = [0, 1, 2].map((c) => positions.reduce((m, p) => Math.max(m, p[c]), -Infinity));
    // One spare cell on each side, so the neighbours of every occupied cell have their own numbers.
    this.span = [0, 1, 2].map((c) => Math.floor((high[c] - this.low[c]) / size) + 3);
    positions.forEach((p, i) => {
      const key = this.key(this.cell(p, 0), this.cell(p, 1), this.cell(p, 2));
      const list = this.cells.get(key);
      if (list) list.push(i);
      else this.cells.set(key, [i]);
    });
  }

  private cell(p: readonly number[], c: number): number {
    return Math.floor((p[c] - this.low[c]) / this.size) + 1;
  }

  private key(ix: number, iy: number, iz: number): number {
    return (ix * this.span[1] + iy) * this.span[2] + iz;
  }

  /** Indices of the points in the cell of p (a point of the grid) and its 26 neighbours. */
  around(p: readonly number[]): number[] {
    const [cx, cy, cz] = [this.cell(p, 0), this.cell(p, 1), this.cell(p, 2)];
    const out: number[] = [];
    for (let ix = cx - 1; ix <= cx + 1; ix++) {
      for (let iy = cy - 1; iy <= cy + 1; iy++) {
        for (let iz = cz - 1; iz <= cz + 1; iz++) {
          const list = this.cells.get(this.key(ix, iy, iz));
          if (list) out.push(...list);
        }
      }
    }
    return out;
  }
}
