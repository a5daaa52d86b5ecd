import { describe, expect, it } from 'vitest';
import { fitWithin } from '../photos/compressPhoto';
import { storageIsLow } from './useStorageEstimate';

const MB = 1024 * 1024;

describe('storageIsLow', () => {
  it('warns under 200 MB free or under 10 % of the quota', () => {
    expect(storageIsLow({ usedBytes: 100 * MB, quotaBytes: 10_000 * MB })).toBe(false);
    expect(storageIsLow({ usedBytes: 9_850 * MB, quotaBytes: 10_000 * MB })).toBe(true);
    expect(storageIsLow({ usedBytes: 1_000 * MB, quotaBytes: 50_000 * MB })).toBe(false);
    expect(storageIsLow({ usedBytes: 46_000 * MB, quotaBytes: 50_000 * MB })).toBe(true);
  });
});

describe('fitWithin', () => {
  it('shrinks the longer edge to 1600 px and never enlarges', () => {
    expect(fitWithin(4000, 3000)).toEqual({ width: 1600, height: 1200 });
    expect(fitWithin(3000, 4000)).toEqual({ width: 1200, height: 1600 });
    expect(fitWithin(800, 600)).toEqual({ width: 800, height: 600 });
    expect(() => fitWithin(0, 600)).toThrow(RangeError);
  });
});
