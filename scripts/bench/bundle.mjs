#!/usr/bin/env node
// The PWA's JavaScript for first paint, from the built pwa/dist: the entry script of index.html and
// every module it preloads, gzip-compressed (pwa/scripts/first-paint-size.mjs); the target is under
// 300 kB. The chunks loaded later for plotting (uPlot) and identification (its worker) are listed
// apart, with the other lazy chunks. Needs `npm run build -w pwa`.
import { fileURLToPath } from 'node:url';
import { BUDGET_BYTES, scriptSizes } from '../../pwa/scripts/first-paint-size.mjs';

const kB = (bytes) => `${(bytes / 1024).toFixed(1)} kB`;
const sum = (sizes, key = 'gzip') => sizes.reduce((total, s) => total + s[key], 0);

export async function runBundleBench() {
  const sizes = await scriptSizes();
  const initial = sizes.filter((s) => s.firstPaint).sort((a, b) => b.gzip - a.gzip);
  console.log(`first paint JS: ${kB(sum(initial))} gzip (${kB(sum(initial, 'raw'))} raw) in ${initial.length} files; target < ${kB(BUDGET_BYTES)}, ratio ${(sum(initial) / BUDGET_BYTES).toFixed(2)}`);
  for (const s of initial.slice(0, 4)) console.log(`  ${s.file}: ${kB(s.gzip)} gzip`);
  const lazy = sizes.filter((s) => !s.firstPaint);
  const groups = [
    ['plotting (uPlot, loaded when a spectrum is first drawn)', /SpectrumPlot/],
    ['identification (its worker, started when a capture screen opens)', /identify\.worker/],
    ['structure check (its worker)', /structure\.worker/],
  ];
  for (const [name, pattern] of groups) {
    const chunks = lazy.filter((s) => pattern.test(s.file));
    console.log(`lazy ${name}: ${kB(sum(chunks))} gzip in ${chunks.map((s) => s.file).join(', ') || 'no chunk found'}`);
  }
  const rest = lazy.filter((s) => !groups.some(([, pattern]) => pattern.test(s.file)));
  console.log(`other lazy chunks (screens, Ionic parts): ${kB(sum(rest))} gzip in ${rest.length} files`);
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await runBundleBench();
