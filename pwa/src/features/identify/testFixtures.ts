/** Reads the repository's demo scans for the identification tests (Node's fs; tests only). */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { handleRequest } from './handleRequest';
import type { IdentifyOutcome, ScanFile } from './protocol';
import { DEFAULT_PROCESSING, type ProcessingSettings, type ScanSettings } from './scanSettings';

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

/** A file identified by the worker's own handler, as the capture screen and the scan edit run it. */
export function identify(file: ScanFile, scan: ScanSettings, processing: ProcessingSettings = DEFAULT_PROCESSING): IdentifyOutcome {
  const response = handleRequest({ id: 1, kind: 'identify', file, scan, processing });
  if (!response.ok || response.kind !== 'identify') throw new Error(`expected an identify answer, got ${JSON.stringify(response)}`);
  return response.outcome;
}
