// Browser end-to-end test of the share target: another app shares a scan export and a photo to the
// installed app (a multipart POST the service worker takes), and the inspector files them with a sample.
// Registered in run.mjs. The site and sample are an invented demo scenario.
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { newCaseOnTablet, newSampleOnTablet, signInTo, waitForPage, waitForServiceWorker } from './shell.mjs';

const FIXTURES = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures');
const SITE = `Quay drain outfall (share e2e ${Date.now() % 100000})`;
const SCAN_NAME = 'synthetic-ir-ethanol-liquid.csv';
const PHOTO_NAME = 'outfall.png';

/** Runs inside the page: what the operating system does when a file is shared to the installed app. */
function shareToApp({ files }) {
  const form = document.createElement('form');
  form.method = 'POST';
  form.action = '/share-target';
  form.enctype = 'multipart/form-data';
  const input = document.createElement('input');
  input.type = 'file';
  input.name = 'files';
  input.multiple = true;
  const transfer = new DataTransfer();
  for (const { name, type, base64 } of files) {
    transfer.items.add(new File([Uint8Array.from(atob(base64), (c) => c.charCodeAt(0))], name, { type }));
  }
  input.files = transfer.files;
  form.append(input);
  document.body.append(form);
  form.submit();
}

export function shareTargetTests({ baseUrl, password }) {
  describe('share target', { concurrency: false }, () => {
    let browser;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
    });
    after(async () => {
      await browser?.close();
    });

    it('takes a scan file and a photo shared from another app and files them with the chosen sample', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      await waitForServiceWorker(page);

      await newCaseOnTablet(page, SITE);
      await newSampleOnTablet(page, 'QD-01');
      const sampleUrl = page.url();

      const scan = readFileSync(join(FIXTURES, 'spectra', SCAN_NAME));
      const photo = readFileSync(join(FIXTURES, '..', 'pwa', 'public', 'icons', 'siteband-192.png'));
      await page.evaluate(shareToApp, {
        files: [
          { name: SCAN_NAME, type: 'text/csv', base64: scan.toString('base64') },
          { name: PHOTO_NAME, type: 'image/png', base64: photo.toString('base64') },
        ],
      });
      await waitForPage(page, 'Shared files');
      assert.match(page.url(), /\/tabs\/capture\/shared\?received=2$/);
      const cards = page.getByTestId('shared-file').filter({ visible: true });
      await cards.nth(1).waitFor();
      assert.deepEqual((await cards.locator('h3').allTextContents()).sort(), [PHOTO_NAME, SCAN_NAME].sort());
      assert.equal(await cards.getByRole('button', { name: 'Import as a scan of this sample' }).isDisabled(), true, 'nothing is filed before a sample is chosen');
      assert.deepEqual(await blockingViolations(page), [], 'axe on the shared files screen');
      await screenshot(page, 'share-target-shared-files-800x1280');

      await page.getByLabel('Case', { exact: true }).filter({ visible: true }).selectOption({ label: SITE });
      await page.getByLabel('Sample', { exact: true }).filter({ visible: true }).selectOption({ label: 'QD-01' });
      await cards.filter({ hasText: PHOTO_NAME }).getByRole('button', { name: 'Add as a photo of this sample' }).click();
      await cards.filter({ hasText: PHOTO_NAME }).waitFor({ state: 'detached' });

      await cards.filter({ hasText: SCAN_NAME }).getByRole('button', { name: 'Import as a scan of this sample' }).click();
      await waitForPage(page, 'New scan of QD-01');
      await page.getByTestId('candidate-ethanol').last().waitFor({ timeout: 30_000 });
      await page.getByLabel(/I have read the caution cards/).check();
      await page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).last().click();
      await page.getByTestId('save-scan').last().click();
      await waitForPage(page, 'Scan of QD-01');
      // Kept byte for byte, as a picked file would be.
      assert.equal((await page.getByTestId('scan-sha256').filter({ visible: true }).textContent()).trim(), createHash('sha256').update(scan).digest('hex'));

      // Both files are filed, so nothing waits any more; the photo is on the sample.
      await page.goto(`${baseUrl}/tabs/capture/shared`);
      await waitForPage(page, 'Shared files');
      await page.getByText('No shared files are waiting on this tablet.').filter({ visible: true }).waitFor();
      await page.goto(sampleUrl);
      await waitForPage(page, 'Sample QD-01');
      await page.getByTestId('photo').filter({ visible: true }).first().waitFor();
      assert.equal(await page.getByTestId('photo').filter({ visible: true }).count(), 1);
      assert.deepEqual(browser.pageErrors, []);
    });
  });
}
