import { describe, expect, it } from 'vitest';
import { isValidCas } from './cas.js';

describe('isValidCas', () => {
  // Check digits worked by hand with the CAS rule: water 7732-18-5: 8·1+1·2+2·3+3·4+7·5+7·6 = 105 → 5.
  it('accepts numbers whose check digit fits', () => {
    expect(isValidCas('7732-18-5')).toBe(true);
    expect(isValidCas('64-17-5')).toBe(true); // ethanol: 7·1+1·2+4·3+6·4 = 45 → 5
    expect(isValidCas('10102-44-0')).toBe(true); // nitrogen dioxide: 4·1+4·2+2·3+0·4+1·5+0·6+1·7 = 30 → 0
  });
  it('rejects a wrong check digit', () => {
    expect(isValidCas('7732-18-4')).toBe(false);
    expect(isValidCas('64-17-6')).toBe(false);
  });
  it('rejects malformed numbers', () => {
    for (const bad of ['7732185', '7732-18', '7-18-5', '12345678-12-3', '7732-1a-5', ' 7732-18-5']) expect(isValidCas(bad)).toBe(false);
  });
});
