/**
 * Gas-cell IR scans built from simulated rotation–vibration contours (invented scans on
 * published constants), processed by processScan and ranked: the gas itself must come first,
 * its strong CO2 bands must not be set apart as atmospheric residue.
 */
import { describe, expect, it } from 'vitest';
import { simulateContour, type ContourOptions } from '../../contours/simulate.js';
import type { Spectrum } from '../../spectrum/types.js';
import { identifySpectrum } from '../identify-spectrum.js';
import { gaussian, seededRandom } from './synthetic.js';

const STEP_CM1 = 0.5;
const axis = Float64Array.from({ length: Math.round((4000 - 500) / STEP_CM1) + 1 }, (_, i) => 500 + i * STEP_CM1);

/** A gas-cell absorbance scan: contours scaled to the given peak absorbances, a gentle slope and noise. */
function gasScan(bands: readonly (ContourOptions & { readonly absorbance: number })[], seed: number): Spectrum {
  const random = seededRandom(seed);
  const y = axis.map((x) => 0.02 + 4e-6 * x + 0.002 * gaussian(random));
  for (const b of bands) {
    const contour = simulateContour({ ...b, stepCm1: STEP_CM1 / 2 });
    for (let i = 0; i < axis.length; i++) y[i] += b.absorbance * interpolate(contour.xCm1, contour.y, axis[i]!);
  }
  return { xCm1: axis, y, ordinate: 'absorbance', technique: 'ir', title: 'synthetic (invented) gas-cell scan' };
}

function interpolate(x: Float64Array, y: Float64Array, at: number): number {
  if (at <= x[0]! || at >= x[x.length - 1]!) return 0;
  const f = (at - x[0]!) / (x[1]! - x[0]!);
  const i = Math.floor(f);
  return y[i]! + (y[i + 1]! - y[i]!) * (f - i);
}

const identifyGas = (scan: Spectrum) => identifySpectrum(scan, { process: { technique: 'ir', phase: 'gas' } });
const RESOLUTION = { resolutionCm1: 4, temperatureK: 296 } as const;

describe('gas-cell IR scans from simulated contours', () => {
  it('CO2: the strong ν3 P/R pair and the ν2 Q branch are the sample, and CO2 ranks first', () => {
    // ν3 2349.143 (NIST WebBook, read, check values §2.1), ν2 667 (Shimanouchi 1972, from memory);
    // B0 0.39022 (HITRAN/Herzberg, from memory, check values §4.2); only even J for ¹²C¹⁶O2.
    const scan = gasScan(
      [
        { rotor: 'linear', band: 'parallel', bandOriginCm1: 2349.143, bCm1: 0.39022, nuclearSpin: { even: 1, odd: 0 }, absorbance: 0.8, ...RESOLUTION },
        { rotor: 'linear', band: 'perpendicular', bandOriginCm1: 667.4, bCm1: 0.39022, nuclearSpin: { even: 1, odd: 0 }, absorbance: 0.5, ...RESOLUTION },
      ],
      3,
    );
    const { processed, result } = identifyGas(scan);
    expect(processed.peaks.filter((p) => p.x > 2300 && p.x < 2400).length).toBeGreaterThanOrEqual(2);
    expect(processed.peaks.some((p) => Math.abs(p.x - 667.4) < 3)).toBe(true);
    expect(processed.flaggedPeaks.filter((p) => p.relativeHeight > 0.1)).toEqual([]);
    expect(result.reliable).toBe(true);
    expect(result.candidates[0]!.id).toBe('carbon-dioxide');
  });

  it('CO: the P/R pair about 2143 is read as one band and CO ranks first', () => {
    // CO band origin 2143.27, B0 1.92253 (Huber & Herzberg 1979, from memory; check values §4.2).
    const scan = gasScan([{ rotor: 'linear', band: 'parallel', bandOriginCm1: 2143.27, bCm1: 1.92253, absorbance: 0.6, ...RESOLUTION }], 5);
    const { result } = identifyGas(scan);
    expect(result.candidates[0]!.id).toBe('carbon-monoxide');
    expect(result.candidates[0]!.explained.some((e) => /branch maximum/.test(e.assignment))).toBe(true);
  });

  it('methane: ν3 3019 and ν4 1306 with P, Q and R branches rank methane first', () => {
    // ν3 3019, ν4 1306 (Shimanouchi 1972, from memory); B0 5.2412 (from memory, check values §4.2).
    // A spherical top's T2 band is modelled as a symmetric top with A = B (P, Q, R branches).
    const top = { rotor: 'symmetric-top', band: 'parallel', bCm1: 5.2412, axialCm1: 5.2412 } as const;
    const scan = gasScan(
      [
        { ...top, bandOriginCm1: 3019, absorbance: 0.7, ...RESOLUTION },
        { ...top, bandOriginCm1: 1306, absorbance: 0.45, ...RESOLUTION },
      ],
      7,
    );
    const { result } = identifyGas(scan);
    expect(result.candidates[0]!.id).toBe('methane');
  });
});
