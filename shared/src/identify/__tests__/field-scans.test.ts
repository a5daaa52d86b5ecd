/**
 * Field-like scans through the whole pipeline (processScan, then the ranking): broad
 * hydrogen-bonded bands, one-band salts, a nitrile next to the CO2 region, a gas candidate in a
 * condensed scan, and escalation resting on one minor band. Scans are invented unless a
 * fixture file is named.
 */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import { importSpectrum } from '../../spectrum/import.js';
import { processScan } from '../../spectrum/process-scan.js';
import { fixtureText } from '../../spectrum/__tests__/fixtures.js';
import { syntheticSpectrum as bandScan } from '../../spectrum/__tests__/synthetic.js';
import type { Phase, Technique } from '../../spectrum/types.js';
import { BROAD_BAND_WINDOW_FRACTION, PHASE_MISMATCH_FACTOR } from '../constants.js';
import { compoundBands } from '../expected-bands.js';
import { identifyScan } from '../identify-scan.js';
import { identifySpectrum } from '../identify-spectrum.js';
import { seededRandom, syntheticSpectrum } from './synthetic.js';

const library = loadLibrary();
const byId = (id: string) => library.compounds.find((c) => c.id === id)!;

function libraryScan(id: string, technique: Technique, phase: Phase, seed: number) {
  const bands = compoundBands(byId(id), technique, phase, engineAnalyser, BROAD_BAND_WINDOW_FRACTION);
  return syntheticSpectrum([{ bands, amount: 1 }], { technique, phase, dropWeak: 0 }, seededRandom(seed));
}

describe('broad hydrogen-bonded bands survive the baseline', () => {
  // Liquid water IR: O–H stretch ~3400 (FWHM ~400), H–O–H bend ~1640, libration ~700 (broad):
  // from memory of the NIST WebBook and Bertie & Lan, Appl. Spectrosc. 50, 1047 (1996).
  const water = bandScan({
    from: 400,
    to: 4000,
    step: 1,
    shape: 'gaussian',
    bands: [
      { x: 3400, height: 1, fwhm: 400 },
      { x: 1640, height: 0.35, fwhm: 80 },
      { x: 700, height: 0.3, fwhm: 250 },
    ],
    noise: 0.003,
    background: (x) => 0.05 + 3e-5 * x,
    seed: 13,
  });

  it('a condensed IR scan of liquid water keeps the stretch, the bend and the libration', () => {
    for (const atr of [false, true]) {
      const { peaks, quality } = processScan(water, { technique: 'ir', phase: 'condensed', atr });
      expect(quality.reliable).toBe(true);
      for (const [x, fwhm] of [[3400, 400], [1640, 80], [700, 250]] as const) {
        // The ATR factor ν/ν_ref moves a broad band's maximum up by about σ²/ν (16 cm⁻¹ at 700).
        const p = peaks.find((q) => Math.abs(q.x - x) < Math.max(15, fwhm / 10));
        expect(p, `band at ${x}`).toBeDefined();
        expect(p!.widthCm1).toBeGreaterThan(0.8 * fwhm);
      }
    }
  });

  it('a Raman scan of liquid water keeps its broad O–H stretch on a sloping or gently fluorescent background', () => {
    // Liquid water Raman: O–H stretch ~3400 (FWHM ~400) strong, bend ~1640 weak (from memory, as above).
    const bands = [
      { x: 3400, height: 1000, fwhm: 400 },
      { x: 1640, height: 60, fwhm: 80 },
    ];
    for (const background of [(x: number) => 200 + 0.05 * x, (x: number) => 3000 * Math.exp(-(((x - 1400) / 1300) ** 2)) + 0.5 * x]) {
      const scan = bandScan({ from: 150, to: 4000, step: 1, shape: 'gaussian', bands, noise: 5, background, technique: 'raman', seed: 17 });
      const { peaks } = processScan(scan, { technique: 'raman', phase: 'condensed' });
      const stretch = peaks.find((p) => Math.abs(p.x - 3400) < 30);
      expect(stretch).toBeDefined();
      expect(stretch!.height).toBeGreaterThan(0.7 * 1000);
    }
  });
});

describe('one-band compounds', () => {
  it('a Raman scan of sodium nitrate (one strong band) is a reliable result with sodium nitrate first', () => {
    // NO3⁻ ν1 1068 in NaNO3 (Nakamoto 2009, from memory; the library's value).
    const scan = bandScan({ from: 150, to: 3300, step: 1, bands: [{ x: 1068, height: 800, fwhm: 7 }], noise: 4, background: (x) => 300 + 0.1 * x, technique: 'raman', seed: 3 });
    const { processed, result } = identifySpectrum(scan, { process: { technique: 'raman', phase: 'condensed' } });
    expect(processed.peaks.length).toBe(1);
    expect(processed.quality.reliable).toBe(true);
    expect(result.candidates[0]!.id).toBe('sodium-nitrate');
  });

  it('a Raman scan of liquid chlorine (ν1 only) ranks chlorine first', () => {
    const { result } = identifySpectrum(libraryScan('chlorine', 'raman', 'condensed', 5), { process: { technique: 'raman', phase: 'condensed' } });
    expect(result.reliable).toBe(true);
    expect(result.candidates[0]!.id).toBe('chlorine');
  });

  it('a single weak peak is still no reliable result', () => {
    const scan = bandScan({ from: 150, to: 3300, step: 1, bands: [{ x: 1068, height: 120, fwhm: 7 }], noise: 4, technique: 'raman', seed: 8 });
    const { quality } = processScan(scan, { technique: 'raman', phase: 'condensed' });
    expect(quality.snr).toBeGreaterThan(10);
    expect(quality.snr).toBeLessThan(50);
    expect(quality.reliable).toBe(false);
    expect(quality.reasons.join(' ')).toMatch(/too few peaks/);
  });
});

