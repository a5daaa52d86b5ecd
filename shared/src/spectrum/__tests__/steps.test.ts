import { describe, expect, it } from 'vitest';
import { atrCorrection } from '../atr.js';
import { DEFAULT_BASELINE, estimateBaseline } from '../baseline.js';
import { blockMeans, expandBlocks } from '../decimate.js';
import { interferenceRegions, separateFlaggedPeaks } from '../interferences.js';
import { keepBroadBands } from '../broad-bands.js';
import { pickPeaks } from '../peaks.js';
import { detectSaturation } from '../saturation.js';
import { smoothingNoiseGain, smoothSavitzkyGolay } from '../smooth.js';
import { removeSpikes } from '../spikes.js';
import { seededGaussian, syntheticSpectrum } from './synthetic.js';

describe('removeSpikes', () => {
  it('removes one-to-three-point cosmic rays and keeps a narrow real band', () => {
    const s = syntheticSpectrum({ from: 200, to: 2000, step: 1, bands: [{ x: 1001, height: 500, fwhm: 6 }], noise: 3, technique: 'raman' });
    const y = Float64Array.from(s.y);
    y[300] += 2000;
    y[700] += 1500;
    y[701] += 1800;
    y[1400] += 900;
    y[1401] += 1200;
    y[1402] += 800;
    const { y: clean, spikesRemoved } = removeSpikes(y);
    expect(spikesRemoved).toBe(3);
    for (const i of [300, 700, 701, 1400, 1401, 1402]) expect(Math.abs(clean[i] - s.y[i])).toBeLessThan(20);
    expect(clean[801]).toBe(y[801]);
  });

  it('finds nothing on a clean scan', () => {
    const s = syntheticSpectrum({ from: 200, to: 2000, step: 1, bands: [{ x: 600, height: 800, fwhm: 5 }], noise: 3, technique: 'raman' });
    expect(removeSpikes(s.y).spikesRemoved).toBe(0);
  });
});

describe('detectSaturation', () => {
  it('finds a clipped top and not a rounded one', () => {
    const s = syntheticSpectrum({ from: 200, to: 2000, step: 1, bands: [{ x: 1001, height: 70000, fwhm: 12 }], noise: 5, technique: 'raman' });
    expect(detectSaturation(s.y).saturated).toBe(false);
    const clipped = s.y.map((v) => Math.min(v, 60000));
    const result = detectSaturation(clipped);
    expect(result.saturated).toBe(true);
    expect(result.longestRun).toBeGreaterThanOrEqual(4);
  });
});

describe('atrCorrection', () => {
  it('multiplies absorbance by ν/ν_ref', () => {
    const out = atrCorrection([500, 1000, 3000], [1, 1, 1], { referenceCm1: 1000 });
    expect(Array.from(out)).toEqual([0.5, 1, 3]);
    expect(() => atrCorrection([1], [1], { referenceCm1: 0 })).toThrow(RangeError);
  });
});

