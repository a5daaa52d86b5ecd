/**
 * Bond-stretch representations and symmetry-adapted combinations. Expected Γstretch: Cotton, Chemical
 * Applications of Group Theory, 3rd ed. (from memory); benzene ring and C–H stretch species as in
 * REFERENCES.md §2.2 (a1g 3062/993, b1u 3068, b2u 1309, e1u 3063/1486, e2g 3047/1596).
 */
import { describe, expect, it } from 'vitest';
import { analyseVibrations } from './analyse.js';
import { deriveBonds } from './bonds.js';
import { MOLECULES } from './__tests__/molecules.js';
import type { Atom } from './types.js';

const bondsWithin = (atoms: readonly Atom[], maxDistance: number) =>
  deriveBonds(atoms, () => maxDistance / 2, 1);
const analyse = (name: string, bonds: readonly (readonly [number, number])[]) =>
  analyseVibrations(MOLECULES[name].group, MOLECULES[name].atoms, { bonds });
const split = (r: ReturnType<typeof analyse>) =>
  Object.fromEntries(r.vibrations.modes.map((m) => [m.label, [m.stretches, m.deformations]]));

describe('bond stretches as internal coordinates', () => {
  it('H2O: A1 = 1 stretch + 1 deformation, B2 = 1 stretch', () => {
    const r = analyse('H2O', [[0, 1], [0, 2]]);
    expect(r.internalCoordinates!.gammaStretch.decomposition).toEqual({ A1: 1, B2: 1 });
    expect(split(r)).toEqual({ A1: [1, 1], B2: [1, 0] });
  });

  it('CH4: Γstretch = A1 + T2; E is pure deformation', () => {
    const r = analyse('CH4', [[0, 1], [0, 2], [0, 3], [0, 4]]);
    expect(r.internalCoordinates!.gammaStretch.decomposition).toEqual({ A1: 1, T2: 1 });
    expect(split(r)).toEqual({ A1: [1, 0], E: [0, 1], T2: [1, 1] });
    expect(r.vibrations.modes.map((m) => m.composition)).toEqual(['1 stretch', '1 deformation', '1 stretch + 1 deformation']);
  });

  it('SF6: Γstretch = A1g + Eg + T1u', () => {
    const r = analyse('SF6', [1, 2, 3, 4, 5, 6].map((i) => [0, i] as const));
    expect(r.internalCoordinates!.gammaStretch.decomposition).toEqual({ A1g: 1, Eg: 1, T1u: 1 });
  });

  it('XeF4: Γstretch = A1g + B1g + Eu', () => {
    const r = analyse('XeF4', [1, 2, 3, 4].map((i) => [0, i] as const));
    expect(r.internalCoordinates!.gammaStretch.decomposition).toEqual({ A1g: 1, B1g: 1, Eu: 1 });
  });

  it('benzene: C–H and ring C–C stretches give 2A1g + B1u + B2u + 2E1u + 2E2g', () => {
    const bonds = bondsWithin(MOLECULES.benzene.atoms, 1.45);
    expect(bonds).toHaveLength(12);
    const r = analyse('benzene', bonds);
    expect(r.internalCoordinates!.gammaStretch.decomposition).toEqual({ A1g: 2, E2g: 2, B1u: 1, B2u: 1, E1u: 2 });
    expect(r.internalCoordinates!.bondSource).toBe('listed');
    expect(r.vibrations.modes.find((m) => m.label === 'E2g')!.composition).toBe('2 stretches + 2 deformations');
  });

  it('C60: 90 bonds, every stretch within the vibrations of its species', () => {
    const bonds = bondsWithin(MOLECULES.C60.atoms, 1.5);
    expect(bonds).toHaveLength(90);
    const r = analyse('C60', bonds);
    const dims = r.vibrations.modes.reduce((s, m) => s + m.stretches! * m.degeneracy, 0);
    expect(dims).toBe(90);
    for (const m of r.vibrations.modes) expect(m.stretches! + m.deformations!).toBe(m.count);
  });

  it('caps redundant stretches of a closed cage and says so', () => {
    // SF6 with the twelve F–F edges listed as bonds too: 18 stretches for 15 vibrations.
    const atoms = MOLECULES.SF6.atoms;
    const bonds = bondsWithin(atoms, 2.3);
    expect(bonds).toHaveLength(18);
    const r = analyse('SF6', bonds);
    expect(r.internalCoordinates!.notes.join(' ')).toMatch(/redundant/);
    for (const m of r.vibrations.modes) expect(m.deformations).toBeGreaterThanOrEqual(0);
  });

  it('NH3 combinations: A1 = (1, 1, 1)/√3, the E pair orthonormal and orthogonal to it', () => {
    const r = analyse('NH3', [[0, 1], [0, 2], [0, 3]]);
    const combos = Object.fromEntries(r.internalCoordinates!.combinations.map((c) => [c.irrep, c.combinations]));
    combos.A1[0].forEach((x) => expect(x).toBeCloseTo(1 / Math.sqrt(3), 6));
    expect(combos.E).toHaveLength(2);
    const dot = (a: readonly number[], b: readonly number[]) => a.reduce((s, x, i) => s + x * b[i], 0);
    expect(dot(combos.E[0], combos.E[0])).toBeCloseTo(1, 5);
    expect(dot(combos.E[0], combos.E[1])).toBeCloseTo(0, 5);
    expect(dot(combos.E[0], combos.A1[0])).toBeCloseTo(0, 5);
    expect(combos.E[0].map((x) => Math.round(x * 1e4) / 1e4)).toEqual([0.8165, -0.4082, -0.4082]);
  });

  it('benzene and C60 combinations: one per bond, orthonormal across all bonds, each on one set of equivalent bonds', () => {
    for (const [name, maxDistance] of [['benzene', 1.5], ['C60', 1.5]] as const) {
      const atoms = MOLECULES[name].atoms;
      const bonds = bondsWithin(atoms, maxDistance);
      const r = analyse(name, bonds);
      const combos = r.internalCoordinates!.combinations.flatMap((c) => c.combinations);
      expect(combos).toHaveLength(bonds.length);
      const dot = (a: readonly number[], b: readonly number[]) => a.reduce((s, x, i) => s + x * b[i], 0);
      combos.forEach((a, i) => combos.forEach((b, j) => expect(dot(a, b)).toBeCloseTo(i === j ? 1 : 0, 4)));
      // Bonds of one length are the equivalent ones here (C–H vs C–C; C60's shorter and longer edges).
      const length = ([i, j]: readonly [number, number]) => Math.round(Math.hypot(...atoms[i].position.map((x, c) => x - atoms[j].position[c])) * 100);
      for (const c of combos) expect(new Set(bonds.filter((_, k) => c[k] !== 0).map(length)).size).toBe(1);
    }
  });

  it('derives bonds by default from Cordero et al. (2008) radii × 1.2: O–H bonded, H···H not', () => {
    const r = analyseVibrations('C2v', MOLECULES.H2O.atoms);
    expect(r.internalCoordinates!.bonds).toEqual([[0, 1], [0, 2]]);
    expect(r.internalCoordinates!.bondSource).toBe('derived');
    const benzene = analyseVibrations('D6h', MOLECULES.benzene.atoms);
    expect(benzene.internalCoordinates!.bonds).toHaveLength(12);
  });

  it('covalentRadius: null turns the stretch split off', () => {
    const r = analyseVibrations('C2v', MOLECULES.H2O.atoms, { covalentRadius: null });
    expect(r.internalCoordinates).toBeNull();
    expect(r.vibrations.modes[0].stretches).toBeNull();
  });

  it('derives bonds from covalent radii when given a radius function', () => {
    const r = analyseVibrations('C2v', MOLECULES.H2O.atoms, { covalentRadius: () => 0.5 });
    expect(r.internalCoordinates!.bonds).toEqual([[0, 1], [0, 2]]);
    expect(r.internalCoordinates!.bondSource).toBe('derived');
    expect(() => analyseVibrations('C2v', MOLECULES.H2O.atoms, { covalentRadius: () => undefined })).toThrow(/no covalent radius/);
  });

  it('rejects bad or unsymmetric bond lists', () => {
    expect(() => analyse('H2O', [[0, 5]])).toThrow(/bond 1/);
    expect(() => analyse('H2O', [[0, 1], [1, 0]])).toThrow(/listed twice/);
    expect(() => analyse('H2O', [[0, 1]])).toThrow(/no symmetric partner under C2/);
  });
});