describe('bands beside the CO2 region', () => {
  for (const technique of ['ir', 'raman'] as const) {
    it(`liquid acetonitrile (C≡N 2253) is identified by ${technique}`, () => {
      // C≡N stretch ν2 2253 in the liquid (Shimanouchi 1972, from memory; the library's value).
      const { processed, result } = identifySpectrum(libraryScan('acetonitrile', technique, 'condensed', 9), { process: { technique, phase: 'condensed' } });
      expect(processed.peaks.some((p) => Math.abs(p.x - 2253) < 5)).toBe(true);
      expect(result.candidates[0]!.id).toBe('acetonitrile');
    });
  }

  it('on diamond ATR the C≡N band is set apart with the crystal region, and acetonitrile still ranks first', () => {
    const bands = compoundBands(byId('acetonitrile'), 'ir', 'condensed', engineAnalyser, BROAD_BAND_WINDOW_FRACTION);
    const scan = syntheticSpectrum([{ bands, amount: 1 }], { technique: 'ir', phase: 'condensed', dropWeak: 0, atr: true }, seededRandom(10));
    const { processed, result } = identifySpectrum(scan, { process: { technique: 'ir', phase: 'condensed', atr: true } });
    expect(processed.flaggedPeaks.some((p) => p.flag === 'atr-diamond' && Math.abs(p.x - 2253) < 5)).toBe(true);
    expect(result.candidates[0]!.id).toBe('acetonitrile');
  });
});

describe('phase of the candidates', () => {
  const example = importSpectrum(fixtureText('spectra/synthetic-ir-ethanol-liquid.csv'));

  it('the ethanol-like liquid example ranks ethanol first, scales gases down with the reason, and does not escalate', () => {
    const { result } = identifySpectrum(example, { process: { technique: 'ir', phase: 'condensed' } });
    expect(result.candidates[0]!.id).toBe('ethanol');
    expect(result.candidates[0]!.phaseMismatch).toBeNull();
    const ozone = result.candidates.find((c) => c.id === 'ozone');
    if (ozone !== undefined) {
      expect(ozone.parts.phaseFactor).toBe(PHASE_MISMATCH_FACTOR);
      expect(ozone.phaseMismatch).toMatch(/gas/);
      expect(ozone.escalationEvidence).toBe(false);
    }
    expect(result.escalation.required).toBe(false);
  });

  it('a gas is not scaled down in a gas cell, and a solid is', () => {
    const gasScan = libraryScan('ozone', 'ir', 'gas', 4);
    const { result } = identifySpectrum(gasScan, { process: { technique: 'ir', phase: 'gas' } });
    expect(result.candidates[0]!.id).toBe('ozone');
    expect(result.candidates[0]!.parts.phaseFactor).toBe(1);
    const salt = identifySpectrum(libraryScan('sodium-nitrate', 'ir', 'condensed', 6), { process: { technique: 'ir', phase: 'gas' } }).result;
    const nitrate = salt.candidates.find((c) => c.id === 'sodium-nitrate')!;
    expect(nitrate.parts.phaseFactor).toBe(PHASE_MISMATCH_FACTOR);
    expect(nitrate.phaseMismatch).toMatch(/solid/);
  });
});

describe('escalation needs more than one minor band', () => {
  // Ozone gas IR ν3 1042 (vs), ν1 1103 (w) (Shimanouchi 1972, from memory; the library's values);
  // the 1900 cm⁻¹ peak matches nothing in the library (invented).
  const peak = (x: number, h: number) => ({ x, height: h, widthCm1: 4, relativeHeight: h });

  it('a hazardous gas matching one peak of a two-peak scan keeps its caution card but does not escalate', () => {
    const r = identifyScan({ technique: 'ir', phase: 'gas', peaks: [peak(1042, 0.9), peak(1900, 1)] });
    const ozone = r.candidates.find((c) => c.id === 'ozone')!;
    expect(ozone.score).toBeGreaterThanOrEqual(library.escalationRules.minScore);
    expect(ozone.escalationEvidence).toBe(false);
    expect(ozone.hazards[0]!.hazardous).toBe(true);
    expect(r.escalation.triggers.some((t) => t.compoundId === 'ozone')).toBe(false);
    expect(r.cautions.some((c) => c.startsWith('Ozone') && /not escalated/.test(c))).toBe(true);
  });

  it('the same gas escalates once a second of its bands is seen', () => {
    const r = identifyScan({ technique: 'ir', phase: 'gas', peaks: [peak(1042, 1), peak(1103, 0.3), peak(1900, 1)] });
    expect(r.candidates.find((c) => c.id === 'ozone')!.escalationEvidence).toBe(true);
    expect(r.escalation.triggers.some((t) => t.compoundId === 'ozone')).toBe(true);
  });
});
