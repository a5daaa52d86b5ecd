/** Averaging a nearly symmetric structure over its group, so it becomes exactly symmetric. */
import type { Vec3 } from '../types.js';
import { apply, transpose } from '../mat3.js';
import type { Mat3 } from '../types.js';

/**
 * Each atom becomes the mean of g⁻¹ applied to its partner under g, over all operations g
 * (permutations[k][i] = the atom that operation k sends atom i to).
 */
export function symmetrisePositions(positions: readonly Vec3[], operations: readonly Mat3[], permutations: readonly (readonly number[])[]): Vec3[] {
  const inverses = operations.map(transpose);
  return positions.map((_, i) => {
    const sum = [0, 0, 0];
    inverses.forEach((inverse, k) => {
      const back = apply(inverse, positions[permutations[k][i]]);
      for (let c = 0; c < 3; c++) sum[c] += back[c];
    });
    return sum.map((v) => v / operations.length) as unknown as Vec3;
  });
}
