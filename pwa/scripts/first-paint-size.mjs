// Sums the gzip size of the JavaScript the built index.html loads before first paint
// (the entry script and every modulepreload), to keep it under the 300 kB budget.
import { readFile } from 'node:fs/promises';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

const BUDGET_BYTES = 300 * 1024;
const dist = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist');
const html = await readFile(join(dist, 'index.html'), 'utf8');
const files = [...html.matchAll(/<(?:script[^>]*\bsrc|link[^>]*rel="modulepreload"[^>]*\bhref)="\/([^"]+\.js)"/g)].map((m) => m[1]);
if (files.length === 0) throw new Error('No scripts found in dist/index.html: build the PWA first');

let total = 0;
for (const file of files) {
  const size = gzipSync(await readFile(join(dist, file)), { level: 9 }).length;
  total += size;
  console.log(`${(size / 1024).toFixed(1).padStart(7)} kB  ${file}`);
}
console.log(`${(total / 1024).toFixed(1).padStart(7)} kB  first-paint JS, gzip (${files.length} files; budget ${BUDGET_BYTES / 1024} kB)`);
if (total > BUDGET_BYTES) process.exitCode = 1;
