import { describe, expect, it } from 'vitest';
import { seededGaussian } from '../../spectrum/__tests__/synthetic.js';
import { PR_SEPARATION_CONSTANT } from '../constants.js';
import { rotationalLines, type RotorBand } from '../lines.js';
import { analyseContour } from '../recognise.js';
import { simulateContour } from '../simulate.js';
import { prSeparationCm1, temperatureFromPrSeparation } from '../temperature.js';

// Molecular constants (from memory, as listed with their sources in the reference-value file §2.1 and §4.2):
// CO B0 1.92253 cm⁻¹ (Huber & Herzberg), band origin 2143.27 (NIST SP 821); ¹²C¹⁶O2 B0 0.39022 (HITRAN/Herzberg),
// ν3 2349.143 (read), ν2 667 (Shimanouchi).
const CO: RotorBand = { rotor: 'linear', band: 'parallel', bandOriginCm1: 2143.27, bCm1: 1.92253 };
const CO2_V3: RotorBand = { rotor: 'linear', band: 'parallel', bandOriginCm1: 2349.143, bCm1: 0.39022, nuclearSpin: { even: 1, odd: 0 } };
const CO2_V2: RotorBand = { rotor: 'linear', band: 'perpendicular', bandOriginCm1: 667.4, bCm1: 0.39022, nuclearSpin: { even: 1, odd: 0 } };
// An invented prolate symmetric top (constants chosen for the test).
const TOP: RotorBand = { rotor: 'symmetric-top', band: 'parallel', bandOriginCm1: 1355, bCm1: 0.44, axialCm1: 5.2 };

describe('constants and the P–R formula', () => {
  it('uses √(8k/hc) = 2.358024 (COMPUTED from k/hc = 0.6950348 cm⁻¹/K)', () => {
    expect(PR_SEPARATION_CONSTANT).toBeCloseTo(2.358024, 6);
    expect(prSeparationCm1(1.92253, 296)).toBeCloseTo(56.25, 2);
    expect(temperatureFromPrSeparation(prSeparationCm1(0.39022, 296), 0.39022)).toBeCloseTo(296, 9);
  });
});

describe('rotationalLines', () => {
  it('gives a parallel linear band P and R lines only, spaced 2B, with a 4B gap at the centre', () => {
    const lines = rotationalLines(CO, 296);
    expect(new Set(lines.map((l) => l.branch))).toEqual(new Set(['P', 'R']));
    const r0 = lines.find((l) => l.branch === 'R' && l.lowerJ === 0)!;
    const p1 = lines.find((l) => l.branch === 'P' && l.lowerJ === 1)!;
    expect(r0.positionCm1 - p1.positionCm1).toBeCloseTo(4 * 1.92253, 9);
    const r5 = lines.find((l) => l.branch === 'R' && l.lowerJ === 5)!;
    const r6 = lines.find((l) => l.branch === 'R' && l.lowerJ === 6)!;
    expect(r6.positionCm1 - r5.positionCm1).toBeCloseTo(2 * 1.92253, 9);
  });

  it('puts the strongest CO lines near J_max = 6.8 at 296 K (reference-value file §4.2, COMPUTED)', () => {
    const lines = rotationalLines(CO, 296);
    const strongest = (branch: 'P' | 'R') => lines.filter((l) => l.branch === branch).sort((a, b) => b.intensity - a.intensity)[0].lowerJ;
    expect([6, 7]).toContain(strongest('R'));
    expect([7, 8]).toContain(strongest('P'));
  });

  it('populates only even J for ¹²C¹⁶O2 with the nuclear-spin option', () => {
    const lines = rotationalLines(CO2_V3, 296);
    expect(lines.every((l) => l.lowerJ % 2 === 0)).toBe(true);
    expect(rotationalLines({ ...CO2_V3, nuclearSpin: undefined }, 296).some((l) => l.lowerJ % 2 === 1)).toBe(true);
  });

  it('gives a perpendicular band a Q branch, piled at the centre when B′ = B″', () => {
    const q = rotationalLines(CO2_V2, 296).filter((l) => l.branch === 'Q');
    expect(q.length).toBeGreaterThan(10);
    for (const line of q) expect(line.positionCm1).toBeCloseTo(667.4, 9);
  });

  it('makes R lines converge and P lines diverge when B′ < B″ (band convergence)', () => {
    const lines = rotationalLines({ ...CO, upperBCm1: 1.905 }, 296);
    const r = (j: number) => lines.find((l) => l.branch === 'R' && l.lowerJ === j)!.positionCm1;
    const p = (j: number) => lines.find((l) => l.branch === 'P' && l.lowerJ === j)!.positionCm1;
    expect(r(11) - r(10)).toBeLessThan(r(2) - r(1));
    expect(p(10) - p(11)).toBeGreaterThan(p(1) - p(2));
  });

  it('refuses impossible parameters', () => {
    expect(() => rotationalLines({ ...CO, bCm1: 0 }, 296)).toThrow(RangeError);
    expect(() => rotationalLines(CO, -5)).toThrow(RangeError);
    expect(() => rotationalLines({ ...TOP, axialCm1: undefined }, 296)).toThrow(/axial/);
  });
});

