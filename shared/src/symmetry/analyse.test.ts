/**
 * Γvib of idealised molecules against published results. Sources (all from memory unless noted):
 * REFERENCES.md §3 (Cotton, Chemical Applications of Group Theory, 3rd ed.; Harris & Bertolucci,
 * Symmetry and Spectroscopy; Herzberg, Infrared and Raman Spectra, 1945). "by hand" marks results we
 * derived on paper here from unmoved-atom counts, independently of this code.
 */
import { describe, expect, it } from 'vitest';
import { analyseVibrations } from './analyse.js';
import { MOLECULES, at } from './__tests__/molecules.js';
import { reduceCharacters } from './representation.js';
import { pointGroup } from './catalogue.js';

const EXPECTED: Record<string, { gamma: Record<string, number>; source: string }> = {
  H2O: { gamma: { A1: 2, B2: 1 }, source: 'REFERENCES §3, Mulliken yz convention' },
  SO2: { gamma: { A1: 2, B2: 1 }, source: 'REFERENCES §3; CCCBDB lists ν3 as b2 (READ, §2.1)' },
  CO2: { gamma: { 'Σg+': 1, 'Σu+': 1, Πu: 1 }, source: 'REFERENCES §3' },
  HCN: { gamma: { 'Σ+': 2, Π: 1 }, source: 'REFERENCES §3' },
  C2H2: { gamma: { 'Σg+': 2, 'Σu+': 1, Πg: 1, Πu: 1 }, source: 'REFERENCES §3' },
  NH3: { gamma: { A1: 2, E: 2 }, source: 'REFERENCES §3; CCCBDB (READ, §2.1)' },
  CHCl3: { gamma: { A1: 3, E: 3 }, source: 'REFERENCES §3' },
  CH2Cl2: { gamma: { A1: 4, A2: 1, B1: 2, B2: 2 }, source: 'REFERENCES §3' },
  COCl2: { gamma: { A1: 3, B1: 1, B2: 2 }, source: 'REFERENCES §3 (Mulliken)' },
  BF3: { gamma: { "A1'": 1, "A2''": 1, "E'": 2 }, source: 'REFERENCES §3' },
  CH4: { gamma: { A1: 1, E: 1, T2: 2 }, source: 'REFERENCES §3' },
  CH3D: { gamma: { A1: 3, E: 3 }, source: 'Herzberg 1945' },
  SF6: { gamma: { A1g: 1, Eg: 1, T2g: 1, T1u: 2, T2u: 1 }, source: 'REFERENCES §3' },
  UF6: { gamma: { A1g: 1, Eg: 1, T2g: 1, T1u: 2, T2u: 1 }, source: 'REFERENCES §3 (octahedral XY6 as SF6)' },
  XeF4: { gamma: { A1g: 1, B1g: 1, B2g: 1, A2u: 1, B2u: 1, Eu: 2 }, source: 'REFERENCES §3' },
  PCl5: { gamma: { "A1'": 2, "E'": 3, "A2''": 2, "E''": 1 }, source: 'REFERENCES §3' },
  IF7: { gamma: { "A1'": 2, "E1'": 3, "E2'": 2, "A2''": 2, "E1''": 1, "E2''": 1 }, source: 'Cotton; checked by hand' },
  C2H4: { gamma: { Ag: 3, B1g: 2, B2g: 1, Au: 1, B1u: 1, B2u: 2, B3u: 2 }, source: 'REFERENCES §3, Shimanouchi axes' },
  // Shimanouchi's labels with axes renamed (his x → our z, his z → our x): B1 ↔ B3.
  'C2H4 (yz plane)': { gamma: { Ag: 3, B2g: 1, B3g: 2, Au: 1, B1u: 2, B2u: 2, B3u: 1 }, source: 'REFERENCES §3 relabelled for the yz plane' },
  allene: { gamma: { A1: 3, B1: 1, B2: 3, E: 4 }, source: 'REFERENCES §3' },
  benzene: {
    gamma: { A1g: 2, A2g: 1, B2g: 2, E1g: 1, E2g: 4, A2u: 1, B1u: 2, B2u: 2, E1u: 3, E2u: 2 },
    source: 'REFERENCES §3 (C2′ through atoms)',
  },
  H2O2: { gamma: { A: 4, B: 2 }, source: 'REFERENCES §3' },
  N2H4: { gamma: { A: 7, B: 5 }, source: 'REFERENCES §3' },
  CH3OH: { gamma: { "A'": 8, "A''": 4 }, source: 'REFERENCES §3' },
  'trans-N2F2': { gamma: { Ag: 3, Au: 1, Bu: 2 }, source: 'Herzberg 1945 (planar trans X2Y2)' },
  'B(OH)3': { gamma: { "A'": 3, "E'": 4, "A''": 2, "E''": 1 }, source: 'by hand: χ3N = 21, 0, 0, 7, −2, −2' },
  'ethane (staggered)': { gamma: { A1g: 3, Eg: 3, A1u: 1, A2u: 2, Eu: 3 }, source: 'Herzberg 1945; by hand' },
  'ethane (eclipsed)': { gamma: { "A1'": 3, "E'": 3, "A1''": 1, "A2''": 2, "E''": 3 }, source: 'Herzberg 1945' },
  cyclohexane: { gamma: { A1g: 6, A2g: 2, Eg: 8, A1u: 3, A2u: 5, Eu: 8 }, source: 'by hand: χ3N = 54, 0, 0, 0, 0, 6' },
  S8: { gamma: { A1: 2, B1: 1, B2: 1, E1: 2, E2: 3, E3: 2 }, source: 'literature value; by hand: χ3N(σd) = 2' },
  ferrocene: {
    gamma: { A1g: 4, A2g: 1, E1g: 5, E2g: 6, A1u: 2, A2u: 4, E1u: 6, E2u: 6 },
    source: 'by hand: unmoved 21, 1, 1, 1, 1, 1, 1, 5',
  },
  'Ni(CO)4': { gamma: { A1: 2, E: 2, T1: 1, T2: 4 }, source: 'Cotton' },
  'Cr(CO)6': { gamma: { A1g: 2, Eg: 2, T1g: 1, T2g: 2, T1u: 4, T2u: 2 }, source: 'Cotton' },
  cubane: { gamma: { A1g: 2, Eg: 2, T1g: 1, T2g: 4, A2u: 2, Eu: 2, T1u: 3, T2u: 2 }, source: 'by hand: χ3N nonzero only at E (48) and σd (8)' },
  C60: {
    gamma: { Ag: 2, T1g: 3, T2g: 4, Gg: 6, Hg: 8, Au: 1, T1u: 4, T2u: 5, Gu: 6, Hu: 7 },
    source: 'published C60 result (from memory)',
  },
  'ethane (twisted)': { gamma: { A1: 4, A2: 2, E: 6 }, source: 'by hand: χ3N = 24, 0, 0' },
  'XY4 (S4, synthetic)': { gamma: { A: 2, B: 3, E: 2 }, source: 'by hand (invented structure): χ3N = 15, −1, −1, −1' },
  'anti CHClF–CHClF (Ci)': { gamma: { Ag: 9, Au: 9 }, source: 'by hand: χ3N(i) = 0, so Γ3N = 12Ag + 12Au' },
  HCl: { gamma: { 'Σ+': 1 }, source: 'REFERENCES §2.2' },
  N2: { gamma: { 'Σg+': 1 }, source: 'REFERENCES §2.2 (Raman only)' },
  CHFClBr: { gamma: { A: 9 }, source: 'C1: 3N − 6 modes of species A' },
};

