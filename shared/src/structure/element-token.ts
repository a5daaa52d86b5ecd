import { elementByNumber, elementBySymbol } from '../chem/elements.js';
import { isotopeMass } from '../chem/isotopes.js';

/** An element read from a file, with its mass number when the file names an isotope. */
export interface ElementToken {
  readonly element: string;
  readonly isotope?: number;
}

const HYDROGEN_ISOTOPES: Readonly<Record<string, number>> = { d: 2, t: 3 };

/**
 * Reads an element as files write it: a symbol in any case ("CL"), D or T for the heavy
 * hydrogens, a mass-number prefix ("13C"), or an atomic number ("6"). Undefined if none fits.
 */
export function parseElementToken(token: string): ElementToken | undefined {
  const text = token.trim();
  if (/^\d+$/.test(text)) {
    const byNumber = elementByNumber(Number(text));
    return byNumber && { element: byNumber.symbol };
  }
  const match = /^(\d+)?([A-Za-z]{1,3})$/.exec(text);
  if (!match) return undefined;
  const massNumber = match[1] === undefined ? undefined : Number(match[1]);
  const heavyHydrogen = HYDROGEN_ISOTOPES[match[2].toLowerCase()];
  if (heavyHydrogen !== undefined) {
    if (massNumber !== undefined && massNumber !== heavyHydrogen) return undefined;
    return { element: 'H', isotope: heavyHydrogen };
  }
  const element = elementBySymbol(match[2]);
  if (!element) return undefined;
  if (massNumber === undefined) return { element: element.symbol };
  return isotopeMass(element.symbol, massNumber) === undefined ? undefined : { element: element.symbol, isotope: massNumber };
}
