import { describe, expect, it } from 'vitest';
import { AxisOrderError, isUniform, medianSpacing, resampleUniform, xyAscending } from '../axis.js';

describe('xyAscending', () => {
  it('reverses a descending axis with its y values', () => {
    const { x, y } = xyAscending([4000, 3000, 2000], [1, 2, 3]);
    expect(Array.from(x)).toEqual([2000, 3000, 4000]);
    expect(Array.from(y)).toEqual([3, 2, 1]);
  });

  it('sorts a shuffled axis and keeps each y with its x', () => {
    const { x, y } = xyAscending([3, 1, 2, 5, 4], [30, 10, 20, 50, 40]);
    expect(Array.from(x)).toEqual([1, 2, 3, 4, 5]);
    expect(Array.from(y)).toEqual([10, 20, 30, 40, 50]);
  });

  it('refuses repeated x values, which no sorting can fix', () => {
    expect(() => xyAscending([1, 2, 2, 3], [0, 0, 0, 0])).toThrow(AxisOrderError);
  });
});

describe('resampleUniform', () => {
  it('reproduces a straight line exactly on the new grid (linear interpolation)', () => {
    const x = [400, 401.3, 402.1, 404.9, 406, 410];
    const y = x.map((v) => 2 * v - 7);
    const out = resampleUniform(x, y, { stepCm1: 0.5 });
    expect(out.x[0]).toBe(400);
    expect(out.x.length).toBe(21);
    out.x.forEach((xi, i) => expect(out.y[i]).toBeCloseTo(2 * xi - 7, 9));
    expect(isUniform(out.x)).toBe(true);
  });

  it('uses the median spacing when no step is given', () => {
    expect(medianSpacing([0, 1, 2, 3, 10])).toBe(1);
    expect(resampleUniform([0, 1, 2, 3, 10], [0, 1, 2, 3, 10]).x.length).toBe(11);
  });

  it('rejects a non-positive step', () => {
    expect(() => resampleUniform([0, 1, 2], [0, 1, 2], { stepCm1: 0 })).toThrow(RangeError);
  });
});
