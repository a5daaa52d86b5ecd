/** Reads the committed test files under fixtures/ (test-only helper; uses Node's fs). */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('../../../../fixtures/', import.meta.url));

/** Text of a file under fixtures/. */
export function fixtureText(relative: string): string {
  return readFileSync(ROOT + relative, 'utf8');
}

/** Bytes of a file under fixtures/. */
export function fixtureBytes(relative: string): Uint8Array {
  return new Uint8Array(readFileSync(ROOT + relative));
}
