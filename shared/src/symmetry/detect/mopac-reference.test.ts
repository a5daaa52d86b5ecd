/**
 * Γvib and IR activity from our engine (detection + the catalogue's analyseVibrations) against MOPAC's
 * labelled normal modes (fixtures/reference/mopac-modes.json, written by scripts/reference/mopac-modes.py).
 */
import { describe, expect, it } from 'vitest';
import { detectPointGroup } from './index.js';
import { analyseVibrations } from '../analyse.js';
import { parseXyz } from '../../structure/index.js';
import { fromPymatgen, readJson } from './__tests__/helpers.js';

interface Recorded {
  readonly tool: string;
  readonly molecules: readonly {
    name: string;
    xyz: string;
    pointGroup: string;
    modes: readonly { irrep: string; transitionDipole: number; irActive: boolean }[];
  }[];
}

const recorded = readJson<Recorded>('fixtures/reference/mopac-modes.json');

/**
 * Groups with two classes of vertical elements in which MOPAC names B1/B2 from the other class
 * than the usual tables (XeF4's out-of-plane mode B1u for B2u, benzene's 2B1g for 2B2g, BrF5's
 * 2B2 + B1 for 2B1 + B2); seen in the recorded output, as noted for D4h and D6h in the stack notes.
 */
const B_SWAPPED = new Set(['D4h', 'D6h', 'C4v', 'C6v']);

const LINEAR: Readonly<Record<string, Readonly<Record<string, string>>>> = {
  'C∞v': { Sig: 'Σ+', Pi: 'Π' },
  'D∞h': { Sig: 'Σg+', Siu: 'Σu+', Pig: 'Πg', Piu: 'Πu' },
};

/** MOPAC's label in the catalogue's spelling. */
function ourLabel(group: string, label: string): string {
  const linear = LINEAR[group]?.[label];
  if (linear) return linear;
  const primes = label.replace(/"/g, "''");
  return B_SWAPPED.has(group) ? primes.replace(/^B([12])/, (_, d: string) => `B${d === '1' ? 2 : 1}`) : primes;
}

describe(`Γvib and IR activity against ${recorded.tool}`, () => {
  it('covers at least 20 molecules', () => {
    expect(recorded.molecules.length).toBeGreaterThanOrEqual(20);
  });

  for (const m of recorded.molecules) {
    it(`${m.name} (${m.pointGroup})`, () => {
      const d = detectPointGroup(parseXyz(m.xyz), { symmetrise: true });
      expect(d.pointGroup).toBe(fromPymatgen(m.pointGroup));
      const analysis = analyseVibrations(d.pointGroup, d.oriented);
      const ours = new Map(analysis.vibrations.modes.map((v) => [v.label, v]));
      // MOPAC prints each degenerate set once: its mode count per label is our count n in n·Γ.
      const theirs = new Map<string, number>();
      for (const mode of m.modes) {
        const label = ourLabel(d.pointGroup, mode.irrep);
        theirs.set(label, (theirs.get(label) ?? 0) + 1);
        const species = ours.get(label);
        expect(species, `${mode.irrep} → ${label}`).toBeDefined();
        // Symmetry-forbidden modes have a transition dipole of exactly 0.0000 in MOPAC's output.
        expect(mode.irActive, `${label} IR`).toBe(species!.ir);
      }
      expect(Object.fromEntries(theirs)).toEqual(Object.fromEntries(analysis.vibrations.modes.map((v) => [v.label, v.count])));
    });
  }
});
