/** Phase-appropriate band values and broad-band windows in the expected bands. */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import { compoundBands } from '../expected-bands.js';

const byId = (id: string) => loadLibrary().compounds.find((c) => c.id === id)!;

describe('expected bands', () => {
  it('take gas values for a gas cell and liquid values for a condensed scan', () => {
    // Acetonitrile C≡N stretch: 2267 gas, 2253 liquid (Shimanouchi 1972, project check values §2.2).
    const gas = compoundBands(byId('acetonitrile'), 'raman', 'gas', engineAnalyser, 0.25).expected.map((b) => b.cm1);
    const liquid = compoundBands(byId('acetonitrile'), 'raman', 'condensed', engineAnalyser, 0.25).expected.map((b) => b.cm1);
    expect(gas).toContain(2267);
    expect(gas).not.toContain(2253);
    expect(liquid).toContain(2253);
    expect(liquid).not.toContain(2267);
  });

  it('fall back to the only tabulated phase', () => {
    // Methane is tabulated for the gas only (ν1 2917, Shimanouchi 1972).
    expect(compoundBands(byId('methane'), 'raman', 'condensed', engineAnalyser, 0.25).expected.map((b) => b.cm1)).toContain(2917);
  });

  it('give broad hydrogen-bonded bands a window of a quarter of their width', () => {
    const water = compoundBands(byId('water'), 'ir', 'condensed', engineAnalyser, 0.25).expected;
    expect(water.find((b) => b.mode === 'ν3')!.halfWidthCm1).toBe(100);
    expect(water.find((b) => b.mode === 'ν2')!.halfWidthCm1).toBe(20);
  });
});
