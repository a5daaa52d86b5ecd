import { noiseSigma } from './noise.js';

/** Options of {@link removeSpikes}. */
export interface SpikeOptions {
  /** A spike stands more than this many noise σ above its neighbours. Default 8. */
  threshold?: number;
  /** Widest spike in points; wider features are bands, not cosmic rays. Default 3. */
  maxWidthPoints?: number;
}

/** Cosmic-ray removal defaults. */
export const DEFAULT_SPIKES: Required<SpikeOptions> = { threshold: 8, maxWidthPoints: 3 };

/**
 * Remove cosmic-ray spikes from a Raman scan. A run of at most maxWidthPoints points is a spike
 * when every point in it stands more than threshold × noise σ above both neighbours, and that
 * jump is more than twice the rise of the neighbours over the points two further out: a real
 * band's flanks slope, a cosmic ray's surroundings are flat. The run is replaced by a straight
 * line between its neighbours. Common practice (outlier tests on differences, after Whitaker
 * and Hayes 2018, from memory).
 */
export function removeSpikes(y: ArrayLike<number>, options: SpikeOptions = {}): { y: Float64Array; spikesRemoved: number } {
  const { threshold, maxWidthPoints } = { ...DEFAULT_SPIKES, ...options };
  const out = Float64Array.from(y);
  const n = out.length;
  if (n < 2 * maxWidthPoints + 6) return { y: out, spikesRemoved: 0 };
  const sigma = noiseSigma(out);
  if (!(sigma > 0)) return { y: out, spikesRemoved: 0 };
  let spikes = 0;
  for (let i = 3; i < n - 3; i++) {
    for (let w = 1; w <= maxWidthPoints && i + w + 2 < n; w++) {
      const left = out[i - 1];
      const right = out[i + w];
      let lowest = Infinity;
      for (let k = i; k < i + w; k++) lowest = Math.min(lowest, out[k]);
      const jump = lowest - Math.max(left, right);
      const surroundingsRise = Math.max(left, right) - Math.min(out[i - 3], out[i + w + 2]);
      if (jump > threshold * sigma && jump > 2 * surroundingsRise) {
        for (let k = i; k < i + w; k++) out[k] = left + ((right - left) * (k - i + 1)) / (w + 1);
        spikes++;
        i += w;
        break;
      }
    }
  }
  return { y: out, spikesRemoved: spikes };
}
