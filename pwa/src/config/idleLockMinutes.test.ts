import { describe, expect, it } from 'vitest';
import { DEFAULT_IDLE_LOCK_MINUTES, MAX_IDLE_LOCK_MINUTES, MIN_IDLE_LOCK_MINUTES, parseIdleLockMinutes } from './idleLockMinutes';

describe('parseIdleLockMinutes', () => {
  it('gives the default when unset or blank', () => {
    expect(parseIdleLockMinutes(undefined)).toBe(DEFAULT_IDLE_LOCK_MINUTES);
    expect(parseIdleLockMinutes(' ')).toBe(DEFAULT_IDLE_LOCK_MINUTES);
  });

  it('reads minutes within the bounds, the bounds included', () => {
    expect(parseIdleLockMinutes('5')).toBe(5);
    expect(parseIdleLockMinutes(String(MIN_IDLE_LOCK_MINUTES))).toBe(MIN_IDLE_LOCK_MINUTES);
    expect(parseIdleLockMinutes(String(MAX_IDLE_LOCK_MINUTES))).toBe(MAX_IDLE_LOCK_MINUTES);
  });

  it.each(['0', '0.5', '-1', '61', 'ten', 'Infinity', '5m'])('refuses %s with an error naming the setting', (raw) => {
    expect(() => parseIdleLockMinutes(raw)).toThrow(RangeError);
    expect(() => parseIdleLockMinutes(raw)).toThrow(/VITE_IDLE_LOCK_MINUTES/);
  });
});
