import { describe, expect, it } from 'vitest';
import { spectrumToCsv, spectrumToJcamp } from '../export.js';
import { importSpectrum } from '../import.js';
import { processScan } from '../process-scan.js';
import { syntheticSpectrum } from './synthetic.js';

describe('export and re-import', () => {
  const raw = syntheticSpectrum({
    from: 200,
    to: 3200,
    step: 1.5,
    bands: [
      { x: 1001.4, height: 900, fwhm: 6 },
      { x: 1602.3, height: 300, fwhm: 9 },
    ],
    noise: 4,
    technique: 'raman',
  });
  const processed = processScan({ ...raw, excitationNm: 785 }, { technique: 'raman', phase: 'condensed' }).spectrum;

  it('CSV round trip is exact', () => {
    const back = importSpectrum(spectrumToCsv(processed));
    expect(back.technique).toBe('raman');
    expect(Array.from(back.xCm1)).toEqual(Array.from(processed.xCm1));
    expect(Array.from(back.y)).toEqual(Array.from(processed.y));
  });

  it('JCAMP-DX round trip keeps the axis, the technique, the laser line and y to 1e-6 of the range', () => {
    const text = spectrumToJcamp(processed);
    expect(text).toMatch(/##DATA TYPE=RAMAN SPECTRUM/);
    const back = importSpectrum(text);
    expect(back.technique).toBe('raman');
    expect(back.excitationNm).toBe(785);
    expect(back.xCm1.length).toBe(processed.xCm1.length);
    const range = Math.max(...processed.y) - Math.min(...processed.y);
    back.xCm1.forEach((x, i) => {
      expect(x).toBeCloseTo(processed.xCm1[i], 6);
      expect(Math.abs(back.y[i] - processed.y[i])).toBeLessThan(1e-6 * range);
    });
  });

  it('writes the processing parameters as a private label and refuses a non-uniform axis', () => {
    const result = processScan(raw, { technique: 'raman', phase: 'condensed' });
    const text = spectrumToJcamp(result.spectrum, { 'SITEBAND PARAMETERS': JSON.stringify(result.parameters) });
    const back = importSpectrum(text);
    expect(JSON.parse(back.meta!['SITEBAND PARAMETERS'])).toEqual(JSON.parse(JSON.stringify(result.parameters)));
    const uneven = { ...raw, xCm1: raw.xCm1.map((x, i) => x + (i === 5 ? 0.3 : 0)) };
    expect(() => spectrumToJcamp(uneven)).toThrow(/uniform axis/);
  });

  it('IR absorbance survives the JCAMP-DX round trip as absorbance', () => {
    const ir = syntheticSpectrum({ from: 600, to: 4000, step: 2, bands: [{ x: 1700, height: 0.8, fwhm: 20 }] });
    const back = importSpectrum(spectrumToJcamp(ir), { technique: 'ir' });
    expect(back.ordinate).toBe('absorbance');
    expect(back.y[550]).toBeCloseTo(ir.y[550], 6);
  });
});