describe('Γvib of idealised molecules', () => {
  it('covers at least 25 molecules', () => expect(Object.keys(EXPECTED).length).toBeGreaterThanOrEqual(25));

  it.each(Object.entries(EXPECTED))('%s', (name, { gamma }) => {
    const { group, atoms } = MOLECULES[name];
    const result = analyseVibrations(group, atoms);
    expect(result.vibrations.gamma).toEqual(gamma);
    expect(result.vibrations.total).toBe(3 * atoms.length - (result.linear ? 5 : 6));
  });
});

describe('activity counts (REFERENCES §3)', () => {
  const counts = (name: string) => {
    const { group, atoms } = MOLECULES[name];
    const v = analyseVibrations(group, atoms).vibrations;
    return { ir: v.irActive, raman: v.ramanActive, silent: v.silent, coincident: v.coincident };
  };
  it.each([
    ['CH4', { ir: 2, raman: 4, silent: 0, coincident: 2 }],
    ['SF6', { ir: 2, raman: 3, silent: 1, coincident: 0 }],
    ['benzene', { ir: 4, raman: 7, silent: 9, coincident: 0 }],
    ['CO2', { ir: 2, raman: 1, silent: 0, coincident: 0 }],
    ['C2H2', { ir: 2, raman: 3, silent: 0, coincident: 0 }],
    ['XeF4', { ir: 3, raman: 3, silent: 1, coincident: 0 }],
    ['PCl5', { ir: 5, raman: 6, silent: 0, coincident: 3 }],
    ['BF3', { ir: 3, raman: 3, silent: 0, coincident: 2 }],
    ['CH2Cl2', { ir: 8, raman: 9, silent: 0, coincident: 8 }],
    ['C2H4', { ir: 5, raman: 6, silent: 1, coincident: 0 }],
    ['allene', { ir: 7, raman: 11, silent: 0, coincident: 7 }],
  ] as const)('%s', (name, expected) => expect(counts(name)).toEqual(expected));

  it('states mutual exclusion for centrosymmetric groups only', () => {
    const sf6 = analyseVibrations('Oh', MOLECULES.SF6.atoms).vibrations;
    expect(sf6.mutualExclusion).toBe(true);
    expect(sf6.notes.join(' ')).toMatch(/mutual exclusion/);
    expect(analyseVibrations('Td', MOLECULES.CH4.atoms).vibrations.mutualExclusion).toBe(false);
  });

  it('lists per-mode activity with components', () => {
    const modes = analyseVibrations('C2v', MOLECULES.CH2Cl2.atoms).vibrations.modes;
    const a2 = modes.find((m) => m.label === 'A2')!;
    expect(a2).toMatchObject({ count: 1, degeneracy: 1, ir: false, raman: true, irComponents: [], ramanComponents: ['xy'], activity: 'Raman' });
    const silent = analyseVibrations('Oh', MOLECULES.SF6.atoms).vibrations.modes.find((m) => m.label === 'T2u')!;
    expect(silent.activity).toBe('silent');
    const e = analyseVibrations('Td', MOLECULES.CH4.atoms).vibrations.modes.find((m) => m.label === 'T2')!;
    expect(e).toMatchObject({ count: 2, degeneracy: 3, ir: true, irComponents: ['x', 'y', 'z'] });
  });
});

