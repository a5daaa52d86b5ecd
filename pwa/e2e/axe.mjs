// Runs axe-core inside the page and reports the violations that block a release (serious, critical).
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
// Evaluated through the DevTools protocol rather than page.addScriptTag: the server's CSP
// (script-src 'self') rightly refuses the inline <script> addScriptTag would insert, and the test
// keeps that policy in force instead of bypassing it.
const AXE_SOURCE = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
const BLOCKING = new Set(['serious', 'critical']);

/** Returns the serious and critical axe violations of the page as readable lines (empty when clean). */
export async function blockingViolations(page) {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(AXE_SOURCE);
  const results = await page.evaluate(() =>
    window.axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa', 'best-practice'] } }),
  );
  return results.violations
    .filter((v) => BLOCKING.has(v.impact))
    .map((v) => `${v.impact} ${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 4).join(', ')}`);
}
