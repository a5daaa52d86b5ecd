import { describe, expect, it } from 'vitest';
import { slugOf } from './slugOf';
import { casStatus } from './casStatus';

describe('slugOf', () => {
  it('lower-cases, drops accents and joins words with single hyphens', () => {
    expect(slugOf('  Nitrate d’ammonium (Prills) ')).toBe('nitrate-d-ammonium-prills');
    expect(slugOf('Éthanol 96 %')).toBe('ethanol-96');
    expect(slugOf('1,1,1-Trichloroethane')).toBe('1-1-1-trichloroethane');
  });

  it('gives an empty id for a name without letters or digits', () => {
    expect(slugOf('—')).toBe('');
  });
});

describe('casStatus', () => {
  it('checks the check digit once the text has the CAS RN shape', () => {
    // Chlorine 7782-50-5 (CAS registry, from memory); 1234-56-6 worked by hand: 6+10+12+12+10+6 = 56.
    expect(casStatus('7782-50-5')).toBe('valid');
    expect(casStatus(' 1234-56-6 ')).toBe('valid');
    expect(casStatus('7782-50-4')).toBe('bad-check-digit');
  });

  it('tells an unfinished or misshapen number from an empty field', () => {
    expect(casStatus('')).toBe('empty');
    expect(casStatus('7782-5')).toBe('malformed');
    expect(casStatus('7782505')).toBe('malformed');
  });
});
