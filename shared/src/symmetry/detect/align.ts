/**
 * Polishes the standard frame of a noisy structure: the frame built from individually refined axes
 * can leave composite operations slightly off, so the oriented atoms are rotated onto their own
 * group average by the best-fitting rotation (Kabsch), which moves no atom relative to another.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import type { Mat3, Vec3 } from '../types.js';
import { apply, det, mul } from '../mat3.js';
import { symmetrisePositions } from './symmetrise.js';

/** The proper rotation Q minimising Σ |Q·p − s|² over the pairs (p, s). */
export function bestRotation(from: readonly Vec3[], to: readonly Vec3[]): Mat3 {
  const h = Matrix.zeros(3, 3);
  from.forEach((p, i) => {
    for (let a = 0; a < 3; a++) for (let b = 0; b < 3; b++) h.set(a, b, h.get(a, b) + p[a] * to[i][b]);
  });
  const svd = new SingularValueDecomposition(h);
  const u = svd.leftSingularVectors;
  const v = svd.rightSingularVectors;
  const vut = v.mmul(u.transpose());
  // A reflection would fit better only for a mirror-image structure; keep the rotation proper.
  const d = Math.sign(det(vut.to1DArray() as unknown as Mat3)) || 1;
  const q = v.mmul(Matrix.diag([1, 1, d])).mmul(u.transpose());
  return q.to1DArray() as unknown as Mat3;
}

/**
 * The rotation that brings `positions` (already near the standard frame) closest to exact symmetry
 * under `operations`, given where each operation sends each atom; two rounds are enough in practice.
 */
export function polishFrame(positions: readonly Vec3[], operations: readonly Mat3[], permutations: readonly (readonly number[])[]): Mat3 {
  let total: Mat3 = [1, 0, 0, 0, 1, 0, 0, 0, 1];
  let current = positions;
  for (let round = 0; round < 2; round++) {
    const target = symmetrisePositions(current, operations, permutations);
    const q = bestRotation(current, target);
    total = mul(q, total);
    current = current.map((p) => apply(q, p));
  }
  return total;
}
