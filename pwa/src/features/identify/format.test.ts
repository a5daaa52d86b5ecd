import { describe, expect, it } from 'vitest';
import { formatAgreement, formatCm1, formatOffsetCm1, formatShare } from './format';

describe('identification formats', () => {
  it('writes wavenumbers without thousands separators in every language', () => {
    expect(formatCm1(3060, 'en')).toBe('3060');
    expect(formatCm1(2849.5, 'en', 1)).toBe('2849.5');
    expect(formatCm1(2849.5, 'de', 1)).toBe('2849,5');
  });

  it('signs every offset except one that rounds to zero', () => {
    expect(formatOffsetCm1(0.4, 'en')).toBe('+0.4');
    expect(formatOffsetCm1(-1.25, 'en', 2)).toBe('-1.25');
    expect(formatOffsetCm1(-0.04, 'en')).toBe('0.0');
  });

  it('writes shares as whole percentages and band agreement with two decimals', () => {
    expect(formatShare(0.456, 'en')).toBe('46%');
    expect(formatAgreement(0.948, 'en')).toBe('0.95');
    expect(formatAgreement(1, 'en')).toBe('1.00');
  });
});
