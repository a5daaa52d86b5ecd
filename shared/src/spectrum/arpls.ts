import { whittakerSolver } from './whittaker.js';

/**
 * Asymmetrically reweighted penalised least squares baseline (arPLS; S.-J. Baek et al.,
 * Analyst 140, 250 (2015), from memory): points above the current baseline by more than the
 * noise of the points below it get weight → 0, so peaks and fluorescence-laden scans alike
 * leave a baseline under the bands.
 */
export function arplsBaseline(
  y: ArrayLike<number>,
  lambda: number,
  maxIterations: number,
  tolerance: number,
): { baseline: Float64Array; iterations: number } {
  const n = y.length;
  if (n < 3) return { baseline: Float64Array.from(y), iterations: 0 };
  const solve = whittakerSolver(n, lambda);
  let weights = new Float64Array(n).fill(1);
  let next = new Float64Array(n);
  let baseline = solve(y, weights);
  let iterations = 1;
  for (; iterations < maxIterations; iterations++) {
    let sum = 0;
    let sumSq = 0;
    let count = 0;
    for (let i = 0; i < n; i++) {
      const d = y[i] - baseline[i];
      if (d < 0) {
        sum += d;
        sumSq += d * d;
        count++;
      }
    }
    if (count < 2) break;
    const mean = sum / count;
    const sd = Math.sqrt(Math.max(sumSq / count - mean * mean, 0)) || 1e-12;
    let change = 0;
    let norm = 0;
    for (let i = 0; i < n; i++) {
      const d = y[i] - baseline[i];
      // Logistic weight of Baek et al.: 1 well below, 0 well above (−mean + 2·sd).
      const arg = Math.min((2 * (d - (2 * sd - mean))) / sd, 50);
      next[i] = 1 / (1 + Math.exp(arg));
      change += (next[i] - weights[i]) ** 2;
      norm += weights[i] ** 2;
    }
    [weights, next] = [next, weights];
    baseline = solve(y, weights);
    if (Math.sqrt(change / Math.max(norm, 1e-300)) < tolerance) break;
  }
  return { baseline, iterations };
}
