/**
 * Ranking on invented synthetic scans (seeded): full spectra built from the library's expected
 * bands with noise, sloping baselines, ±3 cm⁻¹ shifts and dropped weak bands, processed by the
 * pipeline's processScan, then ranked. The true compound must rank first in ≥ 95 % of 200 cases
 * per technique.
 */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import type { Compound } from '../../library/types.js';
import type { Phase, Technique } from '../../spectrum/types.js';
import { compoundBands } from '../expected-bands.js';
import { BROAD_BAND_WINDOW_FRACTION } from '../constants.js';
import { identifySpectrum } from '../identify-spectrum.js';
import { seededRandom, syntheticSpectrum } from './synthetic.js';

const library = loadLibrary();
const CASES = 200;

/** The phase a field team would scan the compound in: its first listed phase. */
function naturalPhase(c: Compound): Phase {
  return c.phases[0] === 'gas' ? 'gas' : 'condensed';
}

function run(technique: Technique, seed: number) {
  const random = seededRandom(seed);
  const usable = library.compounds.filter((c) => compoundBands(c, technique, naturalPhase(c), engineAnalyser, BROAD_BAND_WINDOW_FRACTION).expected.length > 0);
  const failures: string[] = [];
  let mixtures = 0;
  for (let k = 0; k < CASES; k++) {
    const c = usable[k % usable.length]!;
    const phase = naturalPhase(c);
    const bands = compoundBands(c, technique, phase, engineAnalyser, BROAD_BAND_WINDOW_FRACTION);
    const spectrum = syntheticSpectrum([{ bands, amount: 1 }], { technique, phase }, random);
    const { result } = identifySpectrum(spectrum, { process: { technique, phase } });
    const top = result.candidates[0]?.id ?? '(none)';
    if (result.mixture !== null) mixtures++;
    if (top !== c.id) failures.push(`${c.id} → ${top}`);
  }
  return { failures, rate: 1 - failures.length / CASES, mixtureRate: mixtures / CASES };
}

describe('ranking of synthetic single-compound scans through processScan', () => {
  for (const [technique, seed] of [['ir', 11], ['raman', 29]] as const) {
    it(`ranks the true compound first in ≥ 95 % of ${CASES} ${technique} cases`, () => {
      const { failures, rate, mixtureRate } = run(technique, seed);
      console.log(`${technique}: true compound first in ${(rate * 100).toFixed(1)} % of ${CASES}; misses: ${failures.join(', ') || 'none'}; mixture reported for ${(mixtureRate * 100).toFixed(1)} % of these single-compound scans`);
      expect(rate).toBeGreaterThanOrEqual(0.95);
      // A single compound should rarely read as a mixture (MIXTURE_MIN_GAIN guards this).
      expect(mixtureRate).toBeLessThanOrEqual(0.05);
    }, 180_000);
  }
});
