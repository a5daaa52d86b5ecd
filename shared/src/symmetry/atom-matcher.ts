/**
 * Finds where an operation sends each atom, in time linear in the number of atoms: the one atom
 * matching used by point-group detection and by the vibrational analysis.
 */
import type { Atom, Mat3, Vec3 } from './types.js';
import { apply } from './mat3.js';

/** Element plus isotope: only atoms of the same kind can be exchanged by an operation. */
export const atomKind = (a: Atom): string => (a.isotope === undefined ? a.element : `${a.element}-${a.isotope}`);

/** Factor on the tolerance for the first, loose match whose pairs then refine an axis. */
export const LOOSE = 3;

/** Atom positions in a spatial hash, so each image finds its partner among a few neighbours. */
export class AtomMatcher {
  private readonly cell: number;
  private readonly grid = new Map<number, number[]>();
  /** Atoms in the order they are tested: rare kinds first, so a wrong operation fails fast. */
  private readonly testOrder: number[];

  constructor(
    readonly positions: readonly Vec3[],
    readonly kinds: readonly string[],
    readonly tolerance: number,
    firstToTest: readonly number[] = [],
  ) {
    // Cells twice the loose search radius: a search sphere then meets at most two cells per axis.
    this.cell = Math.max(2 * LOOSE * tolerance, 0.6);
    positions.forEach((p, i) => {
      const key = this.cellOf(p);
      const list = this.grid.get(key);
      if (list) list.push(i);
      else this.grid.set(key, [i]);
    });
    const seen = new Set(firstToTest);
    this.testOrder = [...firstToTest, ...positions.map((_, i) => i).filter((i) => !seen.has(i))];
  }

  // Hashed cell index: a collision only adds candidates, which the distance test then rejects.
  private key(ix: number, iy: number, iz: number): number {
    return (Math.imul(ix, 73856093) ^ Math.imul(iy, 19349663) ^ Math.imul(iz, 83492791)) | 0;
  }

  private cellOf(p: Vec3): number {
    return this.key(Math.floor(p[0] / this.cell), Math.floor(p[1] / this.cell), Math.floor(p[2] / this.cell));
  }

  /** Distance from q to the atom found by the last `nearest` call (Infinity if none); avoids an object per lookup. */
  lastDistance = Infinity;

  /** Index of the atom of the same kind as atom `i` nearest to q among those within `radius` (−1 if none); see lastDistance. */
  nearest(q: Vec3, i: number, radius = LOOSE * this.tolerance): number {
    let index = -1;
    let distance = Infinity;
    const c = this.cell;
    // Plain locals, no destructured pairs: this is the hot loop of detection and analysis alike.
    const x0 = Math.floor((q[0] - radius) / c);
    const x1 = Math.floor((q[0] + radius) / c);
    const y0 = Math.floor((q[1] - radius) / c);
    const y1 = Math.floor((q[1] + radius) / c);
    const z0 = Math.floor((q[2] - radius) / c);
    const z1 = Math.floor((q[2] + radius) / c);
    const kind = this.kinds[i];
    for (let ix = x0; ix <= x1; ix++) {
      for (let iy = y0; iy <= y1; iy++) {
        for (let iz = z0; iz <= z1; iz++) {
          const list = this.grid.get(this.key(ix, iy, iz));
          if (list === undefined) continue;
          for (const j of list) {
            if (this.kinds[j] !== kind) continue;
            const p = this.positions[j];
            const dx = p[0] - q[0];
            const dy = p[1] - q[1];
            const dz = p[2] - q[2];
            // Squared distances in the loop (Math.hypot is slow in V8); one square root at the end.
            const d2 = dx * dx + dy * dy + dz * dz;
            if (d2 < distance) {
              index = j;
              distance = d2;
            }
          }
        }
      }
    }
    this.lastDistance = Math.sqrt(distance);
    return index;
  }

  /** Distance from q to the nearest atom of the same kind as atom `i`, however far (Infinity if none); a full scan, for error messages. */
  nearestDistance(q: Vec3, i: number): number {
    let distance = Infinity;
    this.positions.forEach((p, j) => {
      if (this.kinds[j] === this.kinds[i]) distance = Math.min(distance, Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]));
    });
    return distance;
  }

  /** Whether op sends every atom to within `limit` (default: the tolerance) of an atom of the same kind. */
  holds(op: Mat3, limit = this.tolerance): boolean {
    for (const i of this.testOrder) {
      this.nearest(apply(op, this.positions[i]), i, limit);
      if (this.lastDistance > limit) return false;
    }
    return true;
  }

  /**
   * Where op sends each atom and the largest miss (Å); the permutation is undefined when some atom
   * has no partner within LOOSE × tolerance or two atoms land on the same partner.
   */
  permutation(op: Mat3): { permutation: number[] | undefined; maxDeviation: number } {
    const permutation: number[] = [];
    const used = new Set<number>();
    let maxDeviation = 0;
    let valid = true;
    this.positions.forEach((p, i) => {
      const index = this.nearest(apply(op, p), i);
      const distance = this.lastDistance;
      maxDeviation = Math.max(maxDeviation, distance);
      if (index < 0 || used.has(index)) valid = false;
      used.add(index);
      permutation.push(index);
    });
    return { permutation: valid ? permutation : undefined, maxDeviation };
  }

  /**
   * Permutations for every operation (partners within LOOSE × tolerance) and the largest miss;
   * permutations is undefined if some operation leaves an atom without a partner.
   */
  permutationsFor(operations: readonly Mat3[]): { permutations: number[][] | undefined; maxDeviation: number } {
    const permutations: number[][] = [];
    let maxDeviation = 0;
    for (const op of operations) {
      const { permutation, maxDeviation: d } = this.permutation(op);
      maxDeviation = Math.max(maxDeviation, d);
      if (!permutation) return { permutations: undefined, maxDeviation };
      permutations.push(permutation);
    }
    return { permutations, maxDeviation };
  }
}
