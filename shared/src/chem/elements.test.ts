import { describe, expect, it } from 'vitest';
import { ELEMENT_COUNT, elementByNumber, elementBySymbol } from './elements.js';
import { atomMass, isotopeMass } from './isotopes.js';

describe('elementBySymbol', () => {
  it('covers H to Og with Z in table order', () => {
    expect(ELEMENT_COUNT).toBe(118);
    expect(elementBySymbol('H')?.z).toBe(1);
    expect(elementBySymbol('Og')?.z).toBe(118);
    expect(elementBySymbol('U')?.z).toBe(92);
    expect(elementByNumber(54)?.symbol).toBe('Xe');
    expect(elementByNumber(0)).toBeUndefined();
    expect(elementByNumber(119)).toBeUndefined();
  });

  it('matches symbols in any case', () => {
    expect(elementBySymbol('CL')?.symbol).toBe('Cl');
    expect(elementBySymbol('cl')?.symbol).toBe('Cl');
    expect(elementBySymbol(' Br ')?.symbol).toBe('Br');
    expect(elementBySymbol('Xx')).toBeUndefined();
  });

  it('carries IUPAC atomic weights and Cordero radii (values from memory)', () => {
    // IUPAC 2021 abridged weights; Cordero et al. 2008 radii (C sp3 0.76 Å).
    expect(elementBySymbol('C')).toEqual({ symbol: 'C', z: 6, mass: 12.011, covalentRadius: 0.76 });
    expect(elementBySymbol('Cl')?.mass).toBeCloseTo(35.45, 2);
    expect(elementBySymbol('Bk')?.covalentRadius).toBeNull();
    // Atomic weights grow with Z except for the known inversions (Ar/K, Co/Ni, Te/I, Th/Pa, U/Np, Pu/Am).
    const inversions = ['K', 'Ni', 'I', 'Pa', 'Np', 'Am', 'Hs', 'Og'];
    for (let z = 2; z <= 118; z++) {
      const e = elementByNumber(z)!;
      if (!inversions.includes(e.symbol)) expect(e.mass, e.symbol).toBeGreaterThanOrEqual(elementByNumber(z - 1)!.mass);
    }
  });
});

describe('isotope masses', () => {
  it('gives AME2020 masses for the common isotopes (values from memory)', () => {
    expect(isotopeMass('H', 2)).toBeCloseTo(2.0141, 4);
    expect(isotopeMass('C', 13)).toBeCloseTo(13.00335, 5);
    expect(isotopeMass('Cl', 37)).toBeCloseTo(36.9659, 4);
    expect(isotopeMass('B', 10)).toBeCloseTo(10.0129, 4);
  });

  it('falls back to the mass number and refuses impossible ones', () => {
    expect(isotopeMass('Fe', 57)).toBe(57);
    expect(isotopeMass('C', 3)).toBeUndefined();
    expect(isotopeMass('H', 40)).toBeUndefined();
    expect(isotopeMass('Qq', 12)).toBeUndefined();
    expect(atomMass('O')).toBeCloseTo(15.999, 3);
    expect(atomMass('O', 18)).toBeCloseTo(17.9992, 4);
  });
});
