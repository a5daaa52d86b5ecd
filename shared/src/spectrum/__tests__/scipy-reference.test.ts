/**
 * Cross-check of our smoothing and peak picking against scipy.signal: the committed reference
 * (fixtures/reference/scipy-signals.json, written by scripts/reference/scipy-signals.py) and a
 * live run of scipy on a fresh signal when Debian's python3-scipy is installed.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { pickPeaks } from '../peaks.js';
import { smoothSavitzkyGolay } from '../smooth.js';
import { fixtureText } from './fixtures.js';
import { seededGaussian } from './synthetic.js';

interface ScipyResult {
  smoothed: number[];
  indices: number[];
  heights: number[];
  prominences: number[];
  widthsPoints: number[];
}
interface ScipySignal extends ScipyResult {
  name: string;
  x0: number;
  step: number;
  y: number[];
  window: number;
  polynomial: number;
  threshold: number;
}

const reference = JSON.parse(fixtureText('reference/scipy-signals.json')) as { scipyVersion: string; signals: ScipySignal[] };

/** Our smoothing and peaks on a signal, checked against scipy's answer for it. */
function compare(x: Float64Array, y: ArrayLike<number>, window: number, polynomial: number, threshold: number, scipy: ScipyResult) {
  const smoothed = smoothSavitzkyGolay(y, { windowSize: window, polynomial });
  const scale = Math.max(...scipy.smoothed.map(Math.abs));
  let worstSmooth = 0;
  smoothed.forEach((v, i) => (worstSmooth = Math.max(worstSmooth, Math.abs(v - scipy.smoothed[i]) / scale)));
  expect(worstSmooth).toBeLessThan(1e-6);

  // Same rule as scipy's call: height and prominence above the threshold (5 σ × σ = threshold).
  const peaks = pickPeaks(x, smoothed, { noiseSigma: threshold / 5, thresholdSigma: 5 });
  const step = x[1] - x[0];
  expect(peaks.map((p) => Math.round((p.x - x[0]) / step))).toEqual(scipy.indices);
  let worstX = 0;
  peaks.forEach((p, k) => {
    worstX = Math.max(worstX, Math.abs(p.x - x[scipy.indices[k]]));
    // scipy measures width at half the prominence; where a peak stands alone that is half its height.
    if (scipy.prominences[k] > 0.97 * scipy.heights[k]) {
      const scipyWidth = scipy.widthsPoints[k] * step;
      expect(Math.abs(p.widthCm1 - scipyWidth)).toBeLessThan(Math.max(0.5, 0.05 * scipyWidth));
    }
  });
  expect(worstX).toBeLessThanOrEqual(0.5);
  return { worstSmooth, worstX };
}

describe(`scipy ${reference.scipyVersion} reference signals (synthetic)`, () => {
  it.each(reference.signals.map((s) => [s.name, s] as const))('%s: smoothing within 1e-6, peaks within 0.5 cm⁻¹', (_, s) => {
    const x = Float64Array.from(s.y, (_, i) => s.x0 + i * s.step);
    compare(x, s.y, s.window, s.polynomial, s.threshold, s);
  });
});

const python = '/usr/bin/python3';
const scipyAvailable = spawnSync(python, ['-c', 'import scipy'], { timeout: 20000 }).status === 0;

describe.runIf(scipyAvailable)('live scipy run', () => {
  it('agrees with scipy on a fresh seeded signal', () => {
    const noise = seededGaussian(99);
    const x = Float64Array.from({ length: 1500 }, (_, i) => 400 + i * 0.8);
    const y = Array.from(x, (v) => 2 / (1 + ((v - 700) / 4) ** 2) + 1 / (1 + ((v - 1234.5) / 6) ** 2) + 0.6 / (1 + ((v - 1250) / 5) ** 2) + 0.02 * noise());
    const script = fileURLToPath(new URL('../../../../scripts/reference/scipy-signals.py', import.meta.url));
    const run = spawnSync(python, [script, '--stdin'], {
      input: JSON.stringify({ y, window: 11, polynomial: 3, threshold: 0.15 }),
      encoding: 'utf8',
      timeout: 60000,
    });
    expect(run.status, run.stderr).toBe(0);
    const scipy = JSON.parse(run.stdout) as ScipyResult;
    expect(scipy.indices.length).toBe(3);
    compare(x, y, 11, 3, 0.15, scipy);
  });
});
