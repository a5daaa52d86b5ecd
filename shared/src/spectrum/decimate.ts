/**
 * Block averaging and its linear inverse, so a smooth curve (a baseline) can be fitted on a
 * coarser grid and brought back to every point.
 */

/** Means of consecutive blocks of `factor` points (the last block may be shorter). */
export function blockMeans(y: ArrayLike<number>, factor: number): Float64Array {
  const out = new Float64Array(Math.ceil(y.length / factor));
  for (let b = 0; b < out.length; b++) {
    const end = Math.min(y.length, (b + 1) * factor);
    let sum = 0;
    for (let i = b * factor; i < end; i++) sum += y[i];
    out[b] = sum / (end - b * factor);
  }
  return out;
}

/** Linear interpolation of block values (placed at their block centres) back onto n points. */
export function expandBlocks(blocks: ArrayLike<number>, factor: number, n: number): Float64Array {
  const out = new Float64Array(n);
  const centre = (b: number) => Math.min(b * factor + (factor - 1) / 2, (b * factor + n - 1) / 2);
  let b = 0;
  for (let i = 0; i < n; i++) {
    while (b < blocks.length - 2 && centre(b + 1) < i) b++;
    if (blocks.length === 1) {
      out[i] = blocks[0];
      continue;
    }
    const c0 = centre(b);
    const c1 = centre(b + 1);
    out[i] = blocks[b] + ((blocks[b + 1] - blocks[b]) * (i - c0)) / (c1 - c0);
  }
  return out;
}
