import { describe, expect, it } from 'vitest';
import { syntheticSpectrum, type Band } from '../../spectrum/__tests__/synthetic.js';
import { fixtureText } from '../../spectrum/__tests__/fixtures.js';
import { runInstrumentCheck } from '../run-check.js';
import { REFERENCE_STANDARDS, referenceStandard } from '../standards.js';

// Synthetic scans (invented, not measured) built from the standards' published positions.
function scanOf(standardId: string, shiftCm1: number, options: { drop?: number; heights?: readonly number[]; from: number; to: number; step: number }) {
  const standard = referenceStandard(standardId);
  const raman = standard.technique === 'raman';
  const bands: Band[] = standard.bands
    .filter((b) => b.positionCm1 !== options.drop)
    .map((b, i) => ({ x: b.positionCm1 + shiftCm1, height: (options.heights?.[i] ?? 50) * (raman ? 10 : 0.01), fwhm: raman ? 5 : 6 }));
  return syntheticSpectrum({ from: options.from, to: options.to, step: options.step, bands, noise: raman ? 4 : 0.002, technique: standard.technique, seed: 17 });
}

const IR = { from: 600, to: 3400, step: 0.5 };
const RAMAN = { from: 150, to: 3400, step: 1 };
// Relative intensities of the polystyrene Raman bands as listed with the positions (ramanchada2 constants.py, read).
const PST_INTENSITIES = [16, 10, 100, 27, 13, 8, 12, 28, 9, 13, 32];

describe('runInstrumentCheck, IR polystyrene (EP 2.2.24 bands)', () => {
  it('passes a scan shifted by 0.4 cm⁻¹', () => {
    const result = runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 0.4, IR), 'ir-polystyrene-ep-ft');
    expect(result.pass).toBe(true);
    expect(result.reason).toMatch(/all 7 bands/);
    for (const band of result.bands) {
      expect(band.status).toBe('pass');
      expect(band.offsetCm1!).toBeCloseTo(0.4, 1);
    }
    expect(result.toleranceBasis).toBe('published');
  });

  it('fails a scan shifted by 3 cm⁻¹, naming the bands and offsets', () => {
    const result = runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 3, IR), 'ir-polystyrene-ep-ft');
    expect(result.pass).toBe(false);
    expect(result.bands.every((b) => b.status === 'out-of-tolerance')).toBe(true);
    expect(result.reason).toMatch(/7 bands outside tolerance: 3060 \(\+3\.0\d cm⁻¹, allowed ±1\)/);
  });

  it('applies the wider EP 4.0 / JP tolerance only to the three bands that have it', () => {
    const result = runInstrumentCheck(scanOf('ir-polystyrene-ep4-jp', 1.25, IR), 'ir-polystyrene-ep4-jp');
    const passed = result.bands.filter((b) => b.status === 'pass').map((b) => b.expectedCm1);
    expect(passed).toEqual([3060.0, 2849.5, 1942.9]);
    expect(result.pass).toBe(false);
  });

  it('fails when a band is missing', () => {
    const result = runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 0, { ...IR, drop: 1583.0 }), 'ir-polystyrene-ep-ft');
    expect(result.pass).toBe(false);
    expect(result.bands.find((b) => b.expectedCm1 === 1583.0)!.status).toBe('missing');
    expect(result.reason).toMatch(/1 band not found: 1583/);
  });

  it('takes a caller tolerance and reports it as such', () => {
    const result = runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 3, IR), 'ir-polystyrene-ep-ft', { tolerance: 4 });
    expect(result.pass).toBe(true);
    expect(result.toleranceBasis).toBe('caller');
  });
});

describe('runInstrumentCheck, Raman (ASTM E1840 shifts)', () => {
  it('passes cyclohexane shifted by 0.8 cm⁻¹ and fails it shifted by 3 cm⁻¹', () => {
    const good = runInstrumentCheck(scanOf('raman-cyclohexane-astm-e1840', 0.8, RAMAN), 'raman-cyclohexane-astm-e1840');
    expect(good.pass).toBe(true);
    expect(good.toleranceBasis).toBe('common practice');
    const bad = runInstrumentCheck(scanOf('raman-cyclohexane-astm-e1840', 3, RAMAN), 'raman-cyclohexane-astm-e1840');
    expect(bad.pass).toBe(false);
    expect(bad.bands.filter((b) => b.status === 'out-of-tolerance').length).toBe(11);
  });

  it('passes polystyrene with its listed relative intensities', () => {
    const result = runInstrumentCheck(scanOf('raman-polystyrene-astm-e1840', -0.5, { ...RAMAN, heights: PST_INTENSITIES }), 'raman-polystyrene-astm-e1840');
    expect(result.pass).toBe(true);
  });

  it('marks bands outside the scanned range instead of failing them', () => {
    const result = runInstrumentCheck(scanOf('raman-paracetamol-astm-e1840', 0, { from: 250, to: 2000, step: 1 }), 'raman-paracetamol-astm-e1840');
    expect(result.bands.filter((b) => b.status === 'out-of-range').map((b) => b.expectedCm1)).toEqual([213.3, 2931.1, 3064.6, 3102.4, 3326.6]);
    expect(result.pass).toBe(true);
  });

  it('refuses a scan of the wrong technique and an unknown standard', () => {
    expect(() => runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 0, IR), 'raman-polystyrene-astm-e1840')).toThrow(/Raman standard/);
    expect(() => runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 0, IR), 'nope')).toThrow(/unknown reference standard "nope"/);
    expect(() => runInstrumentCheck(scanOf('ir-polystyrene-ep-ft', 0, IR), 'ir-polystyrene-ep-ft', { tolerance: -1 })).toThrow(/tolerance/);
  });

  it('fails a scan that is only noise, whatever the bands', () => {
    const noise = syntheticSpectrum({ from: 150, to: 3400, step: 1, bands: [], noise: 4, technique: 'raman', seed: 3 });
    const result = runInstrumentCheck(noise, 'raman-cyclohexane-astm-e1840');
    expect(result.pass).toBe(false);
    expect(result.reason).toMatch(/unreliable/);
  });
});

describe('standards data', () => {
  it.each(REFERENCE_STANDARDS.map((s) => [s.id, s] as const))('%s matches its fixture file and names a source for every value', (id, standard) => {
    expect(JSON.parse(fixtureText(`standards/${id}.json`))).toEqual(JSON.parse(JSON.stringify(standard)));
    for (const band of standard.bands) {
      expect(band.positionSource.length).toBeGreaterThan(10);
      expect(band.toleranceSource.length).toBeGreaterThan(10);
      expect(band.toleranceCm1).toBeGreaterThan(0);
    }
    expect(new Set(standard.bands.map((b) => b.positionCm1)).size).toBe(standard.bands.length);
  });
});
