import type { Atom, Structure } from '../symmetry/types.js';
import { isotopeMass } from '../chem/isotopes.js';
import { atomFromFields, checkAtomCount, checkDistinctPositions, type LocatedAtom } from './atom-lines.js';
import { StructureError } from './structure-error.js';

const COUNTS_LINE = 4;

function fixedInt(line: string, start: number, end: number): number {
  const field = line.slice(start, end).trim();
  return /^\d+$/.test(field) ? Number(field) : NaN;
}

/**
 * Parses a MOL file in the V2000 layout (CTfile format): three header lines, the counts line,
 * the atom block (x, y, z, symbol), the bond block (fixed 3-character atom numbers) and the
 * properties block up to "M  END" (M  ISO sets isotopes). Throws StructureError naming the line.
 */
export function parseMolV2000(text: string): Structure {
  const lines = text.split(/\r?\n/);
  if (lines.every((l) => l.trim() === '')) throw new StructureError(1, 'the file is empty');
  if (lines.length < COUNTS_LINE) throw new StructureError(lines.length, 'the file ends before the counts line (line 4)');
  const counts = lines[COUNTS_LINE - 1];
  if (/V3000/.test(counts)) throw new StructureError(COUNTS_LINE, 'MOL V3000 is not supported; save the file as V2000');
  if (!/V2000/.test(counts)) throw new StructureError(COUNTS_LINE, `expected a counts line ending in V2000, found "${counts.trim()}"`);
  const atomCount = fixedInt(counts, 0, 3);
  const bondCount = fixedInt(counts, 3, 6);
  if (Number.isNaN(atomCount) || Number.isNaN(bondCount)) {
    throw new StructureError(COUNTS_LINE, `the counts line must start with the atom and bond counts, found "${counts.trim()}"`);
  }
  checkAtomCount(atomCount, COUNTS_LINE);

  const located: LocatedAtom[] = [];
  for (let k = 0; k < atomCount; k++) {
    const index = COUNTS_LINE + k;
    const line = lines[index];
    const fields = line?.trim().split(/\s+/) ?? [];
    // MOL atom lines name the element by letters; digits there mean the bond block has begun.
    if (line === undefined || fields.length < 4 || line.startsWith('M  ') || !/^[A-Za-z]/.test(fields[3])) {
      throw new StructureError(index + 1, `the counts line announces ${atomCount} atoms but the atom block has ${k}`);
    }
    located.push(atomFromFields(fields[3], fields.slice(0, 3), index + 1));
  }

  const bonds: [number, number][] = [];
  const bondStart = COUNTS_LINE + atomCount;
  for (let k = 0; k < bondCount; k++) {
    const index = bondStart + k;
    const line = lines[index];
    const a = line === undefined ? NaN : fixedInt(line, 0, 3);
    const b = line === undefined ? NaN : fixedInt(line, 3, 6);
    if (Number.isNaN(a) || Number.isNaN(b)) {
      throw new StructureError(index + 1, `the counts line announces ${bondCount} bonds but the bond block has ${k}`);
    }
    for (const n of [a, b]) {
      if (n < 1 || n > atomCount) throw new StructureError(index + 1, `bond names atom ${n}, but there are ${atomCount} atoms`);
    }
    bonds.push([a - 1, b - 1]);
  }

  const atoms: Atom[] = located.map((l) => l.atom);
  for (let index = bondStart + bondCount; index < lines.length; index++) {
    const line = lines[index];
    if (line.startsWith('M  END')) break;
    if (line.startsWith('M  ISO')) applyIsotopes(line, index + 1, atoms);
  }
  checkDistinctPositions(atoms.map((atom, i) => ({ atom, line: located[i].line })));
  const title = lines[0].trim();
  return { ...(title ? { title } : {}), atoms, bonds };
}

function applyIsotopes(line: string, lineNo: number, atoms: Atom[]): void {
  const fields = line.trim().split(/\s+/).slice(2).map(Number);
  const [entries, ...pairs] = fields;
  if (!Number.isInteger(entries) || pairs.length < 2 * entries) throw new StructureError(lineNo, 'M  ISO line is incomplete');
  for (let i = 0; i < entries; i++) {
    const index = pairs[2 * i];
    const massNumber = pairs[2 * i + 1];
    if (!Number.isInteger(index) || index < 1 || index > atoms.length) {
      throw new StructureError(lineNo, `M  ISO names atom ${pairs[2 * i]}, but there are ${atoms.length} atoms`);
    }
    const atom = atoms[index - 1];
    if (isotopeMass(atom.element, massNumber) === undefined) {
      throw new StructureError(lineNo, `mass number ${massNumber} is impossible for ${atom.element}`);
    }
    atoms[index - 1] = { ...atom, isotope: massNumber };
  }
}
