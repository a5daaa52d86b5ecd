import { describe, expect, it } from 'vitest';
import { DEFAULT_OFFLINE_SESSION_HOURS, parseOfflineSessionHours } from './offlineSessionHours';

describe('parseOfflineSessionHours', () => {
  it('gives the default when unset or blank', () => {
    expect(parseOfflineSessionHours(undefined)).toBe(DEFAULT_OFFLINE_SESSION_HOURS);
    expect(parseOfflineSessionHours('  ')).toBe(DEFAULT_OFFLINE_SESSION_HOURS);
  });

  it('reads whole and fractional hours', () => {
    expect(parseOfflineSessionHours('24')).toBe(24);
    expect(parseOfflineSessionHours('0.25')).toBe(0.25);
  });

  it.each(['0', '-3', 'three days', 'Infinity', '12h'])('refuses %s with an error naming the setting', (raw) => {
    expect(() => parseOfflineSessionHours(raw)).toThrow(RangeError);
    expect(() => parseOfflineSessionHours(raw)).toThrow(/VITE_OFFLINE_SESSION_HOURS/);
  });
});
