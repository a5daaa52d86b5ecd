// Browser end-to-end tests of the inspector's identification screens against a running server.
// Registered in run.mjs; the fixtures are the repository's demo scans (fixtures/spectra/).
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { openTab, signInTo, waitForPage, waitForServiceWorker } from './shell.mjs';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');

/** A fixture scan as Playwright hands a file to an input. */
function fixture(name) {
  return { name, mimeType: 'text/csv', buffer: readFileSync(join(SPECTRA, name)) };
}

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

/** Picks a radio choice of the scan settings by its visible label. */
async function choose(page, label) {
  await page.getByLabel(label, { exact: true }).check();
}

/** Imports a scan on the Capture page and waits for its result or its error. */
async function importScan(page, file) {
  await page.getByTestId('scan-file').last().setInputFiles(file);
  await page.locator('[data-testid="scan-result"], [data-testid="scan-error"]').first().waitFor({ timeout: 30_000 });
}

/** Scrolls an element into view before a screenshot of the viewport. */
async function showAndShoot(page, locator, name) {
  await locator.scrollIntoViewIfNeeded();
  await screenshot(page, name);
}

export function identifyTests({ baseUrl, password }) {
  describe('identification on the Capture tab', { concurrency: false }, () => {
    let browser;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 1024, height: 1366 });
    });
    after(async () => {
      await browser?.close();
    });

    it('checks the IR instrument with a polystyrene film and shows the check in force on the scan screen', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      await openTab(page, 'Capture');
      const status = page.getByTestId('instrument-check-status').last();
      assert.match(await status.textContent(), /No instrument check on this tablet for IR/);
      await assertAccessible(page, 'the scan screen before any scan');
      await screenshot(page, 'inspector-capture-scan-start');
      await status.locator('ion-button', { hasText: 'Instrument check' }).click();
      await waitForPage(page, 'Instrument check');
      await page.getByLabel('Polystyrene film, mid-IR (FT instruments) (IR)').check();
      await page.getByTestId('check-file').last().setInputFiles(fixture('synthetic-ir-polystyrene-film.csv'));
      const verdict = page.getByTestId('check-verdict').last();
      await verdict.waitFor({ timeout: 30_000 });
      assert.match(await verdict.textContent(), /all 7 bands in range within tolerance/);
      assert.equal(await page.getByRole('heading', { name: 'Instrument check passed' }).count(), 1);
      const rows = page.getByTestId('check-bands').last().locator('tbody tr');
      assert.equal(await rows.count(), 7);
      assert.match(await rows.first().textContent(), /3060\.0.*Ph\. Eur\. 5\.0.*Within tolerance/);
      await page.getByTestId('spectrum-plot').last().locator('canvas').first().waitFor();
      await assertAccessible(page, 'the instrument check with its result');
      await showAndShoot(page, page.getByTestId('check-result').last(), 'inspector-instrument-check-passed');

      await page.locator('ion-button', { hasText: 'Back to Capture' }).last().click();
      await waitForPage(page, 'Capture');
      const inForce = page.getByTestId('instrument-check-status').last();
      await inForce.filter({ hasText: 'Instrument check in force: passed at' }).waitFor();
    });

    it('identifies an IR scan: plot, likely compounds with explained peaks, caution card to acknowledge', async () => {
      const { page } = browser;
      await choose(page, 'IR');
      await choose(page, 'Transmission');
      await importScan(page, fixture('synthetic-ir-ethanol-liquid.csv'));
      const plot = page.getByTestId('spectrum-plot').last();
      await plot.locator('canvas').first().waitFor();
      const first = page.getByTestId('candidate-ethanol').last();
      await first.waitFor();
      assert.match(await first.getByRole('heading', { level: 3 }).textContent(), /Ethanol/);
      assert.match(await first.getByTestId('band-agreement').textContent(), /^0\.\d\d$/);
      assert.ok((await first.getByTestId('explained-peaks').locator('tbody tr').count()) >= 5, 'explained peaks listed');
      assert.match(await first.getByTestId('explained-peaks').textContent(), /C–O stretch/);
      // Ethanol is flammable: its caution card is beside it, with pictograms, H-statements and the UN number.
      const card = first.getByTestId('caution-card-ethanol');
      assert.match(await card.textContent(), /GHS02.*H225.*UN 1170/s);
      const cautions = page.getByTestId('result-cautions').last();
      assert.match(await cautions.textContent(), /presumptive.*laboratory analysis.*SDS/s);
      // Apart from the caution that nothing here shows the sample is safe, "safe" appears nowhere.
      const resultText = (await page.getByTestId('scan-result').last().textContent()).replace(await cautions.textContent(), '');
      assert.doesNotMatch(resultText, /\bsafe\b|\bno hazard/i);
      await assertAccessible(page, 'the IR scan result');
      await showAndShoot(page, plot, 'inspector-ir-scan-plot');
      await showAndShoot(page, first, 'inspector-ir-likely-compounds');

      // Zoom by dragging across the plot, then back to the whole scan.
      const box = await plot.locator('.u-over').boundingBox();
      await page.mouse.move(box.x + box.width * 0.3, box.y + box.height / 2);
      await page.mouse.down();
      await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2, { steps: 5 });
      await page.mouse.up();
      await page.getByTestId('plot-reset').last().click();

      const acknowledge = page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' });
      assert.equal(await acknowledge.last().isDisabled(), true, 'the button waits for the checkbox');
      await page.getByLabel(/I have read the caution cards/).check();
      // The button enables on the checkbox's change event: click() waits for it to become enabled.
      await acknowledge.last().click();
      await page.getByTestId('acknowledged').last().waitFor();
    });

    it('re-runs the scan in the worker when a processing parameter changes', async () => {
      const { page } = browser;
      const panel = page.getByTestId('processing-panel').last();
      await panel.locator('summary').click();
      await panel.getByLabel('Peak threshold (× noise)').fill('60');
      await panel.getByRole('button', { name: 'Re-run with these values' }).click();
      await panel.locator('summary').filter({ hasText: 'peaks above 60 × noise' }).waitFor({ timeout: 30_000 });
      await showAndShoot(page, panel, 'inspector-processing-parameters');
      await panel.getByRole('button', { name: 'Back to defaults' }).click();
      await panel.locator('summary').filter({ hasText: 'peaks above 5 × noise' }).waitFor({ timeout: 30_000 });
    });

    it('shows the laser caution for Raman and sends an energetic finding to the safety officer', async () => {
      const { page } = browser;
      await choose(page, 'Raman');
      const laser = page.getByTestId('laser-caution').last();
      await laser.waitFor();
      assert.match(await laser.textContent(), /Raman lasers can ignite dark or energetic samples/);
      await choose(page, '785 nm');
      await importScan(page, fixture('synthetic-raman-ammonium-nitrate-785.csv'));
      const top = page.getByTestId('candidate-ammonium-nitrate').last();
      await top.waitFor();
      assert.match(await top.getByTestId('caution-card-ammonium-nitrate').textContent(), /GHS03/);
      const escalation = page.getByTestId('escalation-notice').last();
      assert.match(await escalation.textContent(), /goes to the safety officer.*will be sent to the safety officer when this scan is saved to a case/s);
      await assertAccessible(page, 'the Raman scan result');
      await showAndShoot(page, laser, 'inspector-raman-laser-caution');
      await showAndShoot(page, escalation, 'inspector-raman-escalation');
    });

    it('says clearly what is wrong with a malformed file and keeps the settings', async () => {
      const { page } = browser;
      await choose(page, 'IR');
      await importScan(page, { name: 'broken.csv', mimeType: 'text/csv', buffer: Buffer.from('wavenumber;what\nabc;def\nnot;numbers\n') });
      // Choosing IR re-reads the Raman file still chosen, which fails too: wait for the error about this file.
      const error = page.getByTestId('scan-error').filter({ hasText: 'Could not read broken.csv' }).last();
      await error.waitFor({ timeout: 30_000 });
      assert.ok((await error.textContent()).length > 60, 'the error explains itself');
      assert.equal(await page.getByTestId('scan-result').count(), 0, 'no stale result beside the error');
      assert.equal(await page.getByLabel('IR', { exact: true }).isChecked(), true);
      await assertAccessible(page, 'the import error');
      await showAndShoot(page, error, 'inspector-import-error');
    });

    it('imports and identifies offline once the service worker controls the page', async () => {
      const { page, context } = browser;
      await waitForServiceWorker(page);
      await context.setOffline(true);
      await page.reload();
      await waitForPage(page, 'Capture');
      await page.getByTestId('connection-status').last().filter({ hasText: 'Offline' }).waitFor();
      await choose(page, 'IR');
      await choose(page, 'Transmission');
      await importScan(page, fixture('synthetic-ir-ethanol-liquid.csv'));
      await page.getByTestId('spectrum-plot').last().locator('canvas').first().waitFor();
      await page.getByTestId('candidate-ethanol').last().waitFor();
      await page.getByTestId('instrument-check-status').last().filter({ hasText: 'Instrument check in force' }).waitFor();
      await screenshot(page, 'inspector-offline-scan');
      await context.setOffline(false);
      assert.deepEqual(browser.pageErrors, [], 'no script error during the identification run');
      assert.deepEqual(browser.foreignRequests, [], 'no request left the server');
    });

    it('reads well in the dark palette', async () => {
      const { page } = browser;
      await page.emulateMedia({ colorScheme: 'dark' });
      await page.reload();
      await waitForPage(page, 'Capture');
      await choose(page, 'IR');
      await choose(page, 'Transmission');
      await importScan(page, fixture('synthetic-ir-ethanol-liquid.csv'));
      await page.getByTestId('spectrum-plot').last().locator('canvas').first().waitFor();
      await assertAccessible(page, 'the IR scan result, dark palette');
      await showAndShoot(page, page.getByTestId('spectrum-plot').last(), 'dark-inspector-ir-scan');
      await page.emulateMedia({ colorScheme: 'light' });
    });
  });
}
