#!/usr/bin/env node
// Lighthouse 12.2.3 (the root dev dependency) on the built app as the API serves it (throwaway
// database, PORT+970), in its default mobile profile with simulated throttling, in Debian's
// Chromium with the flags of ../shared/STACK.md. Prints the performance and accessibility scores
// (targets 0.9 and 1.0), the paint metrics, and the audits that cost points. Needs `npm run build`.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { startStack } from '../sync-harness/stack.mjs';

const root = resolve(fileURLToPath(new URL('../..', import.meta.url)));
const CHROME_FLAGS = '--headless --no-sandbox --disable-gpu --disable-background-networking --disable-component-update --disable-sync --no-first-run';

/** Runs the Lighthouse command line on `url`; returns its JSON report. */
function lighthouse(url) {
  const dir = mkdtempSync(join(tmpdir(), 'siteband-lighthouse-'));
  try {
    const out = join(dir, 'report.json');
    const result = spawnSync(
      'node',
      [join(root, 'node_modules/lighthouse/cli/index.js'), url, '--quiet', '--output=json', `--output-path=${out}`, '--only-categories=performance,accessibility', `--chrome-flags=${CHROME_FLAGS}`],
      { cwd: root, env: { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? '/usr/bin/chromium' }, encoding: 'utf8', timeout: 180_000 },
    );
    if (result.status !== 0) throw new Error(`lighthouse failed (${result.status}): ${result.stderr.slice(-2000)}`);
    return JSON.parse(readFileSync(out, 'utf8'));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export async function runLighthouseBench() {
  const stack = await startStack({ name: 'lighthouse', offset: 970 });
  try {
    const report = lighthouse(`${stack.baseUrl}/`);
    const { performance, accessibility } = report.categories;
    const metric = (id) => report.audits[id]?.displayValue ?? 'n/a';
    console.log(`lighthouse ${report.lighthouseVersion}, ${report.configSettings.formFactor} profile, ${report.configSettings.throttlingMethod} throttling, page ${report.finalDisplayedUrl}`);
    console.log(`  performance ${performance.score} (target 0.9, ratio ${(performance.score / 0.9).toFixed(2)}), accessibility ${accessibility.score} (target 1.0)`);
    console.log(`  first contentful paint ${metric('first-contentful-paint')}, largest contentful paint ${metric('largest-contentful-paint')}, total blocking time ${metric('total-blocking-time')}, speed index ${metric('speed-index')}, layout shift ${metric('cumulative-layout-shift')}`);
    const costly = [...performance.auditRefs, ...accessibility.auditRefs]
      .map((ref) => report.audits[ref.id])
      .filter((audit) => audit && audit.score !== null && audit.score < 0.9 && audit.scoreDisplayMode !== 'informative' && audit.scoreDisplayMode !== 'notApplicable');
    for (const audit of costly) console.log(`  below 0.9: ${audit.id} (${audit.score}) ${audit.displayValue ?? ''}`.trimEnd());
  } finally {
    await stack.close();
  }
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await runLighthouseBench();
