import { describe, expect, it } from 'vitest';
import { loadLibrary } from './load.js';
import type { Compound } from './types.js';
import { geometryProblems } from './geometry-check.js';

const bundled = (id: string): Compound => loadLibrary().compounds.find((c) => c.id === id)!;
const withFundamentals = (c: Compound, fundamentals: Compound['fundamentals']): Compound => ({ ...c, fundamentals });

describe('geometryProblems: a compound against the symmetry engine', () => {
  it('accepts the bundled molecules as they are', () => {
    for (const id of ['ammonia', 'boron-trifluoride', 'carbon-dioxide', 'water', 'benzene']) expect([id, geometryProblems(bundled(id))]).toEqual([id, []]);
  });

  it('accepts an entry without a geometry (bands only)', () => {
    expect(geometryProblems(bundled('polystyrene'))).toEqual([]);
  });

  it('names the species whose count differs from Γvib (ammonia, C3v: 2A1 + 2E)', () => {
    const ammonia = bundled('ammonia');
    const problems = geometryProblems(withFundamentals(ammonia, ammonia.fundamentals!.slice(0, 3)));
    expect(problems).toEqual(['fundamentals: Γvib of C3v has 2 E, the entry lists 1']);
  });

  it('refuses a label the group does not have, and one of the group without fundamentals', () => {
    const ammonia = bundled('ammonia');
    const [v1, v2, v3, v4] = ammonia.fundamentals!;
    const problems = geometryProblems(withFundamentals(ammonia, [v1!, { ...v2!, label: 'B1' }, v3!, { ...v4!, label: 'A2' }]));
    expect(problems).toEqual([
      expect.stringMatching(/^fundamentals\[1\] \(ν2\): "B1" is not an irrep of C3v \(its irreps: A1, A2, E\)$/),
      'fundamentals[3] (ν4): A2 has no fundamentals in Γvib of C3v',
      'fundamentals: Γvib of C3v has 2 A1, the entry lists 1',
      'fundamentals: Γvib of C3v has 2 E, the entry lists 1',
    ]);
  });

  it('refuses an intensity in a technique where the engine forbids the species (CO2, mutual exclusion in D∞h)', () => {
    const co2 = bundled('carbon-dioxide');
    const [v1, v2, v3] = co2.fundamentals!;
    const problems = geometryProblems(withFundamentals(co2, [{ ...v1!, ir: 's' }, { ...v2!, raman: 'w' }, v3!]));
    expect(problems).toEqual([
      'fundamentals[0] (ν1): gives an IR intensity, but Σg+ is IR-inactive in D∞h',
      'fundamentals[1] (ν2): gives a Raman intensity, but Πu is Raman-inactive in D∞h',
    ]);
  });

  it('refuses a labelled band that is inactive in its technique or not a species', () => {
    const co2 = bundled('carbon-dioxide');
    const [b1, b2] = co2.bands!;
    const problems = geometryProblems({ ...co2, bands: [{ ...b1!, technique: 'ir' }, { ...b2!, label: 'Δg' }] });
    expect(problems).toEqual(['bands[0] (ir 1285.41 cm⁻¹): Σg+ is IR-inactive in D∞h', 'bands[1] (raman 1388.18 cm⁻¹): "Δg" is not a vibrational species of D∞h']);
  });

  it('reports an unreadable geometry with the reader’s line', () => {
    const ammonia = bundled('ammonia');
    const problems = geometryProblems({ ...ammonia, geometry: { ...ammonia.geometry!, xyz: '4\nammonia\nN 0 0 0\nH 0.9375 0 x\n' } });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^geometry: line 4: /);
  });
});
