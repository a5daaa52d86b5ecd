// Reads the command line's input file with a size limit and a clear message when it cannot.
import { readFileSync, statSync } from 'node:fs';

/** The file's bytes, or an Error naming the file and the problem. */
export function readInput(file, maxBytes) {
  let size;
  try {
    size = statSync(file).size;
  } catch {
    throw new Error(`cannot read ${file}: no such file`);
  }
  if (size > maxBytes) throw new Error(`${file} is ${size} bytes; the limit is ${maxBytes}`);
  return new Uint8Array(readFileSync(file));
}
