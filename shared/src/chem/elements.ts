/**
 * Element data for structure files and symmetry detection.
 *
 * Sources (all from memory, not re-read for this file):
 * - Standard atomic weights: IUPAC 2021 table, abridged to 4–5 significant figures; for elements
 *   with an interval the conventional value is used (H 1.008, C 12.011, ...). Elements with no
 *   stable isotope carry the mass number of their longest-lived isotope (IUPAC brackets).
 * - Covalent radii: B. Cordero et al., "Covalent radii revisited", Dalton Trans. 2008, 2832
 *   (C sp3 0.76 Å; Mn, Fe, Co low-spin values). Cordero stops at Cm: heavier elements have null.
 */

/** One element of the periodic table. */
export interface ElementData {
  readonly symbol: string;
  readonly z: number;
  /** Standard atomic weight (u). */
  readonly mass: number;
  /** Single-bond covalent radius (Å), or null where Cordero et al. give none. */
  readonly covalentRadius: number | null;
}

// [symbol, standard atomic weight, Cordero covalent radius]; index + 1 = Z.
const TABLE: readonly (readonly [string, number, number | null])[] = [
  ['H', 1.008, 0.31], ['He', 4.0026, 0.28], ['Li', 6.94, 1.28], ['Be', 9.0122, 0.96], ['B', 10.81, 0.84],
  ['C', 12.011, 0.76], ['N', 14.007, 0.71], ['O', 15.999, 0.66], ['F', 18.998, 0.57], ['Ne', 20.18, 0.58],
  ['Na', 22.99, 1.66], ['Mg', 24.305, 1.41], ['Al', 26.982, 1.21], ['Si', 28.085, 1.11], ['P', 30.974, 1.07],
  ['S', 32.06, 1.05], ['Cl', 35.45, 1.02], ['Ar', 39.95, 1.06], ['K', 39.098, 2.03], ['Ca', 40.078, 1.76],
  ['Sc', 44.956, 1.7], ['Ti', 47.867, 1.6], ['V', 50.942, 1.53], ['Cr', 51.996, 1.39], ['Mn', 54.938, 1.39],
  ['Fe', 55.845, 1.32], ['Co', 58.933, 1.26], ['Ni', 58.693, 1.24], ['Cu', 63.546, 1.32], ['Zn', 65.38, 1.22],
  ['Ga', 69.723, 1.22], ['Ge', 72.63, 1.2], ['As', 74.922, 1.19], ['Se', 78.971, 1.2], ['Br', 79.904, 1.2],
  ['Kr', 83.798, 1.16], ['Rb', 85.468, 2.2], ['Sr', 87.62, 1.95], ['Y', 88.906, 1.9], ['Zr', 91.224, 1.75],
  ['Nb', 92.906, 1.64], ['Mo', 95.95, 1.54], ['Tc', 97, 1.47], ['Ru', 101.07, 1.46], ['Rh', 102.91, 1.42],
  ['Pd', 106.42, 1.39], ['Ag', 107.87, 1.45], ['Cd', 112.41, 1.44], ['In', 114.82, 1.42], ['Sn', 118.71, 1.39],
  ['Sb', 121.76, 1.39], ['Te', 127.6, 1.38], ['I', 126.9, 1.39], ['Xe', 131.29, 1.4], ['Cs', 132.91, 2.44],
  ['Ba', 137.33, 2.15], ['La', 138.91, 2.07], ['Ce', 140.12, 2.04], ['Pr', 140.91, 2.03], ['Nd', 144.24, 2.01],
  ['Pm', 145, 1.99], ['Sm', 150.36, 1.98], ['Eu', 151.96, 1.98], ['Gd', 157.25, 1.96], ['Tb', 158.93, 1.94],
  ['Dy', 162.5, 1.92], ['Ho', 164.93, 1.92], ['Er', 167.26, 1.89], ['Tm', 168.93, 1.9], ['Yb', 173.05, 1.87],
  ['Lu', 174.97, 1.87], ['Hf', 178.49, 1.75], ['Ta', 180.95, 1.7], ['W', 183.84, 1.62], ['Re', 186.21, 1.51],
  ['Os', 190.23, 1.44], ['Ir', 192.22, 1.41], ['Pt', 195.08, 1.36], ['Au', 196.97, 1.36], ['Hg', 200.59, 1.32],
  ['Tl', 204.38, 1.45], ['Pb', 207.2, 1.46], ['Bi', 208.98, 1.48], ['Po', 209, 1.4], ['At', 210, 1.5],
  ['Rn', 222, 1.5], ['Fr', 223, 2.6], ['Ra', 226, 2.21], ['Ac', 227, 2.15], ['Th', 232.04, 2.06],
  ['Pa', 231.04, 2.0], ['U', 238.03, 1.96], ['Np', 237, 1.9], ['Pu', 244, 1.87], ['Am', 243, 1.8],
  ['Cm', 247, 1.69], ['Bk', 247, null], ['Cf', 251, null], ['Es', 252, null], ['Fm', 257, null],
  ['Md', 258, null], ['No', 259, null], ['Lr', 262, null], ['Rf', 267, null], ['Db', 268, null],
  ['Sg', 269, null], ['Bh', 270, null], ['Hs', 269, null], ['Mt', 278, null], ['Ds', 281, null],
  ['Rg', 282, null], ['Cn', 285, null], ['Nh', 286, null], ['Fl', 289, null], ['Mc', 290, null],
  ['Lv', 293, null], ['Ts', 294, null], ['Og', 294, null],
];

const BY_SYMBOL: ReadonlyMap<string, ElementData> = new Map(
  TABLE.map(([symbol, mass, covalentRadius], i) => [symbol.toLowerCase(), { symbol, z: i + 1, mass, covalentRadius }]),
);

/** The element with this symbol, matched case-insensitively ("CL" → Cl); undefined if none. */
export function elementBySymbol(symbol: string): ElementData | undefined {
  return BY_SYMBOL.get(symbol.trim().toLowerCase());
}

/** Number of elements in the table (H–Og). */
export const ELEMENT_COUNT = TABLE.length;

/** The element with atomic number `z` (1–118); undefined outside the table. */
export function elementByNumber(z: number): ElementData | undefined {
  if (!Number.isInteger(z) || z < 1 || z > TABLE.length) return undefined;
  return elementBySymbol(TABLE[z - 1][0]);
}
