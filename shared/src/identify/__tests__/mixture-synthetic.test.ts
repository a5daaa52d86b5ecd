/**
 * Mixtures on invented synthetic scans (seeded): two library compounds in random proportions,
 * processed by processScan and ranked; both must appear as the mixture's components in ≥ 80 %
 * of the cases.
 */
import { describe, expect, it } from 'vitest';
import { engineAnalyser } from '../../library/engine-analyser.js';
import { loadLibrary } from '../../library/load.js';
import type { Technique } from '../../spectrum/types.js';
import { BROAD_BAND_WINDOW_FRACTION } from '../constants.js';
import { compoundBands, type CompoundBands } from '../expected-bands.js';
import { identifySpectrum } from '../identify-spectrum.js';
import { seededRandom, syntheticSpectrum } from './synthetic.js';

const library = loadLibrary();
const CASES = 60;

/** Bands of condensed-phase compounds with at least three strong-or-medium bands (a mixture needs evidence of each part). */
function usable(technique: Technique): { id: string; bands: CompoundBands }[] {
  return library.compounds
    .filter((c) => c.phases[0] !== 'gas')
    .map((c) => ({ id: c.id, bands: compoundBands(c, technique, 'condensed', engineAnalyser, BROAD_BAND_WINDOW_FRACTION) }))
    .filter((x) => x.bands.expected.filter((b) => b.weight >= 0.4 && b.halfWidthCm1 === 0).length >= 3);
}

describe('mixtures of two compounds through processScan', () => {
  for (const [technique, seed] of [['ir', 5], ['raman', 7]] as const) {
    it(`recovers both components in ≥ 80 % of ${CASES} ${technique} cases`, () => {
      const random = seededRandom(seed);
      const pool = usable(technique);
      let recovered = 0;
      const misses: string[] = [];
      for (let k = 0; k < CASES; k++) {
        const a = pool[Math.floor(random() * pool.length)]!;
        let b = a;
        while (b.id === a.id) b = pool[Math.floor(random() * pool.length)]!;
        const share = 0.35 + 0.3 * random();
        const spectrum = syntheticSpectrum([{ bands: a.bands, amount: share }, { bands: b.bands, amount: 1 - share }], { technique, phase: 'condensed' }, random);
        const { result } = identifySpectrum(spectrum, { process: { technique, phase: 'condensed' } });
        const ids = result.mixture?.components.map((c) => c.id) ?? [];
        if (ids.includes(a.id) && ids.includes(b.id)) recovered++;
        else misses.push(`${a.id}+${b.id} → ${ids.join('+') || result.candidates[0]?.id}`);
      }
      console.log(`${technique}: mixture recovered in ${recovered}/${CASES}; misses: ${misses.join(', ')}`);
      expect(recovered / CASES).toBeGreaterThanOrEqual(0.8);
    }, 180_000);
  }
});
