// Browser end-to-end test of editing and deleting on an open case offline: the edits and deletes wait on
// the tablet, survive a reload, and reach the server with the next sync; a case or sample that records
// below still hold says so instead of being deleted. Registered in run.mjs.
// The site, sample and notes are an invented demo scenario.
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { gradientPng, readCapture, waitForSynced } from './capture.mjs';
import { caseOnServer } from './fieldCase.mjs';
import { apiToken, goOffline, newCaseOnTablet, newSampleOnTablet, signInTo, waitForPage } from './shell.mjs';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');
const SITE = `Riverside solvent store (e2e ${Date.now() % 100000})`;
const YARD = `Old tannery yard (e2e ${Date.now() % 100000})`;
const EMPTY = `Empty kiosk (e2e ${Date.now() % 100000})`;

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

/** The visible site note holding this text. */
const noteWith = (page, text) => page.getByTestId('site-note').filter({ visible: true }).filter({ hasText: text });

export function editingTests({ baseUrl, password }) {
  describe('editing and deleting on an open case offline', { concurrency: false }, () => {
    let browser;
    let token;
    let caseId;
    let sampleId;
    let deletedPhoto;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      token = await apiToken(baseUrl, 'inspector@demo.test', password);
    });
    after(async () => {
      await browser?.close();
    });

    it('records a case with a sample, two photos and two notes, and syncs them', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      caseId = await newCaseOnTablet(page, SITE, { address: 'Mill Lane 3, Ashbury' });
      for (const text of ['Three unlabelled cans by the door.', 'Strong draught through the east window.']) {
        await page.getByLabel('New site note', { exact: true }).filter({ visible: true }).fill(text);
        await page.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
        await noteWith(page, text).waitFor();
      }
      await page.getByTestId('new-sample').filter({ visible: true }).click();
      await waitForPage(page, 'New sample');
      await page.getByLabel('Label', { exact: true }).filter({ visible: true }).fill('RS-01');
      await page.getByLabel('Container', { exact: true }).filter({ visible: true }).fill('Steel can, 5 L');
      await page.getByRole('button', { name: 'Save sample' }).filter({ visible: true }).click();
      await waitForPage(page, 'Sample RS-01');
      sampleId = page.url().split('/').pop();
      await page.getByTestId('photo-input').filter({ visible: true }).setInputFiles([
        { name: 'can-front.png', mimeType: 'image/png', buffer: gradientPng(320, 240, 90) },
        { name: 'can-cap.png', mimeType: 'image/png', buffer: gradientPng(240, 320, 160) },
      ]);
      await page.getByTestId('photo').filter({ visible: true }).nth(1).waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      const detail = await caseOnServer(baseUrl, token, caseId);
      assert.deepEqual([detail.samples.length, detail.notes.length, detail.attachments.length], [1, 2, 2]);
    });

    it('edits the case, the sample and a note offline, deletes a note and a photo after asking, and keeps it all over a reload', async () => {
      const { page, context } = browser;
      await goOffline(page, context);

      // The sample's fields.
      await page.goto(`${baseUrl}/tabs/cases/${caseId}/samples/${sampleId}`);
      await waitForPage(page, 'Sample RS-01');
      await page.getByLabel('Container', { exact: true }).filter({ visible: true }).fill('Steel can, 5 L, dented');
      await page.getByLabel('Location on site', { exact: true }).filter({ visible: true }).fill('Shelf B, floor level');
      await page.getByRole('button', { name: 'Save sample' }).filter({ visible: true }).click();
      await page.getByTestId('sample-sync').filter({ visible: true }).filter({ hasText: 'Local only' }).waitFor();

      // The case's fields.
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.locator('ion-button', { hasText: 'Edit visit details' }).filter({ visible: true }).click();
      await waitForPage(page, 'Edit case');
      await page.getByLabel('Address', { exact: true }).filter({ visible: true }).fill('Mill Lane 3a, Ashbury');
      await page.getByLabel('Weather', { exact: true }).filter({ visible: true }).fill('Cold, dry, still air');
      await page.getByRole('button', { name: 'Save case' }).filter({ visible: true }).click();
      await waitForPage(page, SITE);

      // A note edited in place.
      await noteWith(page, 'Three unlabelled cans').getByTestId('edit-note').click();
      await page.getByLabel('Text of the note', { exact: true }).filter({ visible: true }).fill('Three unlabelled cans by the door, one leaking.');
      await page.getByRole('button', { name: 'Save note' }).filter({ visible: true }).click();
      await noteWith(page, 'one leaking').waitFor();

      // A note deleted: asked first, "Keep it" keeps it, "Yes, delete" deletes it.
      const draught = noteWith(page, 'Strong draught');
      await draught.getByTestId('delete-note').click();
      await draught.getByTestId('delete-note-confirm').waitFor();
      await assertAccessible(page, 'the case page asking before a delete');
      await screenshot(page, 'editing-confirm-delete-note-800x1280');
      await draught.getByRole('button', { name: 'Keep it' }).click();
      await draught.getByTestId('delete-note').waitFor();
      await draught.getByTestId('delete-note').click();
      await draught.getByRole('button', { name: 'Yes, delete' }).click();
      await draught.waitFor({ state: 'detached' });

      // The photos of every sample on the case page: one opens full size, the other is deleted.
      const photos = page.getByTestId('case-photos').filter({ visible: true });
      const group = photos.getByTestId('photo-group').filter({ hasText: 'Sample RS-01' });
      await group.getByTestId('photo').nth(1).waitFor();
      assert.match(await group.textContent(), /2 photos/);
      await group.getByRole('button', { name: 'Open Photo 1 of sample RS-01 full size' }).click();
      const viewer = group.getByTestId('photo-viewer').first();
      await viewer.waitFor({ state: 'visible' });
      await assertAccessible(page, 'a photo opened full size');
      await screenshot(page, 'editing-photo-full-size-800x1280');
      await viewer.getByRole('button', { name: 'Close' }).click();
      await viewer.waitFor({ state: 'hidden' });
      const second = group.getByTestId('photo').nth(1);
      deletedPhoto = await second.getAttribute('data-photo-id');
      await second.getByTestId('delete-photo').click();
      await second.getByRole('button', { name: 'Yes, delete' }).click();
      await page.locator(`[data-photo-id="${deletedPhoto}"]`).waitFor({ state: 'detached' });
      assert.match(await group.textContent(), /1 photo(?!s)/);
      await assertAccessible(page, 'the case page after the deletes');
      await screenshot(page, 'editing-case-offline-800x1280');

      // Nothing deleted has left the tablet: the records wait, hidden, with their delete changes.
      const local = await page.evaluate(readCapture);
      assert.equal(local.photos.find((p) => p.id === deletedPhoto)?.deletePending, true);
      assert.equal(local.notes.filter((n) => n.caseId === caseId && n.deletePending).length, 1);
      assert.deepEqual(local.outbox.map((e) => [e.entity, e.op]).sort(), [['attachment', 'delete'], ['case', 'upsert'], ['note', 'delete'], ['note', 'upsert'], ['sample', 'upsert']]);

      await page.reload();
      await waitForPage(page, SITE);
      await noteWith(page, 'one leaking').waitFor();
      assert.equal(await noteWith(page, 'Strong draught').count(), 0);
      const kept = page.getByTestId('case-photos').filter({ visible: true }).getByTestId('photo');
      await kept.first().waitFor();
      assert.equal(await kept.count(), 1);
      await page.getByText('Mill Lane 3a, Ashbury').filter({ visible: true }).first().waitFor();
    });

    it('syncs the edits and the deletes: the server has them, and only then do the deleted records leave the tablet', async () => {
      const { page, context } = browser;
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const local = await waitForSynced(page);
      assert.equal(local.photos.some((p) => p.id === deletedPhoto), false);
      assert.equal(local.notes.filter((n) => n.caseId === caseId).length, 1);

      const detail = await caseOnServer(baseUrl, token, caseId);
      assert.equal(detail.case.address, 'Mill Lane 3a, Ashbury');
      assert.equal(detail.case.weatherNotes, 'Cold, dry, still air');
      assert.deepEqual(detail.samples.map((s) => [s.id, s.container, s.locationOnSite]), [[sampleId, 'Steel can, 5 L, dented', 'Shelf B, floor level']]);
      assert.deepEqual(detail.notes.map((n) => n.text), ['Three unlabelled cans by the door, one leaking.']);
      assert.deepEqual(detail.attachments.map((a) => a.id).includes(deletedPhoto), false);
      assert.equal(detail.attachments.length, 1);
      // The deletions travel to other devices as tombstones.
      const pulled = await (await fetch(`${baseUrl}/api/sync/pull?cursor=0&limit=1000`, { headers: { Authorization: `Bearer ${token}` } })).json();
      assert.equal(pulled.changes.find((c) => c.id === deletedPhoto)?.deleted, true);
    });

    it('makes the case read-only once submitted: no edit or delete is offered', async () => {
      const { page } = browser;
      await page.getByTestId('case-submit-toggle').filter({ visible: true }).click();
      await page.getByTestId('case-submit-toggle').filter({ visible: true }).filter({ hasText: 'Reopen case' }).waitFor();
      assert.equal(await page.getByTestId('edit-note').filter({ visible: true }).count(), 0);
      assert.equal(await page.getByTestId('delete-note').filter({ visible: true }).count(), 0);
      assert.equal(await page.getByTestId('delete-photo').filter({ visible: true }).count(), 0);
      // Photos still open full size on a read-only case.
      await page.getByTestId('case-photos').filter({ visible: true }).getByRole('button', { name: /full size/ }).first().waitFor();
      await assertAccessible(page, 'the submitted case');
    });
  });

  describe('deleting a case, a sample and a scan offline, and what holds one', { concurrency: false }, () => {
    let browser;
    let token;
    let yardId;
    let emptyId;
    let heldSample;
    let freeSample;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      token = await apiToken(baseUrl, 'inspector@demo.test', password);
    });
    after(async () => {
      await browser?.close();
    });

    async function newCase(page, site) {
      await page.goto(`${baseUrl}/tabs/cases`);
      await waitForPage(page, 'Cases');
      return newCaseOnTablet(page, site);
    }

    it('records a case with a sample handed over and one not, and an empty case, and syncs them', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      emptyId = await newCase(page, EMPTY);
      yardId = await newCase(page, YARD);
      heldSample = await newSampleOnTablet(page, 'TY-01');
      const custody = page.getByRole('form', { name: 'New hand-over' }).filter({ visible: true });
      await custody.getByLabel('Received by', { exact: true }).fill('Courier J. Demo');
      await custody.getByRole('button', { name: 'Record hand-over' }).click();
      await page.getByTestId('handovers').filter({ visible: true }).getByText('Courier J. Demo').waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      freeSample = await newSampleOnTablet(page, 'TY-02');
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      const yard = await caseOnServer(baseUrl, token, yardId);
      assert.deepEqual(yard.samples.map((s) => s.id).sort(), [heldSample, freeSample].sort());
      assert.equal((await caseOnServer(baseUrl, token, emptyId)).case.siteName, EMPTY);
    });

    it('offline, says plainly why a handed-over sample and a case with samples cannot go, and deletes a sample and an empty case after asking', async () => {
      const { page, context } = browser;
      await goOffline(page, context);

      // A sample with a hand-over: the action names what holds it, and nothing is queued.
      await page.goto(`${baseUrl}/tabs/cases/${yardId}/samples/${heldSample}`);
      await waitForPage(page, 'Sample TY-01');
      await page.getByTestId('delete-sample').filter({ visible: true }).click();
      const refused = page.getByTestId('delete-sample-refused').filter({ visible: true });
      await refused.waitFor();
      assert.equal(
        (await refused.locator('p').textContent()).trim(),
        'This sample holds 1 hand-over. Permanent records are never deleted (hand-overs), so this sample cannot be deleted.',
      );
      await assertAccessible(page, 'a sample refusing its delete');
      await screenshot(page, 'editing-sample-delete-refused-800x1280');
      const understood = refused.getByRole('button', { name: 'Understood' });
      const box = await understood.boundingBox();
      assert.ok(box && box.height >= 48, `the button is ${box?.height} px high`);
      await understood.click();
      await page.getByTestId('delete-sample').filter({ visible: true }).waitFor();
      assert.equal((await page.evaluate(readCapture)).outbox.length, 0);

      // The case holds its two samples: delete them first.
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      await page.getByTestId('delete-case').filter({ visible: true }).click();
      assert.equal(
        (await page.getByTestId('delete-case-refused').filter({ visible: true }).locator('p').textContent()).trim(),
        'This case holds 2 samples. Delete its samples first, then the case.',
      );
      await page.getByRole('button', { name: 'Understood' }).filter({ visible: true }).click();

      // A sample without scans or hand-overs: asked first, then deleted, and the case page again.
      await page.goto(`${baseUrl}/tabs/cases/${yardId}/samples/${freeSample}`);
      await waitForPage(page, 'Sample TY-02');
      await page.getByTestId('delete-sample').filter({ visible: true }).click();
      const confirm = page.getByTestId('delete-sample-confirm').filter({ visible: true });
      await confirm.waitFor();
      assert.match(await confirm.textContent(), /Delete this sample\?/);
      await assertAccessible(page, 'a sample asking before its delete');
      const yes = confirm.getByRole('button', { name: 'Yes, delete' });
      assert.ok((await yes.boundingBox()).height >= 48);
      await yes.click();
      await waitForPage(page, YARD);
      await page.getByTestId('sample-TY-01').filter({ visible: true }).waitFor();
      assert.equal(await page.getByTestId('sample-TY-02').filter({ visible: true }).count(), 0);

      // The empty case: asked, deleted, back to the list of cases without it.
      await page.goto(`${baseUrl}/tabs/cases/${emptyId}`);
      await waitForPage(page, EMPTY);
      await page.getByTestId('delete-case').filter({ visible: true }).click();
      await page.getByTestId('delete-case-confirm').filter({ visible: true }).getByRole('button', { name: 'Yes, delete' }).click();
      await waitForPage(page, 'Cases');
      await page.getByText(YARD).filter({ visible: true }).first().waitFor();
      assert.equal(await page.getByText(EMPTY).filter({ visible: true }).count(), 0);

      // Both wait on the tablet, hidden, with their delete changes, also after a reload.
      await page.reload();
      await waitForPage(page, 'Cases');
      await page.getByText(YARD).filter({ visible: true }).first().waitFor();
      assert.equal(await page.getByText(EMPTY).filter({ visible: true }).count(), 0);
      const local = await page.evaluate(readCapture);
      assert.equal(local.cases.find((c) => c.id === emptyId)?.deletePending, true);
      assert.equal(local.samples.find((s) => s.id === freeSample)?.deletePending, true);
      assert.deepEqual(local.outbox.map((e) => [e.entity, e.op, e.id]).sort(), [['case', 'delete', emptyId], ['sample', 'delete', freeSample]].sort());
    });

    it('syncs the deletes: the server keeps them as tombstones, the handed-over sample stays', async () => {
      const { page, context } = browser;
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const local = await waitForSynced(page);
      assert.equal(local.cases.some((c) => c.id === emptyId), false);
      assert.equal(local.samples.some((s) => s.id === freeSample), false);

      const gone = await fetch(`${baseUrl}/api/cases/${emptyId}`, { headers: { Authorization: `Bearer ${token}` } });
      assert.equal(gone.status, 404);
      assert.deepEqual((await caseOnServer(baseUrl, token, yardId)).samples.map((s) => s.id), [heldSample]);
      const pulled = await (await fetch(`${baseUrl}/api/sync/pull?cursor=0&limit=1000`, { headers: { Authorization: `Bearer ${token}` } })).json();
      const tombstone = (id) => pulled.changes.find((c) => c.id === id);
      assert.equal(tombstone(emptyId)?.deleted, true);
      assert.equal(tombstone(freeSample)?.deleted, true);
      assert.equal(tombstone(heldSample)?.deleted, false);
    });

    it('deletes a synced scan offline after asking: the scan goes, its raw file stays on the tablet and the server', async () => {
      const { page, context } = browser;
      await page.goto(`${baseUrl}/tabs/cases/${yardId}/samples/${heldSample}`);
      await waitForPage(page, 'Sample TY-01');
      const library = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/library' && r.ok());
      await page.getByTestId('add-scan').filter({ visible: true }).click();
      await waitForPage(page, 'New scan of TY-01');
      await library;
      const name = 'synthetic-ir-ethanol-liquid.csv';
      await page.getByTestId('scan-file').last().setInputFiles({ name, mimeType: 'text/csv', buffer: readFileSync(join(SPECTRA, name)) });
      await page.getByTestId('candidate-ethanol').last().waitFor({ timeout: 30_000 });
      await page.getByLabel(/I have read the caution cards/).check();
      await page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).last().click();
      await page.getByTestId('save-scan').last().click();
      await waitForPage(page, 'Scan of TY-01');
      const scanUrl = page.url();
      const scanId = scanUrl.split('/').pop();
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const synced = await waitForSynced(page);
      const rawId = synced.scans.find((s) => s.id === scanId).data.rawAttachmentId;
      assert.equal(synced.escalations.filter((e) => e.data.scanId === scanId).length, 0, 'a scan an escalation holds could not be deleted');

      await goOffline(page, context);
      await page.goto(scanUrl);
      await waitForPage(page, 'Scan of TY-01');
      await page.getByTestId('delete-scan').filter({ visible: true }).click();
      const confirm = page.getByTestId('delete-scan-confirm').filter({ visible: true });
      assert.match(await confirm.textContent(), /Delete this scan\?.*Its raw file stays: a permanent record/s);
      await assertAccessible(page, 'a scan asking before its delete');
      await screenshot(page, 'editing-scan-confirm-delete-800x1280');
      await confirm.getByRole('button', { name: 'Yes, delete' }).click();
      await waitForPage(page, 'Sample TY-01');
      await page.getByText('No scans of this sample yet.').filter({ visible: true }).waitFor();
      await page.reload();
      await waitForPage(page, 'Sample TY-01');
      assert.equal(await page.getByTestId('sample-scan').filter({ visible: true }).count(), 0);
      const local = await page.evaluate(readCapture);
      assert.equal(local.scans.find((s) => s.id === scanId)?.deletePending, true);
      const raw = local.photos.find((p) => p.id === rawId);
      assert.equal(raw?.deletePending, undefined);
      assert.ok(raw.byteLength > 0, 'the raw file keeps its bytes on the tablet');
      assert.deepEqual(local.outbox.map((e) => [e.entity, e.op, e.id]), [['scan', 'delete', scanId]]);

      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${yardId}`);
      await waitForPage(page, YARD);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const after = await waitForSynced(page);
      assert.equal(after.scans.some((s) => s.id === scanId), false);
      assert.ok(after.photos.some((p) => p.id === rawId), 'the raw file stays on the tablet');
      const pulled = await (await fetch(`${baseUrl}/api/sync/pull?cursor=0&limit=1000`, { headers: { Authorization: `Bearer ${token}` } })).json();
      assert.equal(pulled.changes.find((c) => c.id === scanId)?.deleted, true);
      assert.equal(pulled.changes.find((c) => c.id === rawId)?.deleted, false);
    });
  });
}
