/**
 * Solve the weighted Whittaker smoother (W + λ·DᵀD) z = W·y, with D the second-difference
 * operator, by a banded Cholesky factorisation in O(n). The system is pentadiagonal, so
 * nothing bigger than five bands is ever stored.
 */
export function whittakerSmooth(y: ArrayLike<number>, weights: ArrayLike<number>, lambda: number): Float64Array {
  const n = y.length;
  if (n < 3) return Float64Array.from(y);
  // Bands of A: a0 main diagonal, a1 first off-diagonal, a2 second off-diagonal (DᵀD pattern 1 −2 1).
  const a0 = new Float64Array(n);
  const a1 = new Float64Array(n - 1);
  const a2 = new Float64Array(n - 2);
  for (let k = 0; k < n - 2; k++) {
    // Row k of D is (1, −2, 1) at columns k, k+1, k+2; add λ·dᵀd to the bands.
    a0[k] += lambda;
    a0[k + 1] += 4 * lambda;
    a0[k + 2] += lambda;
    a1[k] += -2 * lambda;
    a1[k + 1] += -2 * lambda;
    a2[k] += lambda;
  }
  for (let i = 0; i < n; i++) a0[i] += weights[i];
  // Cholesky A = L·Lᵀ with L lower triangular of bandwidth 2: l0 diagonal, l1, l2 sub-diagonals.
  const l0 = new Float64Array(n);
  const l1 = new Float64Array(n);
  const l2 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (i >= 2) l2[i] = a2[i - 2] / l0[i - 2];
    if (i >= 1) l1[i] = (a1[i - 1] - (i >= 2 ? l2[i] * l1[i - 1] : 0)) / l0[i - 1];
    const d = a0[i] - l1[i] ** 2 - l2[i] ** 2;
    if (!(d > 0)) throw new RangeError('baseline system is not positive definite; check weights and lambda');
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
}