describe('Γ3N bookkeeping and bad input', () => {
  it('shows unmoved atoms and contributions per class (H2O in the yz plane: 3, 1, 1, 3 unmoved; χ 9, −1, 1, 3; Cotton)', () => {
    const r = analyseVibrations('C2v', MOLECULES.H2O.atoms);
    expect(r.contributions.map((c) => c.unmovedAtoms)).toEqual([3, 1, 1, 3]);
    expect(r.contributions.map((c) => c.perAtom)).toEqual([3, -1, 1, 1]);
    expect(r.gamma3N.characters).toEqual([9, -1, 1, 3]);
    expect(r.gammaTrans.decomposition).toEqual({ A1: 1, B1: 1, B2: 1 });
    expect(r.gammaRot.decomposition).toEqual({ A2: 1, B1: 1, B2: 1 });
    expect(r.gammaVib.characters).toEqual([3, 1, 1, 3]);
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });

  it('gives 2A1 + B1 for H2O in the xz plane (Cotton convention)', () => {
    const xz = MOLECULES.H2O.atoms.map((a) => at(a.element, a.position[1], 0, a.position[2]));
    expect(analyseVibrations('C2v', xz).vibrations.gamma).toEqual({ A1: 2, B1: 1 });
  });

  it('rejects a structure that an operation does not map onto itself, naming the operation', () => {
    const turned = MOLECULES.H2O.atoms.map((a) => at(a.element, a.position[1] * Math.SQRT1_2, a.position[1] * Math.SQRT1_2, a.position[2]));
    expect(() => analyseVibrations('C2v', turned)).toThrow(/not symmetric under σv\(xz\) of C2v/);
  });

  it('treats isotopes as different atoms (CH3D is not Td)', () => {
    const ch3d = MOLECULES.CH4.atoms.map((a, i) => (i === 1 ? { ...a, isotope: 2 } : a));
    expect(() => analyseVibrations('Td', ch3d)).toThrow(/not symmetric/);
  });

  it('accepts small distortions within the tolerance and refuses them with a tighter one', () => {
    const bent = MOLECULES.NH3.atoms.map((a, i) => (i === 1 ? at('H', a.position[0] + 0.01, a.position[1], a.position[2]) : a));
    expect(analyseVibrations('C3v', bent).vibrations.gamma).toEqual({ A1: 2, E: 2 });
    expect(() => analyseVibrations('C3v', bent, { tolerance: 0.001 })).toThrow(/tolerance 0.001/);
  });

  it('reports malformed atoms and unknown groups clearly', () => {
    expect(() => analyseVibrations('C2v', [])).toThrow(/no atoms/);
    expect(() => analyseVibrations('C2v', [at('h', 0, 0, 0)])).toThrow(/atom 1: element/);
    expect(() => analyseVibrations('C2v', [{ element: 'O', position: [0, Number.NaN, 0] }])).toThrow(/three finite numbers/);
    expect(() => analyseVibrations('C7v', MOLECULES.H2O.atoms)).toThrow(/unknown point group/);
  });

  it('refuses characters that do not reduce to whole multiplicities', () => {
    expect(() => reduceCharacters(pointGroup('C2v'), [3, 1, 0, 0], 'structure is not in the standard orientation for group C2v')).toThrow(
      'structure is not in the standard orientation for group C2v',
    );
  });

  it('analyses a linear molecule given in a finite subgroup with 3N − 5 modes (CO2 in D2h: Ag + B1u + B2u + B3u)', () => {
    // Correlation D∞h → D2h (from memory): Σg+ → Ag, Σu+ → B1u, Πu → B2u + B3u.
    const r = analyseVibrations('D2h', MOLECULES.CO2.atoms);
    expect(r.linear).toBe(true);
    expect(r.vibrations.gamma).toEqual({ Ag: 1, B1u: 1, B2u: 1, B3u: 1 });
    expect(r.top).toBe('linear');
    expect(analyseVibrations('D∞h', MOLECULES.CO2.atoms).vibrations.notes.join(' ')).toMatch(/model group D13d/);
    expect(r.vibrations.modes.find((m) => m.label === 'B1u')!.band).toMatchObject({ type: 'parallel', branches: ['P', 'R'] });
  });
});
