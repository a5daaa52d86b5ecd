import type { Structure } from '../symmetry/types.js';
import { parseMolV2000 } from './mol-v2000.js';
import { StructureError } from './structure-error.js';
import { parseXyz } from './xyz.js';

/** The structure file formats Siteband reads. */
export type StructureFormat = 'xyz' | 'mol';

/** Which format a text is in: MOL when line 4 is a V2000/V3000 counts line, XYZ when line 1 is a count. */
export function detectStructureFormat(text: string): StructureFormat {
  const lines = text.split(/\r?\n/);
  if (lines.every((l) => l.trim() === '')) throw new StructureError(1, 'the file is empty');
  if (/V[23]000/.test(lines[3] ?? '')) return 'mol';
  if (/^\s*\d+\s*$/.test(lines[0])) return 'xyz';
  throw new StructureError(1, 'not an XYZ file (line 1 must be the atom count) nor a MOL file (line 4 must be a V2000 counts line)');
}

/** Parses an XYZ or MOL V2000 text; `hint` skips format detection (e.g. from the file extension). */
export function parseStructure(text: string, hint?: StructureFormat): Structure {
  const format = hint ?? detectStructureFormat(text);
  return format === 'mol' ? parseMolV2000(text) : parseXyz(text);
}
