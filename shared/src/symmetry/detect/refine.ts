/**
 * Least-squares refinement of an axis or plane normal from the atom pairs an operation swaps, so
 * that axes guessed from noisy atoms (or noisy inertia axes) become the best symmetric fit.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { Vec3 } from '../types.js';
import { dot } from './vec.js';

/** The unit eigenvector of the smallest eigenvalue of a 3×3 symmetric matrix, if it is well separated. */
function smallestDirection(t: Matrix): Vec3 | undefined {
  const eig = new EigenvalueDecomposition(t, { assumeSymmetric: true });
  // ml-matrix's getters copy on every access: read them once.
  const values = eig.realEigenvalues;
  const vectors = eig.eigenvectorMatrix;
  const order = [0, 1, 2].sort((p, q) => values[p] - values[q]);
  const [l0, l1] = [values[order[0]], values[order[1]]];
  // Two equally small eigenvalues: the pairs do not fix the direction, keep the guess.
  if (l1 - l0 < 1e-3 * Math.max(1e-9, l1)) return undefined;
  const c = order[0];
  return [vectors.get(0, c), vectors.get(1, c), vectors.get(2, c)];
}

function addOuter(t: Matrix, v: Vec3, weight: number, identityWeight = 0): void {
  for (let p = 0; p < 3; p++) {
    for (let q = 0; q < 3; q++) t.set(p, q, t.get(p, q) + weight * v[p] * v[q] + (p === q ? identityWeight : 0));
  }
}

/**
 * Refined direction for a rotation axis (`kind` = 'axis': moved atoms move perpendicular to it,
 * unmoved atoms lie on it) or a mirror normal ('normal': moved atoms move along it, unmoved atoms
 * lie in the plane). `permutation[i]` is the partner of atom i. Returns `guess` if undetermined.
 */
export function refineDirection(positions: readonly Vec3[], permutation: readonly number[], kind: 'axis' | 'normal', guess: Vec3): Vec3 {
  const t = Matrix.zeros(3, 3);
  positions.forEach((p, i) => {
    const q = positions[permutation[i]];
    const d: Vec3 = [q[0] - p[0], q[1] - p[1], q[2] - p[2]];
    const moved = permutation[i] !== i;
    if (kind === 'axis') {
      if (moved) addOuter(t, d, 1);
      else addOuter(t, p, -1, dot(p, p));
    } else if (moved) addOuter(t, d, -1, dot(d, d));
    else addOuter(t, p, 1);
  });
  const refined = smallestDirection(t);
  if (!refined) return guess;
  return dot(refined, guess) < 0 ? [-refined[0], -refined[1], -refined[2]] : refined;
}
