// `symmetry FILE [--tolerance T] [--convention yz|xz]`: the structure check of one XYZ or MOL file.
import { checkStructure } from '@siteband/shared';
import { readInput } from './read-file.mjs';
import { printSymmetryTable } from './symmetry-table.mjs';

/** Structure files beyond this size cannot hold a structure within the atom limit. */
const MAX_STRUCTURE_BYTES = 1024 * 1024;

/** Runs the structure check; prints JSON or a readable table; returns the exit code. */
export function runSymmetry({ file, options }) {
  const text = new TextDecoder().decode(readInput(file, MAX_STRUCTURE_BYTES));
  const format = /\.mol$/i.test(file) ? 'mol' : /\.xyz$/i.test(file) ? 'xyz' : undefined;
  const check = checkStructure(text, {
    ...(format ? { format } : {}),
    ...(options.tolerance ? { tolerance: options.tolerance } : {}),
    ...(options.convention ? { convention: options.convention } : {}),
  });
  if (options.json) console.log(JSON.stringify(check));
  else printSymmetryTable(check);
  return 0;
}
