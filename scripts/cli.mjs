#!/usr/bin/env node
// Siteband's command line: `npm run -s cli -- symmetry|identify FILE [options]`.
// A thin Node shell around the pure computation in @siteband/shared; the JSON it prints is a
// documented contract (README, "Command line").
import { ensureSharedBuilt } from './cli/build.mjs';
import { parseArgs, UsageError } from './cli/args.mjs';

const USAGE = `usage:
  npm run -s cli -- symmetry FILE [--tolerance T] [--convention yz|xz] [--json]
  npm run -s cli -- identify FILE --technique ir|raman [--phase condensed|gas] [--atr] [--excitation NM] [--json]`;

async function main(argv) {
  const [command, ...rest] = argv;
  if (!command || command === '--help' || command === '-h') {
    console.log(USAGE);
    return 0;
  }
  ensureSharedBuilt();
  if (command === 'symmetry') {
    const { runSymmetry } = await import('./cli/symmetry.mjs');
    return runSymmetry(parseArgs(rest, { tolerance: 'number', convention: ['yz', 'xz'], json: 'flag' }));
  }
  if (command === 'identify') {
    const { runIdentify } = await import('./cli/identify.mjs');
    return runIdentify(
      parseArgs(rest, {
        technique: ['ir', 'raman'],
        phase: ['condensed', 'gas'],
        atr: 'flag',
        excitation: 'number',
        tolerance: 'number',
        json: 'flag',
      }),
    );
  }
  throw new UsageError(`unknown command "${command}"`);
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err) => {
    if (err instanceof UsageError) {
      console.error(`error: ${err.message}\n${USAGE}`);
      process.exit(2);
    }
    console.error(`error: ${err?.message ?? err}`);
    process.exit(1);
  },
);
