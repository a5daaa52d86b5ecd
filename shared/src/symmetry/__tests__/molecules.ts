/**
 * Idealised test geometries placed by hand in the standard orientation of types.ts (Å; distances are
 * rough, symmetry is exact). They exist only to exercise the symmetry engine.
 */
import type { Atom } from '../types.js';

export const at = (element: string, x: number, y: number, z: number, isotope?: number): Atom =>
  isotope === undefined ? { element, position: [x, y, z] } : { element, isotope, position: [x, y, z] };

/** n atoms on a circle of radius r at height z, the first at angle phaseDeg from x. */
export function ring(element: string, n: number, r: number, z: number, phaseDeg = 0): Atom[] {
  return Array.from({ length: n }, (_, k) => {
    const a = ((phaseDeg + (360 * k) / n) * Math.PI) / 180;
    return at(element, r * Math.cos(a), r * Math.sin(a), z);
  });
}

/** All sign combinations of (±a, ±b, ±c) with duplicates (zero entries) removed. */
function signs(element: string, a: number, b: number, c: number): Atom[] {
  const out = new Map<string, Atom>();
  for (const sx of [1, -1]) for (const sy of [1, -1]) for (const sz of [1, -1]) {
    const p: [number, number, number] = [sx * a + 0, sy * b + 0, sz * c + 0];
    out.set(p.join(), at(element, ...p));
  }
  return [...out.values()];
}

/** Cyclic permutations (x, y, z) → (y, z, x) → (z, x, y) of a point set. */
const cyclic = (atoms: Atom[]): Atom[] =>
  atoms.flatMap((a) => {
    const [x, y, z] = a.position;
    return [at(a.element, x, y, z), at(a.element, y, z, x), at(a.element, z, x, y)];
  });

const PHI = (1 + Math.sqrt(5)) / 2;

/** Scaled copies of the four vertices of a tetrahedron with C3 axes along (1,1,1)-type directions. */
const tetra = (element: string, a: number) => [at(element, a, a, a), at(element, a, -a, -a), at(element, -a, a, -a), at(element, -a, -a, a)];
/** Six atoms on ±x, ±y, ±z. */
const octa = (element: string, d: number) => [at(element, d, 0, 0), at(element, -d, 0, 0), at(element, 0, d, 0), at(element, 0, -d, 0), at(element, 0, 0, d), at(element, 0, 0, -d)];

