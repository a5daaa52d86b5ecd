#!/usr/bin/env node
// npm run bench: every speed figure and ratio the issues set targets for, printed, never asserted.
// Each bench lives in scripts/bench/<area>.mjs, exports run<Area>Bench() and can also run alone.
import { ensureSharedBuilt } from './cli/build.mjs';

ensureSharedBuilt();
const benches = [
  ['symmetry', './bench/symmetry.mjs', 'runSymmetryBench'],
  ['spectrum pipeline', './bench/spectrum.mjs', 'runSpectrumBench'],
  ['identification', './bench/identify.mjs', 'runIdentifyBench'],
  ['sync', './bench/sync.mjs', 'runSyncBench'],
  ['bundle size', './bench/bundle.mjs', 'runBundleBench'],
  ['lighthouse', './bench/lighthouse.mjs', 'runLighthouseBench'],
];
const only = process.argv[2];
for (const [name, path, fn] of benches) {
  if (only && !name.startsWith(only)) continue;
  console.log(`\n## ${name}\n`);
  const mod = await import(path);
  await mod[fn]();
}
