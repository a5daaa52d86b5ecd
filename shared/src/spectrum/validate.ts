import { DEFAULT_MIN_POINTS } from './import-options.js';
import type { Spectrum } from './types.js';

/** Check a Spectrum handed to processing: equal lengths, finite values, strictly ascending x. */
export function validateSpectrum(spectrum: Spectrum, minPoints = DEFAULT_MIN_POINTS): void {
  const { xCm1, y } = spectrum;
  if (!(xCm1 instanceof Float64Array) || !(y instanceof Float64Array)) throw new TypeError('xCm1 and y must be Float64Arrays');
  if (xCm1.length !== y.length) throw new RangeError(`xCm1 has ${xCm1.length} points but y has ${y.length}`);
  if (xCm1.length < minPoints) throw new RangeError(`the scan has ${xCm1.length} points; at least ${minPoints} are needed`);
  for (let i = 0; i < xCm1.length; i++) {
    if (!Number.isFinite(xCm1[i]) || !Number.isFinite(y[i])) throw new RangeError(`point ${i} is not finite (${xCm1[i]}, ${y[i]})`);
    if (i > 0 && !(xCm1[i] > xCm1[i - 1])) throw new RangeError(`xCm1 is not strictly ascending at point ${i}`);
  }
}
