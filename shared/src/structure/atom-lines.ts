import type { Atom } from '../symmetry/types.js';
import { DUPLICATE_DISTANCE, MAX_ATOMS } from './limits.js';
import { StructureError } from './structure-error.js';
import { parseElementToken } from './element-token.js';
import { parseCoordinate } from './numbers.js';

/** An atom with the file line it came from, so later checks can name the line. */
export interface LocatedAtom {
  readonly atom: Atom;
  readonly line: number;
}

const AXES = ['x', 'y', 'z'] as const;

/** Builds one atom from an element field and three coordinate fields of file line `line`. */
export function atomFromFields(elementField: string, coordinateFields: readonly string[], line: number): LocatedAtom {
  const token = parseElementToken(elementField);
  if (!token) throw new StructureError(line, `unknown element "${elementField}"`);
  const position = coordinateFields.map((field, i) => {
    const value = parseCoordinate(field);
    if (typeof value === 'string') throw new StructureError(line, `${AXES[i]} coordinate ${value}`);
    return value;
  });
  const atom: Atom = token.isotope === undefined
    ? { element: token.element, position: [position[0], position[1], position[2]] }
    : { element: token.element, isotope: token.isotope, position: [position[0], position[1], position[2]] };
  return { atom, line };
}

/** Rejects an announced atom count that is not a whole number from 1 to MAX_ATOMS. */
export function checkAtomCount(count: number, line: number): void {
  if (!Number.isInteger(count) || count < 1) throw new StructureError(line, `atom count must be a whole number of at least 1, found "${count}"`);
  if (count > MAX_ATOMS) throw new StructureError(line, `${count} atoms is more than the limit of ${MAX_ATOMS}`);
}

/** Rejects two atoms closer than DUPLICATE_DISTANCE, naming both lines. */
export function checkDistinctPositions(atoms: readonly LocatedAtom[]): void {
  // Sweep along x: only atoms within DUPLICATE_DISTANCE in x can collide.
  const order = atoms.map((_, i) => i).sort((a, b) => atoms[a].atom.position[0] - atoms[b].atom.position[0]);
  for (let i = 0; i < order.length; i++) {
    const a = atoms[order[i]];
    for (let j = i + 1; j < order.length; j++) {
      const b = atoms[order[j]];
      if (b.atom.position[0] - a.atom.position[0] > DUPLICATE_DISTANCE) break;
      const d = Math.hypot(
        a.atom.position[0] - b.atom.position[0],
        a.atom.position[1] - b.atom.position[1],
        a.atom.position[2] - b.atom.position[2],
      );
      if (d < DUPLICATE_DISTANCE) {
        const [first, second] = a.line < b.line ? [a, b] : [b, a];
        throw new StructureError(second.line, `atom at the same position as the atom on line ${first.line} (${d.toFixed(4)} Å apart)`);
      }
    }
  }
}
