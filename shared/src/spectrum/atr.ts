/** Options of {@link atrCorrection}. */
export interface AtrOptions {
  /** Wavenumber at which ATR and transmission intensities are made equal. Default 1000 cm⁻¹. */
  referenceCm1?: number;
}

/** ATR correction default. */
export const DEFAULT_ATR: Required<AtrOptions> = { referenceCm1: 1000 };

/**
 * Simple ATR correction for comparing a diamond-ATR scan with transmission references: the
 * evanescent wave's penetration depth grows with wavelength (∝ 1/ν), which inflates bands at
 * low wavenumber, so A_corrected(ν) = A(ν) · ν / ν_ref. Common practice; it ignores the
 * refractive-index dispersion that an advanced correction would model.
 */
export function atrCorrection(xCm1: ArrayLike<number>, absorbance: ArrayLike<number>, options: AtrOptions = {}): Float64Array {
  const { referenceCm1 } = { ...DEFAULT_ATR, ...options };
  if (!(referenceCm1 > 0)) throw new RangeError(`ATR reference wavenumber must be positive, got ${referenceCm1}`);
  const out = new Float64Array(absorbance.length);
  for (let i = 0; i < out.length; i++) out[i] = (absorbance[i] * xCm1[i]) / referenceCm1;
  return out;
}
