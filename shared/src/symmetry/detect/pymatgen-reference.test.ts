/**
 * Our detection against pymatgen's PointGroupAnalyzer, recorded in fixtures/reference/pymatgen-pointgroups.json
 * by scripts/reference/pymatgen-pointgroups.py (ASE's 148 G2 molecules with two or more atoms, plus our fixtures).
 */
import { describe, expect, it } from 'vitest';
import { detectPointGroup } from './index.js';
import { parseXyz } from '../../structure/index.js';
import { displaced, fromPymatgen, readJson, seededRandom } from './__tests__/helpers.js';

interface Recorded {
  readonly tool: string;
  readonly counts: { readonly g2Taken: number; readonly fixtures: number };
  readonly molecules: readonly { source: string; name: string; xyz: string; pymatgen: string; operations: number; expectedOrder: number | null }[];
}

const recorded = readJson<Recorded>('fixtures/reference/pymatgen-pointgroups.json');

/**
 * Where pymatgen's answer is not the molecule's group, with the second opinion that says so.
 * - N2H4: pymatgen names D2 but its own operation list has 2 members, the order of C2 (the order
 *   check); the gauche hydrazine of G2 is C2 in the literature (from memory).
 * - S4, S6, S8 frameworks: pymatgen names the group right but lists half the operations (only the
 *   rotations); we agree on the name, so they pass the comparison below and fail only the order check.
 */
const PYMATGEN_WRONG: Readonly<Record<string, string>> = { N2H4: 'C2' };

/**
 * Where the two tools differ by method, not by error: G2's CH3S and CH3O radicals are Jahn–Teller
 * distorted from C3v by less than 0.1 Å, so our default tolerance calls them C3v while pymatgen's
 * eigenvalue test (relative 0.001 on the moments) calls them Cs; at 0.03 Å we give Cs too.
 */
const NEAR_SYMMETRIC: Readonly<Record<string, number>> = { CH3S: 0.03, CH3O: 0.03 };

describe(`point groups against ${recorded.tool}`, () => {
  it('holds all 148 G2 molecules with two or more atoms and the fixtures', () => {
    expect(recorded.counts.g2Taken).toBe(148);
    expect(recorded.counts.fixtures).toBeGreaterThanOrEqual(20);
  });

  for (const m of recorded.molecules) {
    it(`${m.source} ${m.name}: ${m.pymatgen}`, () => {
      const tolerance = NEAR_SYMMETRIC[m.name];
      const ours = detectPointGroup(parseXyz(m.xyz), tolerance ? { tolerance } : {});
      const wrong = PYMATGEN_WRONG[m.name];
      if (wrong) {
        expect(m.operations).not.toBe(m.expectedOrder); // pymatgen's own order check fails
        expect(ours.pointGroup).toBe(wrong);
        expect(ours.order).toBe(m.operations);
        return;
      }
      expect(ours.pointGroup).toBe(fromPymatgen(m.pymatgen));
      if (m.expectedOrder !== null) expect(ours.order).toBe(m.expectedOrder);
    });
  }

  it('calls the distorted radicals C3v at the default tolerance', () => {
    for (const name of Object.keys(NEAR_SYMMETRIC)) {
      const m = recorded.molecules.find((x) => x.name === name)!;
      expect(detectPointGroup(parseXyz(m.xyz)).pointGroup).toBe('C3v');
    }
  });
});

describe('noisy copies of the G2 molecules', () => {
  // Molecules already within 0.03 Å of their group take 0.02 Å noise without leaving the 0.1 Å default.
  const random = seededRandom(2024);
  for (const m of recorded.molecules.filter((x) => x.source === 'ase-g2')) {
    const ideal = detectPointGroup(parseXyz(m.xyz));
    if (ideal.maxDeviation > 0.03) continue;
    it(`${m.name} stays ${ideal.pointGroup}`, () => {
      for (let k = 0; k < 3; k++) expect(detectPointGroup(displaced(parseXyz(m.xyz), 0.02, random)).pointGroup).toBe(ideal.pointGroup);
    });
  }
});
