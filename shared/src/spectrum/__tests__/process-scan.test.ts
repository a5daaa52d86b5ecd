import { describe, expect, it } from 'vitest';
import { processScan } from '../process-scan.js';
import type { Spectrum } from '../types.js';
import { syntheticSpectrum } from './synthetic.js';

// Invented band sets (positions chosen for the test, not measured).
const RAMAN_BANDS = [
  { x: 620.9, height: 160, fwhm: 7 },
  { x: 1001.4, height: 1000, fwhm: 6 },
  { x: 1031.8, height: 270, fwhm: 7 },
  { x: 1602.3, height: 280, fwhm: 9 },
  { x: 3054.3, height: 320, fwhm: 14 },
];

describe('processScan, Raman', () => {
  const fluorescence = (x: number) => 40000 * Math.exp(-(((x - 1400) / 1300) ** 2)) + 3 * x;
  const scan = syntheticSpectrum({ from: 150, to: 3300, step: 1, bands: RAMAN_BANDS, noise: 6, technique: 'raman', background: fluorescence, seed: 21 });

  it('finds every band under strong fluorescence, with spikes removed, on a reliable verdict', () => {
    const y = Float64Array.from(scan.y);
    y[1200] += 5000;
    y[2100] += 3000;
    y[2101] += 3500;
    const result = processScan({ ...scan, y, excitationNm: 785 }, { technique: 'raman', phase: 'condensed' });
    expect(result.quality.reliable).toBe(true);
    expect(result.quality.spikesRemoved).toBe(2);
    expect(result.quality.snr).toBeGreaterThan(100);
    expect(result.peaks.length).toBe(RAMAN_BANDS.length);
    result.peaks.forEach((p, i) => {
      expect(Math.abs(p.x - RAMAN_BANDS[i].x)).toBeLessThan(0.5);
      expect(p.widthCm1).toBeGreaterThan(RAMAN_BANDS[i].fwhm * 0.8);
      expect(p.widthCm1).toBeLessThan(RAMAN_BANDS[i].fwhm * 1.3);
    });
    expect(result.peaks[1].relativeHeight).toBe(1);
    expect(result.spectrum.excitationNm).toBe(785);
    expect(result.baseline.length).toBe(result.spectrum.xCm1.length);
  });

  it('records every parameter it used', () => {
    const { parameters } = processScan(scan, { technique: 'raman', phase: 'condensed', baseline: { lambda: 5e3 } });
    expect(parameters.baseline.lambda).toBe(5e3);
    expect(parameters.baseline.method).toBe('arpls');
    expect(parameters.baseline.iterations).toBeGreaterThan(0);
    expect(parameters.gridStepCm1).toBe(1);
    expect(parameters.smoothing.windowSize).toBe(9);
    expect(parameters.spikes.enabled).toBe(true);
    expect(parameters.peaks.threshold).toBeCloseTo(parameters.peaks.thresholdSigma * parameters.peaks.noiseSigma, 12);
    expect(parameters.quality).toEqual({ minSnr: 10, minPeaks: 2, singlePeakMinSnr: 50 });
  });

  it('says a saturated scan is unreliable', () => {
    const clipped = scan.y.map((v) => Math.min(v, 40500));
    const result = processScan({ ...scan, y: clipped }, { technique: 'raman', phase: 'condensed' });
    expect(result.quality.saturated).toBe(true);
    expect(result.quality.reliable).toBe(false);
    expect(result.quality.reasons.join(' ')).toMatch(/saturation.*lower the laser power/);
  });

  it('carries the presumptive-identification and laser cautions', () => {
    const { cautions } = processScan(scan, { technique: 'raman', phase: 'condensed' });
    expect(cautions.join(' ')).toMatch(/presumptive.*laboratory/);
    expect(cautions.join(' ')).toMatch(/SDS/);
    expect(cautions.join(' ')).toMatch(/ignite/);
  });

  it('says a scan of noise is too weak and returns no noise peaks', () => {
    const weak = syntheticSpectrum({ from: 150, to: 3300, step: 1, bands: [{ x: 1001.4, height: 20, fwhm: 6 }], noise: 6, technique: 'raman', seed: 4 });
    const result = processScan(weak, { technique: 'raman', phase: 'condensed' });
    expect(result.quality.reliable).toBe(false);
    expect(result.quality.reasons.join(' ')).toMatch(/signal-to-noise/);
    expect(result.peaks).toEqual([]);
  });
});

