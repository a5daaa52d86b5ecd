/** Band types and tops. Rules: Herzberg, Infrared and Raman Spectra (1945), as in REFERENCES.md §4.3 (from memory). */
import { describe, expect, it } from 'vitest';
import { pointGroup } from './catalogue.js';
import { bandType, topFromGroup, topFromMoments } from './band-type.js';
import { principalAxes } from './inertia.js';
import { analyseVibrations } from './analyse.js';
import { MOLECULES } from './__tests__/molecules.js';

describe('kind of top', () => {
  it.each([
    ['D∞h', 'linear'],
    ['C∞v', 'linear'],
    ['Td', 'spherical top'],
    ['Ih', 'spherical top'],
    ['C3v', 'symmetric top'],
    ['D6h', 'symmetric top'],
    ['D2d', 'symmetric top'],
    ['S4', 'symmetric top'],
    ['C2v', 'asymmetric top'],
    ['D2h', 'asymmetric top'],
  ] as const)('%s is a %s', (g, top) => expect(topFromGroup(pointGroup(g))).toBe(top));

  it('classifies principal moments', () => {
    expect(topFromMoments([0, 43.6, 43.6])).toBe('linear');
    expect(topFromMoments([3.2, 3.2, 3.2])).toBe('spherical top');
    expect(topFromMoments([1.7, 1.7, 2.7])).toBe('symmetric top');
    expect(topFromMoments([0.6, 1.2, 1.8])).toBe('asymmetric top');
    expect(() => topFromMoments([0, 0, 0])).toThrow(/moments/);
  });
});

describe('band types of IR fundamentals', () => {
  it('linear: Σu+ parallel with P and R only; Πu perpendicular with a strong Q', () => {
    const g = pointGroup('D∞h');
    expect(bandType(g, 'Σu+')).toMatchObject({ top: 'linear', type: 'parallel', branches: ['P', 'R'] });
    expect(bandType(g, 'Πu')).toMatchObject({ type: 'perpendicular', branches: ['P', 'Q', 'R'] });
    expect(bandType(g, 'Πu').note).toMatch(/strong/);
    expect(bandType(g, 'Σg+').type).toBe('not IR-active');
  });

  it('symmetric top NH3: A1 parallel, E perpendicular', () => {
    const g = pointGroup('C3v');
    expect(bandType(g, 'A1')).toMatchObject({ top: 'symmetric top', type: 'parallel', branches: ['P', 'Q', 'R'] });
    expect(bandType(g, 'E').type).toBe('perpendicular');
  });

  it('spherical top CH4: T2 fundamentals have P, Q and R', () => {
    expect(bandType(pointGroup('Td'), 'T2')).toMatchObject({ top: 'spherical top', branches: ['P', 'Q', 'R'] });
  });

  it('asymmetric top H2O: A1 modes B-type (dipole along the b axis, the C2), B2 mode A-type', () => {
    // Relative masses only matter for the axis order: mass numbers of ¹⁶O and ¹H.
    const mass = (a: { element: string }) => (a.element === 'O' ? 16 : 1);
    const axes = principalAxes(MOLECULES.H2O.atoms, mass);
    expect(axes.axisOf).toEqual({ x: 'c', y: 'a', z: 'b' });
    const modes = analyseVibrations('C2v', MOLECULES.H2O.atoms, { mass }).vibrations.modes;
    expect(modes.find((m) => m.label === 'A1')!.band).toMatchObject({ type: 'B-type', branches: ['P', 'R'] });
    expect(modes.find((m) => m.label === 'B2')!.band).toMatchObject({ type: 'A-type', branches: ['P', 'Q', 'R'] });
  });

  it('uses standard atomic weights by default and says "undetermined" when a mass is missing', () => {
    expect(analyseVibrations('C2v', MOLECULES.H2O.atoms).vibrations.modes[0].band!.type).toBe('B-type');
    const modes = analyseVibrations('C2v', MOLECULES.H2O.atoms, { mass: () => 0 }).vibrations.modes;
    expect(modes[0].band!.type).toBe('undetermined');
  });
});
