/** Observed peaks in the form the ranking reads: sorted positions and heights relative to the tallest. */
import type { Peak } from '../spectrum/types.js';

/** Peaks ascending in x, with relative heights (0..1) and their sum. */
export interface ObservedPeaks {
  readonly peaks: readonly Peak[];
  readonly xCm1: Float64Array;
  readonly relativeHeight: Float64Array;
  readonly totalHeight: number;
}

/** Sort peaks and normalise their heights to the tallest (the pipeline's relativeHeight is recomputed). */
export function observedPeaks(peaks: readonly Peak[]): ObservedPeaks {
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
  return { peaks: sorted, xCm1, relativeHeight, totalHeight };
}
