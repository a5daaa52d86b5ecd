/** Tests whether an operation maps a set of atoms onto itself, in time linear in the number of atoms. */
import type { Mat3, Vec3 } from '../types.js';
import { apply } from '../mat3.js';

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
    // Cells span the loose search radius, so partners up to LOOSE × tolerance away are in the 27 cells.
    this.cell = Math.max(LOOSE * tolerance, 0.3);
    positions.forEach((p, i) => {
      const key = this.key(p);
      const list = this.grid.get(key);
      if (list) list.push(i);
      else this.grid.set(key, [i]);
    });
    const seen = new Set(firstToTest);
    this.testOrder = [...firstToTest, ...positions.map((_, i) => i).filter((i) => !seen.has(i))];
  }

  // Hashed cell index: a collision only adds candidates, which the distance test then rejects.
  private key(p: Vec3, dx = 0, dy = 0, dz = 0): number {
    const ix = Math.floor(p[0] / this.cell) + dx;
    const iy = Math.floor(p[1] / this.cell) + dy;
    const iz = Math.floor(p[2] / this.cell) + dz;
    return (Math.imul(ix, 73856093) ^ Math.imul(iy, 19349663) ^ Math.imul(iz, 83492791)) | 0;
  }

  /** Index and distance of the atom of the same kind as atom `i` nearest to point q (within one cell). */
  nearest(q: Vec3, i: number): { index: number; distance: number } {
    let index = -1;
    let distance = Infinity;
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        for (let dz = -1; dz <= 1; dz++) {
          for (const j of this.grid.get(this.key(q, dx, dy, dz)) ?? []) {
            if (this.kinds[j] !== this.kinds[i]) continue;
            const p = this.positions[j];
            const d = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
            if (d < distance) [index, distance] = [j, d];
          }
        }
      }
    }
    return { index, distance };
  }

  /** Whether op sends every atom to within `limit` (default: the tolerance) of an atom of the same kind. */
  holds(op: Mat3, limit = this.tolerance): boolean {
    for (const i of this.testOrder) {
      if (this.nearest(apply(op, this.positions[i]), i).distance > limit) return false;
    }
    return true;
  }

  /**
   * Where op sends each atom and the largest miss (Å); the permutation is undefined when some atom
   * has no partner within one grid cell or two atoms land on the same partner.
   */
  permutation(op: Mat3): { permutation: number[] | undefined; maxDeviation: number } {
    const permutation: number[] = [];
    const used = new Set<number>();
    let maxDeviation = 0;
    let valid = true;
    this.positions.forEach((p, i) => {
      const { index, distance } = this.nearest(apply(op, p), i);
      maxDeviation = Math.max(maxDeviation, distance);
      if (index < 0 || used.has(index)) valid = false;
      used.add(index);
      permutation.push(index);
    });
    return { permutation: valid ? permutation : undefined, maxDeviation };
  }
}
