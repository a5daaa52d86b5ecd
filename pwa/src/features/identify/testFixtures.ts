/** Reads the repository's demo scans for the identification tests (Node's fs; tests only). */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type { ScanFile } from './protocol';

// happy-dom gives modules an http: import.meta.url, so the folder is found from the working directory.
function fixturesDir(): string {
  for (let dir = process.cwd(); ; dir = dirname(dir)) {
    const candidate = join(dir, 'fixtures', 'spectra');
    if (existsSync(candidate)) return candidate;
    if (dirname(dir) === dir) throw new Error('fixtures/spectra not found above the working directory');
  }
}

/** A fixture file as the picker would hand it over. */
export function fixtureScan(name: string): ScanFile {
  const bytes = readFileSync(join(fixturesDir(), name));
  return { name, bytes: bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer };
}

/** A text typed in the test, as a picked file. */
export function textScan(name: string, text: string): ScanFile {
  return { name, bytes: new TextEncoder().encode(text).buffer as ArrayBuffer };
}
