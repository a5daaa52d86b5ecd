// Browser end-to-end test of correcting a saved scan and captioning photos offline: the scan's phase is
// changed, its likely compounds are found again from the stored raw file and acknowledged anew; a photo
// gets a caption when taken and another one later; everything survives a reload offline and reaches the
// server with the next sync, which agrees with the tablet's new result; a later change on another device
// and here becomes a conflict shown in words and settled by keeping the tablet's copy. Registered in run.mjs.
// The site, sample and captions are an invented demo scenario.
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { gradientPng, readCapture, waitForSynced } from './capture.mjs';
import { caseOnServer, push } from './fieldCase.mjs';
import { apiToken, goOffline, newCaseOnTablet, newSampleOnTablet, signInTo, waitForPage } from './shell.mjs';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');
const FIXTURE = 'synthetic-ir-ethanol-liquid.csv';
const SITE = `Tannery yard drum store (e2e ${Date.now() % 100000})`;
const FIRST_CAPTION = 'Drum label, north side';
const SECOND_CAPTION = 'Drum label, north side: UN 1170 stencilled, bung loose';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

export function scanEditTests({ baseUrl, password }) {
  describe('correcting a saved scan and captioning photos offline', { concurrency: false }, () => {
    let browser;
    let token;
    let caseId;
    let sampleId;
    let scanUrl;
    let scanId;
    let photoId;
    let firstAcknowledgedAt;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      token = await apiToken(baseUrl, 'inspector@demo.test', password);
    });
    after(async () => {
      await browser?.close();
    });

    it('records a sample with a captioned photo and an acknowledged IR scan, and syncs them', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      caseId = await newCaseOnTablet(page, SITE);
      sampleId = await newSampleOnTablet(page, 'TY-01');

      await page.getByLabel('Caption for the photos you take now (optional)').filter({ visible: true }).fill(FIRST_CAPTION);
      await page.getByTestId('photo-input').filter({ visible: true }).setInputFiles({ name: 'drum.png', mimeType: 'image/png', buffer: gradientPng(320, 240, 60) });
      const photo = page.getByTestId('photo').filter({ visible: true }).first();
      await photo.getByTestId('photo-caption').filter({ hasText: FIRST_CAPTION }).waitFor();
      photoId = await photo.getAttribute('data-photo-id');
      assert.equal(await page.getByLabel('Caption for the photos you take now (optional)').filter({ visible: true }).inputValue(), '', 'the caption went with the photo');

      await page.getByTestId('add-scan').filter({ visible: true }).click();
      await waitForPage(page, 'New scan of TY-01');
      await page.getByTestId('scan-file').last().setInputFiles({ name: FIXTURE, mimeType: 'text/csv', buffer: readFileSync(join(SPECTRA, FIXTURE)) });
      await page.getByTestId('candidate-ethanol').last().waitFor({ timeout: 30_000 });
      await page.getByLabel(/I have read the caution cards/).check();
      await page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).last().click();
      await page.getByTestId('save-scan').last().click();
      await waitForPage(page, 'Scan of TY-01');
      scanUrl = page.url();
      scanId = scanUrl.split('/').pop();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const local = await waitForSynced(page);
      firstAcknowledgedAt = local.scans.find((s) => s.id === scanId).data.inspectorAcknowledgedAt;
      const detail = await caseOnServer(baseUrl, token, caseId);
      assert.equal(detail.attachments.find((a) => a.id === photoId)?.caption, FIRST_CAPTION);
      assert.deepEqual([detail.scans[0].phase, detail.scans[0].version], ['condensed', 1]);
    });

    it('offline: refuses to read the IR file as Raman, then re-runs the identification under the gas phase and asks for the acknowledgement again', async () => {
      const { page, context } = browser;
      await goOffline(page, context);
      await page.goto(scanUrl);
      await waitForPage(page, 'Scan of TY-01');
      const edit = page.getByTestId('scan-edit').filter({ visible: true });
      await edit.getByTestId('edit-scan').click();

      // The file's own axis says IR: relabelled Raman it is refused, and the saved values stay.
      await edit.getByLabel('Raman', { exact: true }).check();
      const refusal = edit.getByTestId('scan-error');
      await refusal.waitFor({ timeout: 30_000 });
      assert.match(await refusal.textContent(), /IR/);
      assert.match(await refusal.textContent(), /The saved scan is unchanged/);
      assert.equal(await edit.getByRole('button', { name: 'Save the corrected scan' }).isDisabled(), true);
      await assertAccessible(page, 'a scan correction the raw file refuses');
      await edit.getByLabel('IR', { exact: true }).check();

      await edit.getByLabel('Gas cell', { exact: true }).check();
      await edit.getByText('The settings changed: the likely compounds below are found again from the raw file.').waitFor();
      const acknowledge = edit.getByLabel(/I have read the caution cards/);
      await acknowledge.waitFor({ timeout: 30_000 });
      await edit.getByText('Identified from synthetic-ir-ethanol-liquid.csv.').waitFor({ timeout: 30_000 });
      assert.equal(await edit.getByRole('button', { name: 'Save the corrected scan' }).isDisabled(), true, 'nothing to save before the new result is acknowledged');
      await edit.getByText('Acknowledge the caution cards of the new result above before saving.').waitFor();
      await assertAccessible(page, 'a scan correction with its new result');
      await screenshot(page, 'scan-edit-new-result-800x1280');
      await acknowledge.check();
      await edit.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).click();
      await edit.getByTestId('save-scan-edit').click();
      await edit.getByText(/^Saved\./).waitFor();
      // The status reads the outbox through a live query: it turns after the save, not with it.
      await page.getByTestId('scan-sync').filter({ visible: true, hasText: 'Local only' }).waitFor();

      const local = await page.evaluate(readCapture);
      const scan = local.scans.find((s) => s.id === scanId);
      assert.deepEqual([scan.data.technique, scan.data.phase, scan.data.result.phase, scan.data.result.processing.phase], ['ir', 'gas', 'gas', 'gas']);
      assert.notEqual(scan.data.inspectorAcknowledgedAt, firstAcknowledgedAt);
      assert.ok(scan.data.inspectorAcknowledgedAt);
    });

    it('offline: changes a photo caption, and keeps both edits over a reload', async () => {
      const { page } = browser;
      await page.goto(`${baseUrl}/tabs/cases/${caseId}/samples/${sampleId}`);
      await waitForPage(page, 'Sample TY-01');
      const photo = page.locator(`[data-photo-id="${photoId}"]`).filter({ visible: true });
      await photo.getByTestId('edit-photo-caption').click();
      const field = photo.getByLabel('Caption of Photo 1 of sample TY-01');
      assert.equal(await field.inputValue(), FIRST_CAPTION);
      await field.fill('x'.repeat(501));
      await photo.getByRole('button', { name: 'Save caption' }).click();
      await photo.getByRole('alert').filter({ hasText: 'caption must be at most 500 characters; this one has 501' }).waitFor();
      await assertAccessible(page, 'a caption refused as too long');
      await field.fill(SECOND_CAPTION);
      await photo.getByRole('button', { name: 'Save caption' }).click();
      await photo.getByTestId('photo-caption').filter({ hasText: SECOND_CAPTION }).waitFor();
      await assertAccessible(page, 'the sample page with a captioned photo');
      await screenshot(page, 'photo-caption-edited-800x1280');

      await page.reload();
      await waitForPage(page, 'Sample TY-01');
      await page.locator(`[data-photo-id="${photoId}"]`).filter({ visible: true }).getByTestId('photo-caption').filter({ hasText: SECOND_CAPTION }).waitFor();
      await page.goto(scanUrl);
      await waitForPage(page, 'Scan of TY-01');
      const local = await page.evaluate(readCapture);
      assert.deepEqual(local.outbox.map((e) => [e.entity, e.id]).sort(), [['attachment', photoId], ['scan', scanId]].sort());
      assert.equal(local.photos.find((p) => p.id === photoId).uploadedAt !== null, true, 'the photo stays uploaded');
    });

    it('syncs: the server has the new phase, result and caption, sent no photo bytes again, and agrees with the new result', async () => {
      const { page, context } = browser;
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      const uploads = [];
      page.on('request', (request) => {
        if (request.method() === 'PUT' && request.url().includes('/content')) uploads.push(request.url());
      });
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      assert.deepEqual(uploads, [], 'no file is uploaded again for a caption or a scan correction');

      let detail;
      for (let attempt = 0; attempt < 150; attempt += 1) {
        detail = await caseOnServer(baseUrl, token, caseId);
        if (detail.scans[0]?.serverRecomputedAt || detail.scans[0]?.serverRecomputeError) break;
        await page.waitForTimeout(200);
      }
      const scan = detail.scans[0];
      assert.deepEqual([scan.phase, scan.version, scan.result.phase], ['gas', 2, 'gas']);
      assert.equal(scan.serverRecomputeError, null);
      assert.equal(scan.resultMismatch, false);
      const photo = detail.attachments.find((a) => a.id === photoId);
      assert.deepEqual([photo.caption, photo.version, photo.receivedBytes === photo.size], [SECOND_CAPTION, 2, true]);
    });

    it('a scan changed on another device and here shows both copies in words, and "keep mine" sends the tablet copy with its own acknowledgement', async () => {
      const { page, context } = browser;
      const before = (await caseOnServer(baseUrl, token, caseId)).scans[0];
      const fields = ['sampleId', 'technique', 'phase', 'excitationNm', 'recordedAt', 'instrumentCheckId', 'rawAttachmentId', 'rawSha256', 'parsedSummary', 'result', 'inspectorAcknowledgedAt'];
      const data = Object.fromEntries(fields.filter((f) => f in before && before[f] !== null).map((f) => [f, before[f]]));
      // Another tablet of the same inspector acknowledges the gas-phase result again.
      await push(baseUrl, token, [{ entity: 'scan', id: scanId, baseVersion: before.version, data: { ...data, inspectorAcknowledgedAt: new Date().toISOString() } }], 'e2e-second-tablet');

      // Offline, this tablet sets the phase back to solid or liquid, identifies again and acknowledges.
      await goOffline(page, context);
      await page.goto(scanUrl);
      await waitForPage(page, 'Scan of TY-01');
      const edit = page.getByTestId('scan-edit').filter({ visible: true });
      await edit.getByTestId('edit-scan').click();
      await edit.getByLabel('Solid or liquid', { exact: true }).check();
      const acknowledge = edit.getByLabel(/I have read the caution cards/);
      await acknowledge.waitFor({ timeout: 30_000 });
      await acknowledge.check();
      await edit.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).click();
      await edit.getByTestId('save-scan-edit').click();
      await edit.getByText(/^Saved\./).waitFor();
      const mine = (await page.evaluate(readCapture)).scans.find((s) => s.id === scanId).data;
      assert.equal(mine.phase, 'condensed');

      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const item = page.getByTestId(`conflict-${scanId}`).filter({ visible: true });
      await item.waitFor();
      const phaseRow = item.locator('tr', { has: page.getByRole('rowheader', { name: /^Phase/ }) });
      assert.deepEqual(await phaseRow.locator('th, td').allTextContents(), ['Phase (differs)', 'Solid or liquid', 'Gas cell']);
      const acknowledgedRow = item.locator('tr', { has: page.getByRole('rowheader', { name: /^Acknowledged by the inspector/ }) });
      // Both copies were acknowledged (times shown to the minute), so both count as reviewed by inspector.
      const acknowledged = await acknowledgedRow.locator('td').allTextContents();
      assert.equal(acknowledged.length, 2);
      for (const cell of acknowledged) assert.match(cell, /\d/);
      assert.match(await item.textContent(), /Top likely compounds.*band agreement/s);
      assert.doesNotMatch(await item.textContent(), /[{}]|object Object/, 'no raw JSON');
      assert.ok(!(await item.textContent()).includes(mine.rawSha256), 'no hash');
      await assertAccessible(page, 'the case page with a scan conflict');
      await item.scrollIntoViewIfNeeded();
      await screenshot(page, 'scan-edit-conflict-800x1280');

      await item.getByRole('button', { name: 'Keep mine' }).click();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      const after = (await caseOnServer(baseUrl, token, caseId)).scans[0];
      assert.deepEqual([after.phase, after.result.phase, after.version], ['condensed', 'condensed', before.version + 2]);
      assert.equal(new Date(after.inspectorAcknowledgedAt).toISOString(), mine.inspectorAcknowledgedAt, "the tablet's result with the tablet's acknowledgement");
      assert.deepEqual(browser.pageErrors, []);
    });
  });
}