describe('processScan, IR', () => {
  const bands = [
    { x: 1028.3, height: 0.35, fwhm: 10 },
    { x: 1601.2, height: 0.3, fwhm: 9 },
    { x: 1715.0, height: 0.6, fwhm: 20 },
    { x: 2849.5, height: 0.4, fwhm: 18 },
  ];
  const absorbance = syntheticSpectrum({ from: 600, to: 4000, step: 1, bands, noise: 0.002, background: (x) => 0.05 + 2e-5 * x, seed: 8 });

  it('turns %T into absorbance and finds the bands', () => {
    const transmittance: Spectrum = { ...absorbance, ordinate: 'transmittance', y: absorbance.y.map((a) => 10 ** -a) };
    const result = processScan(transmittance, { technique: 'ir', phase: 'condensed' });
    expect(result.spectrum.ordinate).toBe('absorbance');
    expect(result.peaks.map((p) => Math.round(p.x))).toEqual([1028, 1601, 1715, 2850]);
    expect(result.quality.reliable).toBe(true);
  });

  it('keeps most of a broad O–H-like band (FWHM 250 cm⁻¹) through the baseline', () => {
    const broad = syntheticSpectrum({ from: 600, to: 4000, step: 1, bands: [...bands, { x: 3350, height: 0.5, fwhm: 250 }], noise: 0.002, background: (x) => 0.05 + 2e-5 * x, seed: 5 });
    const peak = processScan(broad, { technique: 'ir', phase: 'condensed' }).peaks.find((p) => Math.abs(p.x - 3350) < 10)!;
    expect(peak.height).toBeGreaterThan(0.85 * 0.5);
    expect(peak.widthCm1).toBeGreaterThan(200);
  });

  it('sets atmospheric lines and ATR-diamond bands apart and applies the ATR correction', () => {
    const extra = [
      { x: 2349, height: 0.3, fwhm: 12 },
      { x: 1540, height: 0.1, fwhm: 2 },
      { x: 3745, height: 0.08, fwhm: 2 },
      { x: 2030, height: 0.2, fwhm: 25 },
    ];
    const scan = syntheticSpectrum({ from: 600, to: 4000, step: 0.5, bands: [...bands, ...extra], noise: 0.001, seed: 9 });
    const plain = processScan(scan, { technique: 'ir', phase: 'condensed' });
    expect(plain.flaggedPeaks.map((p) => [Math.round(p.x), p.flag])).toEqual([
      [1540, 'water-vapour'],
      [2349, 'atmospheric-co2'],
      [3745, 'water-vapour'],
    ]);
    expect(plain.peaks.some((p) => Math.abs(p.x - 2030) < 2)).toBe(true);
    const atr = processScan(scan, { technique: 'ir', phase: 'condensed', atr: { referenceCm1: 1000 } });
    expect(atr.flaggedPeaks.some((p) => p.flag === 'atr-diamond' && Math.abs(p.x - 2030) < 2)).toBe(true);
    const height = (r: typeof plain, x: number) => r.peaks.find((p) => Math.abs(p.x - x) < 2)!.height;
    expect(height(atr, 2849.5) / height(plain, 2849.5)).toBeCloseTo(2.8495, 1);
    expect(atr.parameters.atr).toEqual({ enabled: true, referenceCm1: 1000 });
  });

  it('refuses bad input with a clear error', () => {
    expect(() => processScan({ ...absorbance, ordinate: 'intensity' }, { technique: 'ir', phase: 'condensed' })).toThrow(/absorbance or transmittance/);
    expect(() => processScan(absorbance, { technique: 'raman', phase: 'condensed' })).toThrow(/intensity/);
    expect(() => processScan(absorbance, { technique: 'ir', phase: 'liquid' as never })).toThrow(/phase/);
    expect(() => processScan({ ...absorbance, xCm1: absorbance.xCm1.slice().reverse() }, { technique: 'ir', phase: 'condensed' })).toThrow(/ascending/);
    const withNaN = Float64Array.from(absorbance.y);
    withNaN[10] = Number.NaN;
    expect(() => processScan({ ...absorbance, y: withNaN }, { technique: 'ir', phase: 'condensed' })).toThrow(/not finite/);
    const raman = syntheticSpectrum({ from: 200, to: 2000, step: 1, bands: [], technique: 'raman' });
    expect(() => processScan(raman, { technique: 'raman', phase: 'condensed', atr: true })).toThrow(/ATR/);
  });
});

describe('processScan grid', () => {
  it('does not let a few clustered points blow up the grid', () => {
    const x = Float64Array.from({ length: 400 }, (_, i) => (i < 390 ? 1000 + i * 1e-4 : 1000 + (i - 389) * 300));
    const y = x.map((v) => 0.1 + 0.5 / (1 + ((v - 2500) / 40) ** 2));
    const result = processScan({ xCm1: x, y, ordinate: 'absorbance', technique: 'ir' }, { technique: 'ir', phase: 'condensed' });
    expect(result.parameters.pointCount).toBeLessThanOrEqual(1601);
    expect(() => processScan({ xCm1: x, y, ordinate: 'absorbance', technique: 'ir' }, { technique: 'ir', phase: 'condensed', gridStepCm1: 1e-5 })).toThrow(/more than 200000 points/);
  });
});
