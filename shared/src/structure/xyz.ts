import type { Structure } from '../symmetry/types.js';
import { atomFromFields, checkAtomCount, checkDistinctPositions, type LocatedAtom } from './atom-lines.js';
import { StructureError } from './structure-error.js';

/**
 * Parses an XYZ file: line 1 the atom count, line 2 a title, then one "element x y z" line per
 * atom (Å). Extra columns after z are ignored; blank lines after the atoms are allowed.
 * The file lists no bonds (derive them with the symmetry engine's deriveBonds). Throws
 * StructureError naming the line at fault.
 */
export function parseXyz(text: string): Structure {
  const lines = text.split(/\r?\n/);
  if (lines.every((l) => l.trim() === '')) throw new StructureError(1, 'the file is empty');
  const header = lines[0].trim();
  if (!/^\d+$/.test(header)) throw new StructureError(1, `expected the number of atoms, found "${header}"`);
  const count = Number(header);
  checkAtomCount(count, 1);
  const located: LocatedAtom[] = [];
  let last = lines.length;
  while (last > 0 && lines[last - 1].trim() === '') last--;
  for (let i = 2; i < last; i++) {
    const fields = lines[i].trim().split(/\s+/);
    const lineNo = i + 1;
    if (located.length === count) throw new StructureError(lineNo, `more atom lines than the ${count} announced on line 1`);
    if (fields.length < 4 || fields[0] === '') {
      throw new StructureError(lineNo, `expected "element x y z", found "${lines[i].trim()}"`);
    }
    located.push(atomFromFields(fields[0], fields.slice(1, 4), lineNo));
  }
  if (located.length < count) {
    throw new StructureError(1, `the header says ${count} atoms but the file has ${located.length}`);
  }
  checkDistinctPositions(located);
  const atoms = located.map((a) => a.atom);
  const title = (lines[1] ?? '').trim();
  return { ...(title ? { title } : {}), atoms };
}
