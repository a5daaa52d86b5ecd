// One step shared by the browser tests that need an escalation raised on the tablet.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { waitForPage } from './shell.mjs';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');
const FIXTURE = 'synthetic-raman-ammonium-nitrate-785.csv';

/**
 * On a sample's page: records a 785 nm Raman scan of the synthetic ammonium nitrate file, acknowledges
 * its caution cards, saves it and waits for the escalation it raises on the tablet. Returns the scan's id.
 */
export async function recordHazardousScan(page, sampleLabel) {
  await page.getByTestId('add-scan').filter({ visible: true }).click();
  await waitForPage(page, `New scan of ${sampleLabel}`);
  await page.getByLabel('Raman', { exact: true }).check();
  await page.getByLabel('785 nm', { exact: true }).check();
  await page.getByTestId('scan-file').last().setInputFiles({ name: FIXTURE, mimeType: 'text/csv', buffer: readFileSync(join(SPECTRA, FIXTURE)) });
  await page.getByTestId('candidate-ammonium-nitrate').last().waitFor({ timeout: 30_000 });
  await page.getByLabel(/I have read the caution cards/).check();
  await page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).last().click();
  await page.getByTestId('save-scan').last().click();
  await waitForPage(page, `Scan of ${sampleLabel}`);
  await page.getByTestId('scan-escalation').filter({ visible: true }).waitFor();
  return page.url().split('/').pop();
}
