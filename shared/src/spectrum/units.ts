/**
 * Axis and ordinate units the importer understands, and the conversions into the pipeline's
 * form: an x axis in cm⁻¹ (IR wavenumber or Raman shift) and y as absorbance, transmittance
 * (fraction 0–1) or intensity.
 */

/** Units an x column or XUNITS label can carry. */
export type XUnit = 'wavenumber-cm-1' | 'raman-shift-cm-1' | 'absolute-cm-1' | 'wavelength-nm' | 'wavelength-um';

/** Units a y column or YUNITS label can carry. */
export type YUnit = 'absorbance' | 'transmittance-fraction' | 'transmittance-percent' | 'intensity';

/** Convert a wavelength in nm to a wavenumber in cm⁻¹ (ν = 10⁷ / λ). */
export function nmToCm1(wavelengthNm: number): number {
  return 1e7 / wavelengthNm;
}

/** Convert a wavelength in µm to a wavenumber in cm⁻¹ (ν = 10⁴ / λ). */
export function umToCm1(wavelengthUm: number): number {
  return 1e4 / wavelengthUm;
}

/** Raman shift in cm⁻¹ of light scattered at an absolute wavenumber, for an excitation wavelength in nm. */
export function ramanShiftFromAbsoluteCm1(absoluteCm1: number, excitationNm: number): number {
  return 1e7 / excitationNm - absoluteCm1;
}

/** Raman shift in cm⁻¹ of light scattered at a wavelength in nm: 10⁷/λexc − 10⁷/λ. */
export function ramanShiftFromWavelengthNm(wavelengthNm: number, excitationNm: number): number {
  return 1e7 / excitationNm - 1e7 / wavelengthNm;
}

/** Absorbance from transmittance given as a fraction 0–1: A = −log10(T). */
export function transmittanceToAbsorbance(transmittanceFraction: number): number {
  return -Math.log10(transmittanceFraction);
}

/** Transmittance as a fraction 0–1 from absorbance: T = 10^−A. */
export function absorbanceToTransmittance(absorbance: number): number {
  return 10 ** -absorbance;
}

// Header words are matched loosely because instrument software spells them many ways
// ("Wavenumber (cm-1)", "cm^-1", "1/CM", "Raman Shift [cm⁻¹]").
const X_PATTERNS: ReadonlyArray<readonly [RegExp, XUnit]> = [
  [/raman\s*shift|\bshift\b/i, 'raman-shift-cm-1'],
  [/absolute/i, 'absolute-cm-1'],
  [/(µm|μm|\bum\b|micron|micrometer)/i, 'wavelength-um'],
  [/(\bnm\b|nanometer)/i, 'wavelength-nm'],
  [/(cm\s*-\s*1|cm\^-1|cm⁻¹|cm-¹|1\s*\/\s*cm|wavenumber|wave number)/i, 'wavenumber-cm-1'],
  [/wavelength/i, 'wavelength-nm'],
];

const Y_PATTERNS: ReadonlyArray<readonly [RegExp, YUnit]> = [
  [/(%\s*t\b|%t|percent|\(%\)|\[%\])/i, 'transmittance-percent'],
  [/transmittance|^\s*t\s*$/i, 'transmittance-fraction'],
  [/absorbance|^\s*a\s*$|\babs\b/i, 'absorbance'],
  [/intensity|counts?\b|\bcps\b|a\.\s*u\.|arbitrary|signal/i, 'intensity'],
];

/** Recognise an x unit from a column header or JCAMP-DX XUNITS value; undefined if unknown. */
export function detectXUnit(label: string): XUnit | undefined {
  return X_PATTERNS.find(([re]) => re.test(label))?.[1];
}

/** Recognise a y unit from a column header or JCAMP-DX YUNITS value; undefined if unknown. */
export function detectYUnit(label: string): YUnit | undefined {
  return Y_PATTERNS.find(([re]) => re.test(label))?.[1];
}
