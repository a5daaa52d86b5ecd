/** Observed peaks in the form the ranking reads: sorted positions and heights relative to the tallest. */
import type { Peak } from '../spectrum/types.js';
import { PR_PAIR_MAX_HEIGHT_RATIO, PR_PAIR_MAX_SEPARATION_CM1, PR_PAIR_MIN_SEPARATION_CM1 } from './constants.js';

/** Peak pairs that may be the P and R maxima of one gas-phase band, by midpoint (ascending). */
export interface BranchPairs {
  readonly midCm1: Float64Array;
  readonly first: Int32Array;
  readonly second: Int32Array;
}

/** Peaks ascending in x, with relative heights (0..1), their sum and, for gas scans, branch pairs. */
export interface ObservedPeaks {
  readonly peaks: readonly Peak[];
  readonly xCm1: Float64Array;
  readonly relativeHeight: Float64Array;
  readonly totalHeight: number;
  readonly pairs: BranchPairs;
}

function branchPairs(xCm1: Float64Array, h: Float64Array): BranchPairs {
  const found: { mid: number; a: number; b: number }[] = [];
  for (let a = 0; a < xCm1.length; a++) {
    for (let b = a + 1; b < xCm1.length && xCm1[b]! - xCm1[a]! <= PR_PAIR_MAX_SEPARATION_CM1; b++) {
      if (xCm1[b]! - xCm1[a]! < PR_PAIR_MIN_SEPARATION_CM1) continue;
      const ratio = h[a]! > h[b]! ? h[a]! / h[b]! : h[b]! / h[a]!;
      if (ratio <= PR_PAIR_MAX_HEIGHT_RATIO) found.push({ mid: (xCm1[a]! + xCm1[b]!) / 2, a, b });
    }
  }
  found.sort((p, q) => p.mid - q.mid);
  return {
    midCm1: Float64Array.from(found, (p) => p.mid),
    first: Int32Array.from(found, (p) => p.a),
    second: Int32Array.from(found, (p) => p.b),
  };
}

const NO_PAIRS: BranchPairs = { midCm1: new Float64Array(0), first: new Int32Array(0), second: new Int32Array(0) };

/** Sort peaks, normalise heights to the tallest, and for gas scans find possible P/R branch pairs. */
export function observedPeaks(peaks: readonly Peak[], gas = false): ObservedPeaks {
  const sorted = [...peaks].sort((a, b) => a.x - b.x);
  const tallest = sorted.reduce((m, p) => Math.max(m, p.height), 0);
  const xCm1 = new Float64Array(sorted.length);
  const relativeHeight = new Float64Array(sorted.length);
  let totalHeight = 0;
  sorted.forEach((p, i) => {
    xCm1[i] = p.x;
    relativeHeight[i] = tallest > 0 ? p.height / tallest : 0;
    totalHeight += relativeHeight[i]!;
  });
  return { peaks: sorted, xCm1, relativeHeight, totalHeight, pairs: gas ? branchPairs(xCm1, relativeHeight) : NO_PAIRS };
}
