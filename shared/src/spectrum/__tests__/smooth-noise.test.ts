import { describe, expect, it } from 'vitest';
import { noiseSigma } from '../noise.js';
import { smoothingNoiseGain, smoothSavitzkyGolay } from '../smooth.js';
import { seededGaussian } from './synthetic.js';

describe('smoothSavitzkyGolay', () => {
  it('leaves a cubic unchanged everywhere, edges included (polynomial order 3)', () => {
    const y = Array.from({ length: 40 }, (_, i) => 0.01 * i ** 3 - 0.3 * i ** 2 + 2 * i - 5);
    const out = smoothSavitzkyGolay(y, { windowSize: 9, polynomial: 3 });
    out.forEach((v, i) => expect(v).toBeCloseTo(y[i], 8));
  });

  it('reduces white noise by the filter gain it reports', () => {
    const g = seededGaussian(7);
    const y = Array.from({ length: 20000 }, () => g());
    const out = smoothSavitzkyGolay(y, { windowSize: 11, polynomial: 2 });
    let sumSq = 0;
    for (let i = 100; i < out.length - 100; i++) sumSq += out[i] ** 2;
    const sd = Math.sqrt(sumSq / (out.length - 200));
    expect(sd).toBeCloseTo(smoothingNoiseGain({ windowSize: 11, polynomial: 2 }), 1);
    expect(smoothingNoiseGain({ windowSize: 11, polynomial: 2 })).toBeLessThan(0.6);
  });

  it('rejects even windows, windows longer than the data and impossible orders', () => {
    expect(() => smoothSavitzkyGolay(new Float64Array(50), { windowSize: 8 })).toThrow(/odd/);
    expect(() => smoothSavitzkyGolay(new Float64Array(5), { windowSize: 9 })).toThrow(/at least 9/);
    expect(() => smoothSavitzkyGolay(new Float64Array(50), { windowSize: 5, polynomial: 5 })).toThrow(/polynomial/);
  });
});

describe('noiseSigma', () => {
  it('recovers the σ of seeded Gaussian noise within 5 % despite tall bands', () => {
    const g = seededGaussian(3);
    const y = Array.from({ length: 4000 }, (_, i) => 0.02 * g() + 5 / (1 + ((i - 2000) / 8) ** 2) + 0.001 * i);
    expect(noiseSigma(y)).toBeGreaterThan(0.019);
    expect(noiseSigma(y)).toBeLessThan(0.021);
  });
});
