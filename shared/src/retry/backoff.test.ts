import { describe, expect, it } from 'vitest';
import { backoffDelayMs } from './backoff.js';

describe('backoffDelayMs', () => {
  it('doubles from the base up to the ceiling, half of it fixed and half random', () => {
    expect(backoffDelayMs(1, { random: () => 0 })).toBe(1000);
    expect(backoffDelayMs(3, { random: () => 0.999999 })).toBe(8000);
    expect(backoffDelayMs(30, { random: () => 0 })).toBe(150_000);
    expect(backoffDelayMs(2, { baseMs: 10, maxMs: 15, random: () => 0.5 })).toBe(11);
  });

  it('refuses a failure count that is not a positive integer', () => {
    expect(() => backoffDelayMs(0)).toThrow(RangeError);
    expect(() => backoffDelayMs(1.5)).toThrow(RangeError);
  });
});
