import { describe, expect, it } from 'vitest';
import { gammaFormula } from './gammaFormula';

describe('gammaFormula', () => {
  it('writes counts before species and leaves out a count of one', () => {
    expect(gammaFormula([{ display: 'A1', count: 2 }, { display: 'E', count: 2 }])).toBe('2A1 + 2E');
    expect(gammaFormula([{ display: 'A1', count: 2 }, { display: 'B2', count: 1 }])).toBe('2A1 + B2');
  });

  it('keeps the display labels as given (primes, g/u)', () => {
    expect(gammaFormula([{ display: 'A1′', count: 1 }, { display: 'A2″', count: 1 }, { display: 'E′', count: 2 }])).toBe('A1′ + A2″ + 2E′');
  });

  it('drops species that do not occur and says 0 for a molecule without vibrations', () => {
    expect(gammaFormula([{ display: 'A2', count: 0 }, { display: 'T2', count: 2 }])).toBe('2T2');
    expect(gammaFormula([])).toBe('0');
  });
});
