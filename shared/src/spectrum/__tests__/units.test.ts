import { describe, expect, it } from 'vitest';
import {
  absorbanceToTransmittance,
  detectXUnit,
  detectYUnit,
  nmToCm1,
  ramanShiftFromAbsoluteCm1,
  ramanShiftFromWavelengthNm,
  transmittanceToAbsorbance,
  umToCm1,
} from '../units.js';

describe('axis conversions', () => {
  it('turns wavelengths into wavenumbers (10⁷/nm, 10⁴/µm)', () => {
    expect(nmToCm1(2500)).toBeCloseTo(4000, 10);
    expect(umToCm1(10)).toBeCloseTo(1000, 10);
    expect(umToCm1(2.5)).toBeCloseTo(nmToCm1(2500), 10);
  });

  it('computes Raman shifts from the scattered wavelength and from absolute wavenumbers', () => {
    // 785 nm excitation: 10⁷/785 = 12738.854 cm⁻¹; light at 850 nm = 11764.706 cm⁻¹.
    expect(ramanShiftFromWavelengthNm(850, 785)).toBeCloseTo(974.148, 3);
    expect(ramanShiftFromAbsoluteCm1(11764.706, 785)).toBeCloseTo(974.148, 2);
    expect(ramanShiftFromWavelengthNm(785, 785)).toBe(0);
  });

  it('converts transmittance and absorbance both ways (A = −log10 T)', () => {
    expect(transmittanceToAbsorbance(0.1)).toBeCloseTo(1, 12);
    expect(transmittanceToAbsorbance(1)).toBeCloseTo(0, 12);
    expect(absorbanceToTransmittance(2)).toBeCloseTo(0.01, 12);
    for (const a of [0.01, 0.5, 1.7, 3]) expect(transmittanceToAbsorbance(absorbanceToTransmittance(a))).toBeCloseTo(a, 12);
  });
});

describe('unit words in headers', () => {
  it.each([
    ['Wavenumber (cm-1)', 'wavenumber-cm-1'],
    ['wavenumbers [cm^-1]', 'wavenumber-cm-1'],
    ['1/CM', 'wavenumber-cm-1'],
    ['Raman shift (cm⁻¹)', 'raman-shift-cm-1'],
    ['Wavelength (nm)', 'wavelength-nm'],
    ['NANOMETERS', 'wavelength-nm'],
    ['Wavelength (µm)', 'wavelength-um'],
    ['MICROMETERS', 'wavelength-um'],
    ['Absolute wavenumber (cm-1)', 'absolute-cm-1'],
  ])('x "%s" → %s', (label, unit) => expect(detectXUnit(label)).toBe(unit));

  it.each([
    ['Absorbance', 'absorbance'],
    ['%T', 'transmittance-percent'],
    ['Transmittance (%)', 'transmittance-percent'],
    ['TRANSMITTANCE', 'transmittance-fraction'],
    ['Intensity', 'intensity'],
    ['Counts', 'intensity'],
    ['ARBITRARY UNITS', 'intensity'],
  ])('y "%s" → %s', (label, unit) => expect(detectYUnit(label)).toBe(unit));

  it('does not guess unknown words', () => {
    expect(detectXUnit('Time (s)')).toBeUndefined();
    expect(detectYUnit('Kubelka-Munk')).toBeUndefined();
  });
});
