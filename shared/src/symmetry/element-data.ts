/**
 * Defaults for bond derivation and moments of inertia, from the shared element data: Cordero et al.,
 * Dalton Trans. 2008 covalent radii and IUPAC atomic weights / AME2020 isotope masses (see chem/).
 */
import type { Atom } from './types.js';
import { elementBySymbol } from '../chem/elements.js';
import { atomMass } from '../chem/isotopes.js';

/** Single-bond covalent radius in Å, or undefined when the table has none. */
export function defaultCovalentRadius(element: string): number | undefined {
  return elementBySymbol(element)?.covalentRadius ?? undefined;
}

/** Mass in u of the atom's isotope, or the standard atomic weight; 0 when unknown (principalAxes then refuses it). */
export function defaultMass(atom: Atom): number {
  return atomMass(atom.element, atom.isotope) ?? 0;
}
