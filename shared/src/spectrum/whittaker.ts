/**
 * Weighted Whittaker smoother (W + λ·DᵀD) z = W·y, with D the second-difference operator,
 * solved by a banded Cholesky factorisation in O(n). The system is pentadiagonal, so five
 * bands are all that is stored; the solver keeps its work arrays between calls because arPLS
 * solves the same-sized system once per iteration.
 */
export function whittakerSolver(n: number, lambda: number): (y: ArrayLike<number>, weights: ArrayLike<number>) => Float64Array {
  // λ·DᵀD bands: main diagonal p0, first and second off-diagonals p1, p2 (rows of D are 1 −2 1).
  const p0 = new Float64Array(n);
  const p1 = new Float64Array(n);
  const p2 = new Float64Array(n);
  for (let k = 0; k < n - 2; k++) {
    p0[k] += lambda;
    p0[k + 1] += 4 * lambda;
    p0[k + 2] += lambda;
    p1[k] -= 2 * lambda;
    p1[k + 1] -= 2 * lambda;
    p2[k] += lambda;
  }
  // L (lower triangular, bandwidth 2): l0 diagonal; l1[i], l2[i] multiply z[i−1], z[i−2] in row i.
  const l0 = new Float64Array(n);
  const l1 = new Float64Array(n);
  const l2 = new Float64Array(n);
  return (y, weights) => {
    for (let i = 0; i < n; i++) {
      const c2 = i >= 2 ? p2[i - 2] / l0[i - 2] : 0;
      const c1 = i >= 1 ? (p1[i - 1] - c2 * l1[i - 1]) / l0[i - 1] : 0;
      const d = p0[i] + weights[i] - c1 * c1 - c2 * c2;
      if (!(d > 0)) throw new RangeError('baseline system is not positive definite; check weights and lambda');
      l2[i] = c2;
      l1[i] = c1;
      l0[i] = Math.sqrt(d);
    }
    const z = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let s = weights[i] * y[i];
      if (i >= 1) s -= l1[i] * z[i - 1];
      if (i >= 2) s -= l2[i] * z[i - 2];
      z[i] = s / l0[i];
    }
    for (let i = n - 1; i >= 0; i--) {
      let s = z[i];
      if (i + 1 < n) s -= l1[i + 1] * z[i + 1];
      if (i + 2 < n) s -= l2[i + 2] * z[i + 2];
      z[i] = s / l0[i];
    }
    return z;
  };
}
