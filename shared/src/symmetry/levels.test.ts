/**
 * Overtone, combination and hot-band symmetries. Expected values: symmetric powers of degenerate
 * species as tabulated by Herzberg, Infrared and Raman Spectra (1945) (from memory); CO2 Fermi dyad
 * ν1 / 2ν2 from REFERENCES.md §2.1 (1285.41 / 1388.18 cm⁻¹, READ).
 */
import { describe, expect, it } from 'vitest';
import { pointGroup } from './catalogue.js';
import { levelSymmetry, transitionActivity } from './levels.js';
import { directProduct, irrepByLabel, symmetricPower, reduceCharacters } from './representation.js';
import { mul, trace } from './mat3.js';

const level = (group: string, ...ex: [string, number][]) =>
  levelSymmetry(pointGroup(group), ex.map(([irrep, quanta]) => ({ irrep, quanta }))).decomposition;

describe('overtone levels (symmetric powers, not plain direct powers)', () => {
  it('2ν(E) in C3v is A1 + E, not the direct square A1 + A2 + E', () => {
    expect(level('C3v', ['E', 2])).toEqual({ A1: 1, E: 1 });
    const e = irrepByLabel(pointGroup('C3v'), 'E').characters;
    expect(reduceCharacters(pointGroup('C3v'), directProduct(e, e))).toEqual({ A1: 1, A2: 1, E: 1 });
  });

  it('3ν(E) in C3v is A1 + A2 + E', () => expect(level('C3v', ['E', 3])).toEqual({ A1: 1, A2: 1, E: 1 }));
  it('2ν(T2) in Td is A1 + E + T2', () => expect(level('Td', ['T2', 2])).toEqual({ A1: 1, E: 1, T2: 1 }));
  it('3ν(T2) in Td is A1 + T1 + 2T2', () => expect(level('Td', ['T2', 3])).toEqual({ A1: 1, T1: 1, T2: 2 }));
  it('2ν(Π) in C∞v is Σ+ + Δ and 2ν(Πu) in D∞h is Σg+ + Δg', () => {
    expect(level('C∞v', ['Π', 2])).toEqual({ 'Σ+': 1, Δ: 1 });
    expect(level('D∞h', ['Πu', 2])).toEqual({ 'Σg+': 1, Δg: 1 });
  });
  it('3ν(Π) in C∞v is Π + Φ', () => expect(level('C∞v', ['Π', 3])).toEqual({ Π: 1, Φ: 1 }));
  it('2ν(E1u) in D6h is A1g + E2g', () => expect(level('D6h', ['E1u', 2])).toEqual({ A1g: 1, E2g: 1 }));
  it('2ν(E) of a separably degenerate mode in C3 is A + E', () => expect(level('C3', ['E', 2])).toEqual({ A: 1, E: 1 }));
  it('a nondegenerate overtone is the direct power: 2ν(B2) in C2v is A1', () => expect(level('C2v', ['B2', 2])).toEqual({ A1: 1 }));
  it('the ground state is totally symmetric', () => expect(level('Oh')).toEqual({ A1g: 1 }));

  it('symmetric square equals ½[χ(R)² + χ(R²)]', () => {
    const g = pointGroup('Oh');
    const t = irrepByLabel(g, 'T1u').characters;
    // T1u is the vector representation, so χ(R²) = tr(R²).
    const manual = g.classes.map((c, k) => (t[k] ** 2 + trace(mul(c.representative, c.representative))) / 2);
    symmetricPower(g, t, 2).forEach((x, k) => expect(x).toBeCloseTo(manual[k], 9));
  });
});

describe('combination levels and transitions', () => {
  const co2 = pointGroup('D∞h');
  const nu1 = { irrep: 'Σg+', quanta: 1 };
  const nu2 = { irrep: 'Πu', quanta: 1 };
  const nu3 = { irrep: 'Σu+', quanta: 1 };

  it('two different E modes in C3v combine to A1 + A2 + E', () => expect(level('C3v', ['E', 1], ['E', 1])).toEqual({ A1: 1, A2: 1, E: 1 }));

  it('CO2 ν1 + ν3 is Σu+, IR-allowed along z', () => {
    const t = transitionActivity(co2, [], [nu1, nu3]);
    expect(t.final.decomposition).toEqual({ 'Σu+': 1 });
    expect(t).toMatchObject({ ir: true, irComponents: ['z'], raman: false });
  });

  it('CO2 ν1 + ν2 is Πu, IR-allowed (x, y)', () => {
    expect(transitionActivity(co2, [], [nu1, nu2])).toMatchObject({ ir: true, irComponents: ['x', 'y'], raman: false });
  });

  it('CO2 ν2 + ν3 is Πg: IR-forbidden, Raman-allowed', () => {
    const t = transitionActivity(co2, [], [nu2, nu3]);
    expect(t.final.decomposition).toEqual({ Πg: 1 });
    expect(t).toMatchObject({ ir: false, raman: true, ramanComponents: ['xz', 'yz'] });
  });

  it('CO2 2ν2 holds a Σg+ component: Raman-allowed, IR-forbidden (the Fermi partner of ν1)', () => {
    const t = transitionActivity(co2, [], [{ irrep: 'Πu', quanta: 2 }]);
    expect(t.final.decomposition).toEqual({ 'Σg+': 1, Δg: 1 });
    expect(t.ir).toBe(false);
    expect(t.ramanComponents).toEqual(expect.arrayContaining(['z²', 'x²+y²']));
    // Per component: the Σg+ part is Raman-allowed through x²+y² and z², the Δg part through x²−y² and xy.
    expect(t.components).toEqual([
      { initial: 'Σg+', final: 'Σg+', ir: false, irComponents: [], raman: true, ramanComponents: ['z²', 'x²+y²'] },
      { initial: 'Σg+', final: 'Δg', ir: false, irComponents: [], raman: true, ramanComponents: ['x²−y²', 'xy'] },
    ]);
  });

  it('hot band ν2 → 2ν2 of CO2 is IR-allowed; ν2 → ν3 is not', () => {
    expect(transitionActivity(co2, [nu2], [{ irrep: 'Πu', quanta: 2 }])).toMatchObject({ ir: true, irComponents: ['x', 'y'] });
    expect(transitionActivity(co2, [nu2], [nu3]).ir).toBe(false);
  });

  it('CH4 ν3 + ν4 (T2 ⊗ T2 = A1 + E + T1 + T2) is IR- and Raman-allowed', () => {
    const t = transitionActivity(pointGroup('Td'), [], [{ irrep: 'T2', quanta: 1 }, { irrep: 'T2', quanta: 1 }]);
    expect(t.final.decomposition).toEqual({ A1: 1, E: 1, T1: 1, T2: 1 });
    expect(t).toMatchObject({ ir: true, raman: true });
  });

  it('a silent SF6 mode (T2u) has an IR-allowed combination with T2g: T2u ⊗ T2g ∋ T1u', () => {
    const t = transitionActivity(pointGroup('Oh'), [], [{ irrep: 'T2u', quanta: 1 }, { irrep: 'T2g', quanta: 1 }]);
    expect(t.product.decomposition.T1u).toBe(1);
    expect(t.ir).toBe(true);
  });

  it('refuses linear levels beyond what the model group resolves, and bad input', () => {
    expect(() => level('C∞v', ['Π', 7])).toThrow(/beyond the \|Λ\| ≤ 6/);
    expect(() => level('C3v', ['E2', 1])).toThrow(/C3v has no irrep "E2"/);
    expect(() => level('C3v', ['E', -1])).toThrow(/whole number/);
  });
});
