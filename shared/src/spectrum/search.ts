/** Binary search over sorted numbers, shared by the spectrum pipeline and the ranking. */

/** Index of the first element of a sorted array that is ≥ value. */
export function lowerBound(sorted: ArrayLike<number>, value: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