describe('estimateBaseline', () => {
  it('removes a fluorescence background ~80× taller than the bands (Raman default, arPLS, fitted on a 4× coarser grid)', () => {
    const bands = [
      { x: 620, height: 100, fwhm: 8 },
      { x: 1001, height: 600, fwhm: 6 },
      { x: 1602, height: 200, fwhm: 10 },
    ];
    const background = (x: number) => 50000 * Math.exp(-(((x - 1500) / 1400) ** 2)) + 4500 * (x / 3300) + 10000 * Math.exp(-(((x - 600) / 300) ** 2));
    const s = syntheticSpectrum({ from: 200, to: 3300, step: 1, bands, noise: 5, technique: 'raman', background });
    const { corrected } = estimateBaseline(s.xCm1, s.y, 1, { ...DEFAULT_BASELINE.raman, maxPoints: 1024 });
    for (const b of bands) expect(Math.abs(corrected[b.x - 200] - b.height)).toBeLessThan(0.1 * b.height);
    // Away from bands the corrected scan sits at zero within a few noise σ.
    expect(Math.abs(corrected[2500 - 200])).toBeLessThan(40);
  });

  it('keeps both methods selectable and rejects unknown ones', () => {
    const s = syntheticSpectrum({ from: 400, to: 4000, step: 2, bands: [{ x: 1700, height: 0.8, fwhm: 20 }], background: (x) => 0.2 + 0.00005 * x });
    const viaPackage = estimateBaseline(s.xCm1, s.y, 2, { ...DEFAULT_BASELINE.ir, method: 'airpls', lambda: 1e5 });
    viaPackage.corrected.forEach((v, i) => expect(v + viaPackage.baseline[i]).toBeCloseTo(s.y[i], 12));
    expect(Math.abs(viaPackage.corrected[650] - 0.8)).toBeLessThan(0.1);
    expect(() => estimateBaseline(s.xCm1, s.y, 2, { ...DEFAULT_BASELINE.ir, method: 'x' as never })).toThrow(/method/);
    expect(() => estimateBaseline(s.xCm1, s.y, 2, { ...DEFAULT_BASELINE.raman, broadBandWindowCm1: [3800, 2800] })).toThrow(/broadBandWindowCm1/);
    expect(() => estimateBaseline(s.xCm1, s.y, 2, { ...DEFAULT_BASELINE.raman, broadBandLambda: 0 })).toThrow(/broadBandLambda/);
  });
});

describe('keepBroadBands', () => {
  // Invented scans: a broad X–H-like band (FWHM 400) at 3400 on two backgrounds.
  const band = [{ x: 3400, height: 1000, fwhm: 400 }];
  const fit = { windowCm1: [2800, 3800] as const, lambda: 1e7, maxIterations: 50, tolerance: 0.001 };
  const soft = (s: ReturnType<typeof syntheticSpectrum>) => estimateBaseline(s.xCm1, s.y, 1, { ...DEFAULT_BASELINE.raman, broadBandWindowCm1: null }).baseline;

  it('holds the soft baseline under a broad band where the stiff fit follows the background', () => {
    const s = syntheticSpectrum({ from: 150, to: 4000, step: 1, shape: 'gaussian', bands: band, noise: 5, technique: 'raman', background: (x) => 200 + 0.05 * x });
    const baseline = soft(s);
    expect(baseline[3400 - 150]! - (200 + 0.05 * 3400)).toBeGreaterThan(500);
    expect(keepBroadBands(s.xCm1, s.y, baseline, fit)).toBe(true);
    expect(Math.abs(baseline[3400 - 150]! - (200 + 0.05 * 3400))).toBeLessThan(50);
  });

  it('leaves the soft baseline alone when the stiff fit cannot follow strong fluorescence', () => {
    const s = syntheticSpectrum({ from: 150, to: 4000, step: 1, shape: 'gaussian', bands: band, noise: 5, technique: 'raman', background: (x) => 30000 * Math.exp(-(((x - 1400) / 1300) ** 2)) });
    const baseline = soft(s);
    const before = Float64Array.from(baseline);
    expect(keepBroadBands(s.xCm1, s.y, baseline, fit)).toBe(false);
    expect(baseline).toEqual(before);
  });
});

describe('blockMeans and expandBlocks', () => {
  it('average blocks and bring a straight line back exactly, ends included', () => {
    const y = Array.from({ length: 103 }, (_, i) => 3 * i + 2);
    const blocks = blockMeans(y, 4);
    expect(blocks.length).toBe(26);
    expect(blocks[0]).toBe((2 + 5 + 8 + 11) / 4);
    expect(blocks[25]).toBe((3 * 100 + 2 + 3 * 101 + 2 + 3 * 102 + 2) / 3);
    expandBlocks(blocks, 4, 103).forEach((v, i) => expect(v).toBeCloseTo(y[i], 9));
  });
});

