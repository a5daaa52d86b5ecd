/** Full-spectrum correlation where the library holds a reference spectrum (invented demo references). */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import type { Compound, ReferenceSpectrum } from '../../library/types.js';
import { processScan } from '../../spectrum/process-scan.js';
import { compoundBands } from '../expected-bands.js';
import { identifyScan } from '../identify-scan.js';
import { spectrumCorrelation } from '../correlation.js';
import { seededRandom, syntheticSpectrum } from './synthetic.js';

const base = loadLibrary();
const invented = { ref: 'siteband-demo', basis: 'invented' } as const;

function reference(c: Compound, seed: number): ReferenceSpectrum {
  const bands = compoundBands(c, 'raman', 'condensed', engineAnalyser, 0.25);
  const s = processScan(syntheticSpectrum([{ bands, amount: 1 }], { technique: 'raman', phase: 'condensed', dropWeak: 0 }, seededRandom(seed)), { technique: 'raman', phase: 'condensed' }).spectrum;
  return { technique: 'raman', phase: 'liquid', xCm1: Array.from(s.xCm1), y: Array.from(s.y), source: invented };
}

describe('full-spectrum correlation', () => {
  const toluene = base.compounds.find((c) => c.id === 'toluene')!;
  const polystyrene = base.compounds.find((c) => c.id === 'polystyrene')!;
  const library = {
    ...base,
    compounds: base.compounds.map((c) => (c === toluene || c === polystyrene ? { ...c, referenceSpectra: [reference(c, c === toluene ? 1 : 2)] } : c)),
  };
  const scan = processScan(syntheticSpectrum([{ bands: compoundBands(toluene, 'raman', 'condensed', engineAnalyser, 0.25), amount: 1 }], { technique: 'raman', phase: 'condensed' }, seededRandom(3)), {
    technique: 'raman',
    phase: 'condensed',
  });

  it('is high for the compound whose reference matches and lower for a look-alike', () => {
    const r = identifyScan({ technique: 'raman', phase: 'condensed', peaks: scan.peaks, spectrum: scan.spectrum }, { library });
    const tol = r.candidates.find((c) => c.id === 'toluene')!.parts.spectrumCorrelation!;
    const ps = r.candidates.find((c) => c.id === 'polystyrene')!.parts.spectrumCorrelation!;
    expect(tol).toBeGreaterThan(0.9);
    expect(ps).toBeLessThan(tol);
    expect(r.candidates[0]!.id).toBe('toluene');
  });

  it('is absent without a scan spectrum or without a reference', () => {
    const r = identifyScan({ technique: 'raman', phase: 'condensed', peaks: scan.peaks }, { library });
    expect(r.candidates.every((c) => c.parts.spectrumCorrelation === null)).toBe(true);
  });

  it('needs an overlap of at least 20 points', () => {
    const ref: ReferenceSpectrum = { technique: 'raman', phase: 'liquid', xCm1: [10, 11, 12, 13, 14, 15, 16, 17, 18, 19].map((x) => x + 4000), y: [0, 1, 0, 1, 0, 1, 0, 1, 0, 1], source: invented };
    expect(spectrumCorrelation(scan.spectrum, ref)).toBeNull();
  });
});
