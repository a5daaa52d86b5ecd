import { elementBySymbol } from './elements.js';

/**
 * Atomic masses (u) of the isotopes that field files name most often.
 * Source: AME2020 atomic mass evaluation as tabulated by NIST ("Atomic Weights and Isotopic
 * Compositions"), values from memory to 6–8 significant figures.
 */
const ISOTOPE_MASS: Readonly<Record<string, number>> = {
  'H-1': 1.00782503, 'H-2': 2.01410178, 'H-3': 3.01604928,
  'Li-6': 6.0151229, 'Li-7': 7.0160034,
  'B-10': 10.0129370, 'B-11': 11.0093054,
  'C-12': 12, 'C-13': 13.0033548, 'C-14': 14.0032420,
  'N-14': 14.0030740, 'N-15': 15.0001089,
  'O-16': 15.9949146, 'O-17': 16.9991317, 'O-18': 17.9991596,
  'F-19': 18.9984032,
  'Si-28': 27.9769265, 'Si-29': 28.9764947, 'Si-30': 29.9737701,
  'P-31': 30.9737620,
  'S-32': 31.9720712, 'S-33': 32.9714589, 'S-34': 33.9678670,
  'Cl-35': 34.9688527, 'Cl-37': 36.9659026,
  'Br-79': 78.9183371, 'Br-81': 80.9162906,
};

/**
 * Mass (u) of isotope `massNumber` of `symbol`: the tabulated atomic mass when known, otherwise
 * the mass number itself (within 0.1 u of the true mass, enough to place a centre of mass).
 * Undefined when the element is unknown or the mass number is impossible (below Z, above 3Z + 30).
 */
export function isotopeMass(symbol: string, massNumber: number): number | undefined {
  const element = elementBySymbol(symbol);
  if (!element || !Number.isInteger(massNumber)) return undefined;
  if (massNumber < element.z || massNumber > 3 * element.z + 30) return undefined;
  return ISOTOPE_MASS[`${element.symbol}-${massNumber}`] ?? massNumber;
}

/** Mass (u) of an atom: the isotope's mass if one is named, else the standard atomic weight. */
export function atomMass(symbol: string, massNumber?: number): number | undefined {
  if (massNumber === undefined) return elementBySymbol(symbol)?.mass;
  return isotopeMass(symbol, massNumber);
}