/** Name → group and atoms. */
export const MOLECULES: Record<string, { group: string; atoms: Atom[] }> = {
  H2O: { group: 'C2v', atoms: [at('O', 0, 0, 0.117), at('H', 0, 0.757, -0.467), at('H', 0, -0.757, -0.467)] },
  SO2: { group: 'C2v', atoms: [at('S', 0, 0, 0.37), at('O', 0, 1.24, -0.37), at('O', 0, -1.24, -0.37)] },
  CO2: { group: 'D∞h', atoms: [at('C', 0, 0, 0), at('O', 0, 0, 1.16), at('O', 0, 0, -1.16)] },
  HCN: { group: 'C∞v', atoms: [at('H', 0, 0, -1.63), at('C', 0, 0, -0.56), at('N', 0, 0, 0.59)] },
  C2H2: { group: 'D∞h', atoms: [at('C', 0, 0, 0.6), at('C', 0, 0, -0.6), at('H', 0, 0, 1.66), at('H', 0, 0, -1.66)] },
  NH3: { group: 'C3v', atoms: [at('N', 0, 0, 0.11), ...ring('H', 3, 0.94, -0.27)] },
  CHCl3: { group: 'C3v', atoms: [at('C', 0, 0, 0), at('H', 0, 0, 1.07), ...ring('Cl', 3, 1.67, -0.59)] },
  CH2Cl2: { group: 'C2v', atoms: [at('C', 0, 0, 0), at('H', 0.89, 0, 0.63), at('H', -0.89, 0, 0.63), at('Cl', 0, 1.47, -1.03), at('Cl', 0, -1.47, -1.03)] },
  COCl2: { group: 'C2v', atoms: [at('C', 0, 0, 0), at('O', 0, 0, 1.18), at('Cl', 0, 1.45, -0.85), at('Cl', 0, -1.45, -0.85)] },
  BF3: { group: 'D3h', atoms: [at('B', 0, 0, 0), ...ring('F', 3, 1.31, 0)] },
  CH4: { group: 'Td', atoms: [at('C', 0, 0, 0), ...tetra('H', 0.63)] },
  CH3D: { group: 'C3v', atoms: [at('C', 0, 0, 0), at('H', 0, 0, 1.09, 2), ...ring('H', 3, 1.03, -0.36)] },
  SF6: { group: 'Oh', atoms: [at('S', 0, 0, 0), ...octa('F', 1.56)] },
  UF6: { group: 'Oh', atoms: [at('U', 0, 0, 0), ...octa('F', 2.0)] },
  XeF4: { group: 'D4h', atoms: [at('Xe', 0, 0, 0), ...ring('F', 4, 1.95, 0)] },
  PCl5: { group: 'D3h', atoms: [at('P', 0, 0, 0), at('Cl', 0, 0, 2.14), at('Cl', 0, 0, -2.14), ...ring('Cl', 3, 2.02, 0)] },
  IF7: { group: 'D5h', atoms: [at('I', 0, 0, 0), at('F', 0, 0, 1.79), at('F', 0, 0, -1.79), ...ring('F', 5, 1.86, 0)] },
  // Shimanouchi axes for ethylene: in the xy plane, C=C along x.
  C2H4: { group: 'D2h', atoms: [at('C', 0.67, 0, 0), at('C', -0.67, 0, 0), ...signs('H', 1.23, 0.92, 0)] },
  // Mulliken's planar convention: in the yz plane with C=C along z.
  'C2H4 (yz plane)': { group: 'D2h', atoms: [at('C', 0, 0, 0.67), at('C', 0, 0, -0.67), ...signs('H', 0, 0.92, 1.23)] },
  allene: {
    group: 'D2d',
    atoms: [at('C', 0, 0, 0), at('C', 0, 0, 1.31), at('C', 0, 0, -1.31), at('H', 0.66, 0.66, 1.87), at('H', -0.66, -0.66, 1.87), at('H', 0.66, -0.66, -1.87), at('H', -0.66, 0.66, -1.87)],
  },
  // C2′ through the atoms (along x).
  benzene: { group: 'D6h', atoms: [...ring('C', 6, 1.39, 0), ...ring('H', 6, 2.48, 0)] },
  H2O2: { group: 'C2', atoms: [at('O', 0.73, 0, 0), at('O', -0.73, 0, 0), at('H', 0.9, 0.8, 0.5), at('H', -0.9, -0.8, 0.5)] },
  N2H4: {
    group: 'C2',
    atoms: [at('N', 0.72, 0, 0.05), at('N', -0.72, 0, 0.05), at('H', 1.0, 0.7, 0.65), at('H', -1.0, -0.7, 0.65), at('H', 1.05, -0.8, 0.45), at('H', -1.05, 0.8, 0.45)],
  },
  // Cs: the mirror is the xy plane.
  CH3OH: {
    group: 'Cs',
    atoms: [at('C', -0.05, 0.66, 0), at('O', -0.05, -0.76, 0), at('H', 0.87, -1.05, 0), at('H', -1.09, 0.98, 0), at('H', 0.43, 1.08, 0.89), at('H', 0.43, 1.08, -0.89)],
  },
  'trans-N2F2': { group: 'C2h', atoms: [at('N', 0.61, 0, 0), at('N', -0.61, 0, 0), at('F', 1.2, 1.1, 0), at('F', -1.2, -1.1, 0)] },
  'B(OH)3': {
    group: 'C3h',
    atoms: [at('B', 0, 0, 0), ...ring('O', 3, 1.36, 0), ...ring('H', 3, 1.75, 0, 30)],
  },
  'ethane (staggered)': { group: 'D3d', atoms: [at('C', 0, 0, 0.77), at('C', 0, 0, -0.77), ...ring('H', 3, 1.02, 1.16, 90), ...ring('H', 3, 1.02, -1.16, 30)] },
  'ethane (eclipsed)': { group: 'D3h', atoms: [at('C', 0, 0, 0.77), at('C', 0, 0, -0.77), ...ring('H', 3, 1.02, 1.16), ...ring('H', 3, 1.02, -1.16)] },
  // Chair: carbons alternately up and down at 30° + 60°k; σd (the yz plane and its images) holds opposite carbons.
  cyclohexane: {
    group: 'D3d',
    atoms: [
      ...ring('C', 3, 1.45, 0.25, 30),
      ...ring('C', 3, 1.45, -0.25, 90),
      ...ring('H', 3, 1.45, 1.35, 30),
      ...ring('H', 3, 1.45, -1.35, 90),
      ...ring('H', 3, 2.45, -0.1, 30),
      ...ring('H', 3, 2.45, 0.1, 90),
    ],
  },
  // Crown S8: atoms at 22.5° + 45°k, alternately up and down, so the σd planes hold opposite atoms.
  S8: { group: 'D4d', atoms: [...ring('S', 4, 2.3, 0.5, 22.5), ...ring('S', 4, 2.3, -0.5, 67.5)] },
  // Staggered ferrocene: top ring at 18° + 72°k, bottom ring at −18° + 72°k (C2′ along x between them).
  ferrocene: {
    group: 'D5d',
    atoms: [at('Fe', 0, 0, 0), ...ring('C', 5, 1.22, 1.66, 18), ...ring('C', 5, 1.22, -1.66, -18), ...ring('H', 5, 2.3, 1.7, 18), ...ring('H', 5, 2.3, -1.7, -18)],
  },
  'Ni(CO)4': { group: 'Td', atoms: [at('Ni', 0, 0, 0), ...tetra('C', 1.06), ...tetra('O', 1.72)] },
  'Cr(CO)6': { group: 'Oh', atoms: [at('Cr', 0, 0, 0), ...octa('C', 1.91), ...octa('O', 3.05)] },
  cubane: { group: 'Oh', atoms: [...signs('C', 0.78, 0.78, 0.78), ...signs('H', 1.41, 1.41, 1.41)] },
  // Truncated icosahedron: cyclic permutations of (0, ±1, ±3φ), (±1, ±(2+φ), ±2φ), (±φ, ±2, ±(2φ+1)), ×0.7 Å.
  C60: {
    group: 'Ih',
    atoms: cyclic([...signs('C', 0, 0.7, 0.7 * 3 * PHI), ...signs('C', 0.7, 0.7 * (2 + PHI), 0.7 * 2 * PHI), ...signs('C', 0.7 * PHI, 1.4, 0.7 * (2 * PHI + 1))]),
  },
  // Ethane twisted between staggered and eclipsed (D3): top H at 0°, bottom H at 40° (C2′ along 20°, so rotate by −20°).
  'ethane (twisted)': { group: 'D3', atoms: [at('C', 0, 0, 0.77), at('C', 0, 0, -0.77), ...ring('H', 3, 1.02, 1.16, -20), ...ring('H', 3, 1.02, -1.16, 20)] },
  // Invented S4 test structure: a centre and the S4 orbit of (1.0, 0.3, 0.5): (x, y, z) → (y, −x, −z).
  'XY4 (S4, synthetic)': {
    group: 'S4',
    atoms: [at('Si', 0, 0, 0), at('F', 1, 0.3, 0.5), at('F', 0.3, -1, -0.5), at('F', -1, -0.3, 0.5), at('F', -0.3, 1, -0.5)],
  },
  // Invented Ci test structure: two inversion-related halves with nothing at the centre.
  'anti CHClF–CHClF (Ci)': {
    group: 'Ci',
    atoms: [at('C', 0.2, 0.7, 0.1), at('C', -0.2, -0.7, -0.1), at('H', 1.1, 0.9, 0.6), at('H', -1.1, -0.9, -0.6), at('Cl', -0.6, 1.4, 1.2), at('Cl', 0.6, -1.4, -1.2), at('F', 0.1, 1.5, -1.0), at('F', -0.1, -1.5, 1.0)],
  },
  HCl: { group: 'C∞v', atoms: [at('H', 0, 0, -1.24), at('Cl', 0, 0, 0.04)] },
  N2: { group: 'D∞h', atoms: [at('N', 0, 0, 0.55), at('N', 0, 0, -0.55)] },
  CHFClBr: { group: 'C1', atoms: [at('C', 0, 0, 0), at('H', 0.6, 0.6, 0.6), at('F', -0.8, -0.7, 0.75), at('Cl', -1.0, 1.0, -1.0), at('Br', 1.1, -1.2, -1.0)] },
};
