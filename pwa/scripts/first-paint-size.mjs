// Sums the gzip size of the JavaScript the built index.html loads before first paint
// (the entry script and every modulepreload), to keep it under the 300 kB budget.
// Run alone it prints each file and exits non-zero over budget; `npm run bench` imports it.
import { readdir, readFile } from 'node:fs/promises';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

export const BUDGET_BYTES = 300 * 1024;
export const DIST = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist');

/** Every JS file of the build with its raw and gzip (level 9) size, and whether first paint loads it. */
export async function scriptSizes(dist = DIST) {
  const html = await readFile(join(dist, 'index.html'), 'utf8');
  const initial = new Set([...html.matchAll(/<(?:script[^>]*\bsrc|link[^>]*rel="modulepreload"[^>]*\bhref)="\/([^"]+\.js)"/g)].map((m) => m[1]));
  if (initial.size === 0) throw new Error('No scripts found in dist/index.html: build the PWA first');
  const assets = (await readdir(join(dist, 'assets'))).filter((f) => f.endsWith('.js')).map((f) => `assets/${f}`);
  const files = [...new Set([...initial, ...assets])];
  return Promise.all(
    files.map(async (file) => {
      const bytes = await readFile(join(dist, file));
      return { file, raw: bytes.length, gzip: gzipSync(bytes, { level: 9 }).length, firstPaint: initial.has(file) };
    }),
  );
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const initial = (await scriptSizes()).filter((s) => s.firstPaint);
  let total = 0;
  for (const { file, gzip } of initial) {
    total += gzip;
    console.log(`${(gzip / 1024).toFixed(1).padStart(7)} kB  ${file}`);
  }
  console.log(`${(total / 1024).toFixed(1).padStart(7)} kB  first-paint JS, gzip (${initial.length} files; budget ${BUDGET_BYTES / 1024} kB)`);
  if (total > BUDGET_BYTES) process.exitCode = 1;
}