describe('simulateContour and analyseContour', () => {
  it('CO at 296 K: P–R separation ≈ 56.25 cm⁻¹ (±1.5) at several resolutions', () => {
    for (const resolutionCm1 of [0.5, 2, 4, 8]) {
      const c = simulateContour({ ...CO, temperatureK: 296, resolutionCm1 });
      const a = analyseContour(c.xCm1, c.y, { bCm1: CO.bCm1 });
      expect(a.kind).toBe('PR');
      expect(Math.abs(a.separationCm1! - 56.25)).toBeLessThan(1.5);
    }
  });

  it('CO2 ν3 at 296 K: P–R separation ≈ 25.3 cm⁻¹', () => {
    for (const resolutionCm1 of [0.5, 4]) {
      const c = simulateContour({ ...CO2_V3, temperatureK: 296, resolutionCm1 });
      const a = analyseContour(c.xCm1, c.y, { bCm1: CO2_V3.bCm1 });
      expect(a.kind).toBe('PR');
      expect(Math.abs(a.separationCm1! - 25.34)).toBeLessThan(0.75);
    }
  });

  it('estimates the temperature within 5 % on simulated parallel and perpendicular linear bands', () => {
    const cases: [RotorBand, number, number, 'gaussian' | 'lorentzian'][] = [
      [CO, 150, 1, 'gaussian'],
      [CO, 296, 4, 'lorentzian'],
      [CO, 600, 2, 'gaussian'],
      [CO, 1000, 4, 'lorentzian'],
      [CO2_V3, 220, 0.5, 'gaussian'],
      [CO2_V3, 450, 2, 'lorentzian'],
      [CO2_V2, 296, 1, 'gaussian'],
      [CO2_V2, 500, 4, 'gaussian'],
    ];
    for (const [band, temperatureK, resolutionCm1, lineShape] of cases) {
      const c = simulateContour({ ...band, temperatureK, resolutionCm1, lineShape });
      const a = analyseContour(c.xCm1, c.y, { bCm1: band.bCm1 });
      expect(Math.abs(a.temperatureK! / temperatureK - 1)).toBeLessThan(0.05);
    }
  });

  it('tells a P/R doublet from a P/Q/R band with a sharp Q', () => {
    const pr = simulateContour({ ...CO2_V3, temperatureK: 296, resolutionCm1: 2 });
    expect(analyseContour(pr.xCm1, pr.y).kind).toBe('PR');
    const pqr = simulateContour({ ...CO2_V2, temperatureK: 296, resolutionCm1: 2 });
    const a = analyseContour(pqr.xCm1, pqr.y);
    expect(a.kind).toBe('PQR');
    expect(a.qMaximumCm1!).toBeCloseTo(667.4, 1);
    const top = simulateContour({ ...TOP, temperatureK: 296, resolutionCm1: 2 });
    expect(analyseContour(top.xCm1, top.y).kind).toBe('PQR');
  });

  it('still tells them apart with 1 % seeded noise', () => {
    const noise = seededGaussian(12);
    for (const [band, kind] of [
      [CO, 'PR'],
      [CO2_V2, 'PQR'],
    ] as const) {
      const c = simulateContour({ ...band, temperatureK: 296, resolutionCm1: 4 });
      const noisy = c.y.map((v) => v + 0.01 * noise());
      expect(analyseContour(c.xCm1, noisy).kind).toBe(kind);
    }
  });

  it('says unknown for a single symmetric line', () => {
    const x = Float64Array.from({ length: 400 }, (_, i) => 1000 + i * 0.1);
    const y = x.map((v) => Math.exp(-(((v - 1020) / 2) ** 2)));
    expect(analyseContour(x, y).kind).toBe('unknown');
  });
});
