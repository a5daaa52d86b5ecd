/** The mixture search on hand-made peak lists. */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import type { Peak } from '../../spectrum/types.js';
import { compoundBands } from '../expected-bands.js';
import { identifyScan } from '../identify-scan.js';

const byId = (id: string) => loadLibrary().compounds.find((c) => c.id === id)!;
const peaksOf = (id: string, amount: number): Peak[] =>
  compoundBands(byId(id), 'raman', 'condensed', engineAnalyser, 0.25).expected.map((b) => ({ x: b.cm1, height: amount * b.weight, widthCm1: 10, relativeHeight: 0 }));

describe('mixture', () => {
  it('finds toluene with acetonitrile and gives the larger share to the larger amount', () => {
    // Invented scan: library Raman bands of toluene (ASTM E1840) ×0.7 and acetonitrile (Shimanouchi 1972) ×0.3.
    const r = identifyScan({ technique: 'raman', phase: 'condensed', peaks: [...peaksOf('toluene', 0.7), ...peaksOf('acetonitrile', 0.3)] });
    expect(r.mixture).not.toBeNull();
    const share = Object.fromEntries(r.mixture!.components.map((c) => [c.id, c.share]));
    expect(Object.keys(share).sort()).toEqual(['acetonitrile', 'toluene']);
    expect(share.toluene!).toBeGreaterThan(share.acetonitrile!);
    expect(r.mixture!.explainedShare - r.mixture!.bestSingleShare).toBeGreaterThanOrEqual(r.mixture!.minGain);
    expect(r.cautions.some((c) => /mixture/.test(c))).toBe(true);
  });

  it('reports no mixture for one compound', () => {
    expect(identifyScan({ technique: 'raman', phase: 'condensed', peaks: peaksOf('toluene', 1) }).mixture).toBeNull();
  });
});