describe('pickPeaks', () => {
  it('finds the bands at their positions with their FWHM and no noise peaks', () => {
    const bands = [
      { x: 1100.3, height: 0.5, fwhm: 25 },
      { x: 1700.6, height: 0.8, fwhm: 20 },
      { x: 2950.2, height: 0.4, fwhm: 30 },
    ];
    const s = syntheticSpectrum({ from: 400, to: 4000, step: 1, bands, noise: 0.003, shape: 'gaussian', seed: 11 });
    // As in processScan: smooth, and give the threshold the smoothed noise σ (raw σ × filter gain).
    const smooth = { windowSize: 15, polynomial: 3 };
    const peaks = pickPeaks(s.xCm1, smoothSavitzkyGolay(s.y, smooth), { noiseSigma: 0.003 * smoothingNoiseGain(smooth) });
    expect(peaks.length).toBe(3);
    peaks.forEach((p, i) => {
      expect(Math.abs(p.x - bands[i].x)).toBeLessThan(0.5);
      expect(Math.abs(p.widthCm1 - bands[i].fwhm)).toBeLessThan(1.5);
      expect(Math.abs(p.height - bands[i].height)).toBeLessThan(0.02);
    });
    expect(peaks[1].relativeHeight).toBe(1);
  });

  it('returns nothing from pure noise', () => {
    const g = seededGaussian(5);
    const y = Array.from({ length: 3000 }, () => g());
    const x = Array.from({ length: 3000 }, (_, i) => 400 + i);
    expect(pickPeaks(x, y)).toEqual([]);
  });
});

describe('interference flags', () => {
  const peak = (x: number, widthCm1: number) => ({ x, height: 1, widthCm1, relativeHeight: 1 });

  it('flags CO2, sharp water lines and the diamond region, and keeps broad condensed bands', () => {
    const regions = interferenceRegions('ir', 'condensed', true);
    const { peaks, flaggedPeaks } = separateFlaggedPeaks(
      [peak(2349, 10), peak(667.5, 2), peak(1540, 2.5), peak(1715, 18), peak(3750, 3), peak(3400, 200), peak(2150, 12), peak(1000, 15)],
      regions,
    );
    expect(peaks.map((p) => p.x)).toEqual([1715, 3400, 1000]);
    expect(flaggedPeaks.map((p) => p.flag)).toEqual(['atmospheric-co2', 'atmospheric-co2', 'water-vapour', 'water-vapour', 'atr-diamond']);
  });

  it('keeps strong CO2 bands of a gas cell and strong broad condensed bands in the CO2 region as the sample', () => {
    const rel = (x: number, widthCm1: number, relativeHeight: number) => ({ x, height: relativeHeight, widthCm1, relativeHeight });
    const gas = separateFlaggedPeaks([rel(2337, 8, 1), rel(2361, 8, 0.9), rel(667, 2, 0.6), rel(2345, 6, 0.05)], interferenceRegions('ir', 'gas', false));
    expect(gas.peaks.map((p) => p.x)).toEqual([2337, 2361, 667]);
    expect(gas.flaggedPeaks.map((p) => [p.x, p.flag])).toEqual([[2345, 'atmospheric-co2']]);
    // Condensed: an isocyanate-like band (strong, 40 cm⁻¹ wide) reaching 2285 counts; a weak broad one and a strong narrow one do not.
    const condensed = separateFlaggedPeaks([rel(2285, 40, 0.8), rel(2350, 40, 0.1), rel(2340, 12, 0.9)], interferenceRegions('ir', 'condensed', false));
    expect(condensed.peaks.map((p) => p.x)).toEqual([2285]);
    expect(condensed.flaggedPeaks.map((p) => p.x)).toEqual([2350, 2340]);
  });

  it('flags no diamond without ATR, no water by width in a gas cell, and nothing for Raman', () => {
    expect(interferenceRegions('ir', 'condensed', false).some((r) => r.flag === 'atr-diamond')).toBe(false);
    expect(interferenceRegions('ir', 'gas', false).some((r) => r.flag === 'water-vapour')).toBe(false);
    expect(interferenceRegions('raman', 'condensed', false)).toEqual([]);
  });
});
