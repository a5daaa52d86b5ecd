/**
 * Topographic prominence of a local maximum and the bases it stands on: walk outwards until a
 * higher point or the end of the scan, take the lowest point on each side, and measure from
 * the higher of the two (the definition scipy.signal.peak_prominences uses).
 */
export function peakProminence(y: ArrayLike<number>, index: number): { prominence: number; leftBase: number; rightBase: number } {
  const top = y[index];
  let leftBase = index;
  for (let i = index - 1; i >= 0 && y[i] <= top; i--) if (y[i] < y[leftBase]) leftBase = i;
  let rightBase = index;
  for (let i = index + 1; i < y.length && y[i] <= top; i++) if (y[i] < y[rightBase]) rightBase = i;
  return { prominence: top - Math.max(y[leftBase], y[rightBase]), leftBase, rightBase };
}

/**
 * Full width at half of `height` (measured from zero, i.e. above a subtracted baseline), in
 * x units, interpolating linearly between points and not crossing the peak's bases. When one
 * side never falls to half height, the other side's half-width is doubled.
 */
export function halfHeightWidth(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  index: number,
  height: number,
  leftBase: number,
  rightBase: number,
): number {
  const half = height / 2;
  const crossing = (from: number, to: number, dir: -1 | 1): number | undefined => {
    for (let i = from; dir < 0 ? i > to : i < to; i += dir) {
      const next = i + dir;
      if (y[next] <= half) return x[i] + ((x[next] - x[i]) * (y[i] - half)) / (y[i] - y[next]);
    }
    return undefined;
  };
  const left = crossing(index, leftBase, -1);
  const right = crossing(index, rightBase, 1);
  const centre = x[index];
  if (left !== undefined && right !== undefined) return right - left;
  if (left !== undefined) return 2 * (centre - left);
  if (right !== undefined) return 2 * (right - centre);
  return x[rightBase] - x[leftBase];
}
