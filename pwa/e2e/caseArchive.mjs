// Browser end-to-end test of a case carried between tablets as one file: exported on one browser profile
// offline, imported on a fresh profile of the same inspector, synced, and checked on the server.
// Registered in run.mjs. The site and sample are an invented demo scenario.
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { gradientPng, readCapture, waitForSynced } from './capture.mjs';
import { caseOnServer } from './fieldCase.mjs';
import { apiToken, goOffline, newCaseOnTablet, newSampleOnTablet, signInTo, waitForPage } from './shell.mjs';

const SITE = `Lock keeper's store (e2e ${Date.now() % 100000})`;
const sha256 = (bytes) => createHash('sha256').update(bytes).digest('hex');

export function caseArchiveTests({ baseUrl, password }) {
  describe('a case carried between tablets as one file', { concurrency: false }, () => {
    let first;
    let second;
    let token;
    let caseId;
    let archive;
    let fileName;
    before(async () => {
      first = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      second = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      token = await apiToken(baseUrl, 'inspector@demo.test', password);
    });
    after(async () => {
      await first?.close();
      await second?.close();
    });

    it('exports a case recorded offline to <site>-<date>.zip', async () => {
      const { page, context } = first;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      await goOffline(page, context);
      caseId = await newCaseOnTablet(page, SITE);
      await newSampleOnTablet(page, 'LK-01');
      await page.getByTestId('photo-input').filter({ visible: true }).setInputFiles([{ name: 'sack.png', mimeType: 'image/png', buffer: gradientPng(200, 160, 90) }]);
      await page.getByTestId('photo').filter({ visible: true }).first().waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);

      const download = page.waitForEvent('download');
      await page.getByTestId('case-export').filter({ visible: true }).click();
      const file = await download;
      fileName = file.suggestedFilename();
      archive = await readFile(await file.path());
      assert.match(fileName, /^lock-keeper-s-store-e2e-\d+-\d{4}-\d\d-\d\d\.zip$/);
      assert.equal(archive.subarray(0, 4).toString('hex'), '504b0304', 'a ZIP file');
      await page.getByTestId('case-export-done').filter({ visible: true }).filter({ hasText: '3 records; files: 1' }).waitFor();
      assert.deepEqual([...new Set((await page.evaluate(readCapture)).outbox.map((e) => e.status))], ['sending'], 'the exported changes are fixed for delivery');
      assert.deepEqual(await blockingViolations(page), [], 'axe on the case page after the export');
      await screenshot(page, 'case-archive-exported-800x1280');
    });

    it('imports the file on a fresh tablet of the same inspector, shows the case, syncs it, and a second import skips everything', async () => {
      const { page } = second;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      const local = await first.page.evaluate(readCapture);
      const photo = local.photos.find((p) => p.caseId === caseId);

      await page.getByTestId('case-import-file').filter({ visible: true }).setInputFiles({ name: fileName, mimeType: 'application/zip', buffer: archive });
      await page.getByTestId('case-import-imported').filter({ visible: true }).filter({ hasText: '3 records added' }).waitFor();
      assert.deepEqual(await blockingViolations(page), [], 'axe on the cases list after an import');
      await screenshot(page, 'case-archive-imported-800x1280');
      await page.getByTestId('case-import-open').filter({ visible: true }).click();
      await waitForPage(page, SITE);
      await page.getByText('LK-01').filter({ visible: true }).first().waitFor();

      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const synced = await waitForSynced(page);
      assert.equal(synced.photos.find((p) => p.id === photo.id).data.sha256, photo.data.sha256);

      await page.goto(`${baseUrl}/tabs/cases`);
      await waitForPage(page, 'Cases');
      await page.getByTestId('case-import-file').filter({ visible: true }).setInputFiles({ name: fileName, mimeType: 'application/zip', buffer: archive });
      await page.getByTestId('case-import-unchanged').filter({ visible: true }).filter({ hasText: '3 records already here' }).waitFor();
      assert.equal(await page.getByTestId('case-import-imported').count(), 0);

      const detail = await caseOnServer(baseUrl, token, caseId);
      assert.equal(detail.case.siteName, SITE);
      assert.deepEqual(detail.samples.map((s) => s.label), ['LK-01']);
      assert.equal(detail.attachments.length, 1);
      assert.equal(detail.attachments[0].sha256, photo.data.sha256);
      const bytes = Buffer.from(await (await fetch(`${baseUrl}/api/attachments/${photo.id}/content`, { headers: { Authorization: `Bearer ${token}` } })).arrayBuffer());
      assert.equal(sha256(bytes), photo.data.sha256, 'the stored photo hashes to the SHA-256 the first tablet recorded');
    });

    it('the server takes the same file as already there, and the first tablet’s own late sync duplicates nothing', async () => {
      const form = new FormData();
      form.append('file', new Blob([archive], { type: 'application/zip' }), fileName);
      const response = await fetch(`${baseUrl}/api/cases/import`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
      assert.equal(response.status, 200);
      const answer = await response.json();
      assert.deepEqual(answer.records.map((r) => r.outcome), ['unchanged', 'unchanged', 'unchanged']);
      assert.deepEqual(answer.files.map((f) => f.outcome), ['unchanged']);

      const { page, context } = first;
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      await page.getByTestId('case-sync').filter({ visible: true }).filter({ hasText: 'On server' }).waitFor();

      const detail = await caseOnServer(baseUrl, token, caseId);
      assert.equal(detail.samples.length, 1);
      assert.equal(detail.attachments.length, 1);
      assert.equal(detail.case.version, 1, 'no second write of the case');
      assert.equal(detail.samples[0].version, 1);
    });
  });
}
