/**
 * Raman activity from our engine against NWChem's HF/STO-3G Raman activities per normal mode
 * (fixtures/reference/nwchem-raman.json, written by scripts/reference/nwchem-raman.py).
 */
import { describe, expect, it } from 'vitest';
import { detectPointGroup } from './index.js';
import { analyseVibrations } from '../analyse.js';
import { parseXyz } from '../../structure/index.js';
import { readJson } from './__tests__/helpers.js';

interface Recorded {
  readonly tool: string;
  readonly thresholds: { readonly inactiveAtMost: number };
  readonly molecules: readonly { name: string; xyz: string; modes: readonly { frequencyCm1: number; ramanActivity: number }[] }[];
}

const recorded = readJson<Recorded>('fixtures/reference/nwchem-raman.json');

/**
 * NWChem reports linear molecules in D4h/C4v and labels no modes, so the comparison is by counts:
 * modes with activity at most 2e-6 Å⁴/amu are symmetry-forbidden, all others allowed. Allowed modes
 * can be weak at this level (BF3's upper E′ pair 3.6e-5), but the forbidden ones stay below 6e-7.
 */
describe(`Raman activity against ${recorded.tool}`, () => {
  it('covers at least 5 molecules', () => {
    expect(recorded.molecules.length).toBeGreaterThanOrEqual(5);
  });

  for (const m of recorded.molecules) {
    it(m.name, () => {
      const d = detectPointGroup(parseXyz(m.xyz), { symmetrise: true });
      const analysis = analyseVibrations(d.pointGroup, d.oriented);
      const allowed = analysis.vibrations.modes.filter((v) => v.raman).reduce((s, v) => s + v.count * v.degeneracy, 0);
      const all = analysis.vibrations.modes.reduce((s, v) => s + v.count * v.degeneracy, 0);
      expect(m.modes).toHaveLength(all);
      const active = m.modes.filter((x) => x.ramanActivity > recorded.thresholds.inactiveAtMost).length;
      expect(active).toBe(allowed);
    });
  }
});
