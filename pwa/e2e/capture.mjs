// Browser end-to-end tests of the inspector's offline field capture and its sync with the server.
// Registered in run.mjs. The site, sample and people below are an invented demo scenario.
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { deflateSync } from 'node:zlib';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { push } from './fieldCase.mjs';
import { apiToken, goOffline, openTab, signInTo, signOut, waitForPage } from './shell.mjs';

const SPECTRA = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'fixtures', 'spectra');
const SITE = `Harbour shed 7 (e2e ${Date.now() % 100000})`;

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

function crc32(bytes) {
  let crc = ~0;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k += 1) crc = (crc >>> 1) ^ (0xedb88320 & -(crc & 1));
  }
  return ~crc >>> 0;
}

/** A small RGB PNG with a colour gradient, so each generated photo has different bytes. */
export function gradientPng(width, height, tint) {
  const chunk = (type, data) => {
    const head = Buffer.alloc(8);
    head.writeUInt32BE(data.length, 0);
    head.write(type, 4, 'ascii');
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, 'ascii'), data])), 0);
    return Buffer.concat([head, data, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  const rows = [];
  for (let y = 0; y < height; y += 1) {
    const row = Buffer.alloc(1 + width * 3);
    for (let x = 0; x < width; x += 1) row.set([(x * 255) / width, (y * 255) / height, tint], 1 + x * 3);
    rows.push(row);
  }
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(Buffer.concat(rows))), chunk('IEND', Buffer.alloc(0))]);
}

/** Runs inside the page: the capture tables read straight from IndexedDB, not through the app's code. */
export function readCapture() {
  return new Promise((resolve, reject) => {
    const open = indexedDB.open('siteband');
    open.onerror = () => reject(open.error);
    open.onsuccess = () => {
      const names = ['cases', 'samples', 'handovers', 'notes', 'photos', 'scans', 'escalations', 'outbox'];
      const tx = open.result.transaction([...names, 'attachmentBytes']);
      const out = {};
      for (const name of names) {
        const all = tx.objectStore(name).getAll();
        all.onsuccess = () => {
          out[name] = all.result;
        };
      }
      // Each attachment's file is kept in its own store; a photo row shows how many bytes of it the tablet holds.
      const files = new Map();
      const bytes = tx.objectStore('attachmentBytes').openCursor();
      bytes.onsuccess = () => {
        const cursor = bytes.result;
        if (!cursor) return;
        files.set(cursor.key, cursor.value.bytes.byteLength);
        cursor.continue();
      };
      tx.oncomplete = () => {
        open.result.close();
        out.photos = out.photos.map((photo) => ({ ...photo, byteLength: files.get(photo.id) }));
        resolve(out);
      };
      tx.onerror = () => reject(tx.error);
    };
  });
}

/**
 * True for a file this tablet holds bytes of that the server has not verified yet. A file pulled as
 * metadata only (its bytes are on another tablet, still to come) is not this tablet's to send.
 */
const waitsForUpload = (p) => p.byteLength !== undefined && !p.uploadedAt;

/** Waits until the outbox is empty and the server has verified every file this tablet holds (up to 30 s). */
export async function waitForSynced(page) {
  for (let attempt = 0; attempt < 150; attempt += 1) {
    const local = await page.evaluate(readCapture);
    if (local.outbox.length === 0 && !local.photos.some(waitsForUpload)) return local;
    await page.waitForTimeout(200);
  }
  const local = await page.evaluate(readCapture);
  const waiting = local.photos.filter(waitsForUpload).map(({ id, sync, uploadRefused, rejectedReason }) => ({ id, sync, uploadRefused, rejectedReason }));
  throw new Error(`Not synced after 30 s: outbox ${JSON.stringify(local.outbox)}, files not on the server ${JSON.stringify(waiting)}`);
}

export function captureTests({ baseUrl, password }) {
  async function api(path, token) {
    const response = await fetch(`${baseUrl}${path}`, { headers: { Authorization: `Bearer ${token}` } });
    assert.equal(response.status, 200, `${path} answered ${response.status}`);
    return response;
  }

  describe('field capture offline and sync', { concurrency: false }, () => {
    let browser;
    let token;
    let caseId;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      token = await apiToken(baseUrl, 'inspector@demo.test', password);
    });
    after(async () => {
      await browser?.close();
    });

    it('records a case, a sample with two photos, site notes and a hand-over offline, and keeps them over a reload', async () => {
      const { page, context } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      await goOffline(page, context);

      await page.getByTestId('new-case').filter({ visible: true }).click();
      await waitForPage(page, 'New case');
      await page.getByLabel('Site name', { exact: true }).fill(SITE);
      await page.getByLabel('Address', { exact: true }).fill('Quay Road 12, Eastport');
      // No position permission is granted to this browser: the form says so and takes typed coordinates.
      await page.getByRole('button', { name: "Use this tablet's position" }).filter({ visible: true }).click();
      await page.getByTestId('location-source').filter({ visible: true }).filter({ hasText: 'type latitude and longitude by hand' }).waitFor();
      await page.getByLabel(/^Latitude/).fill('51.4502');
      await page.getByLabel(/^Longitude/).fill('-2.5973');
      await page.getByLabel('Weather', { exact: true }).fill('Overcast, light wind from the west');
      await page.getByLabel('Access notes', { exact: true }).fill('Side gate; key from the harbour office');
      await assertAccessible(page, 'the new-case page');
      await screenshot(page, 'capture-new-case-800x1280');
      await page.getByRole('button', { name: 'Save case' }).filter({ visible: true }).click();
      await waitForPage(page, SITE);
      caseId = page.url().split('/').pop();
      assert.equal((await page.getByTestId('case-sync').filter({ visible: true }).textContent()).trim(), 'Local only');

      await page.getByLabel('New site note', { exact: true }).filter({ visible: true }).fill('Two drums without labels behind the forklift bay.');
      await page.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
      await page.getByTestId('site-note').filter({ hasText: 'Two drums' }).waitFor();

      await page.getByTestId('new-sample').filter({ visible: true }).click();
      await waitForPage(page, 'New sample');
      await page.getByLabel('Label', { exact: true }).filter({ visible: true }).fill('HS7-01');
      await page.getByLabel('Container', { exact: true }).filter({ visible: true }).fill('Blue 200 L drum');
      await page.getByLabel('Seal number', { exact: true }).filter({ visible: true }).fill('SB-004211');
      await page.getByLabel('Colour', { exact: true }).filter({ visible: true }).fill('Off-white');
      await page.getByLabel('Physical state', { exact: true }).filter({ visible: true }).selectOption('powder');
      assert.match(await page.getByTestId('no-odour').filter({ visible: true }).textContent(), /Never sniff/);
      await assertAccessible(page, 'the new-sample page');
      await page.getByRole('button', { name: 'Save sample' }).filter({ visible: true }).click();
      await waitForPage(page, 'Sample HS7-01');

      await page.getByTestId('photo-input').filter({ visible: true }).setInputFiles([
        { name: 'drum-front.png', mimeType: 'image/png', buffer: gradientPng(320, 240, 40) },
        { name: 'drum-seal.png', mimeType: 'image/png', buffer: gradientPng(240, 320, 200) },
      ]);
      await page.getByTestId('photo').filter({ visible: true }).nth(1).waitFor();

      const custody = page.getByRole('form', { name: 'New hand-over' }).filter({ visible: true });
      await custody.getByLabel('Received by', { exact: true }).fill('K. Marlow, evidence store');
      await custody.getByLabel('Seal number', { exact: true }).fill('SB-004211');
      await custody.getByLabel('Note', { exact: true }).fill('Sealed bag, intact');
      await custody.getByRole('button', { name: 'Record hand-over' }).click();
      await page.getByTestId('handovers').filter({ visible: true }).getByText('K. Marlow, evidence store').waitFor();

      await page.getByLabel('New site note', { exact: true }).filter({ visible: true }).fill('Powder caked at the rim of the drum.');
      await page.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
      await page.getByTestId('site-note').filter({ hasText: 'caked' }).waitFor();
      await assertAccessible(page, 'the sample page');
      await page.getByTestId('photo').filter({ visible: true }).first().scrollIntoViewIfNeeded();
      await screenshot(page, 'capture-sample-offline-800x1280');

      await page.reload();
      await waitForPage(page, 'Sample HS7-01');
      assert.equal(await page.getByTestId('photo').filter({ visible: true }).count(), 2);
      await page.getByTestId('handovers').filter({ visible: true }).getByText('SB-004211').waitFor();
      await page.getByTestId('site-note').filter({ hasText: 'caked' }).waitFor();
      await page.goto(`${baseUrl}/tabs/cases`);
      await waitForPage(page, 'Cases');
      const card = page.getByTestId(`case-${caseId}`);
      await card.waitFor();
      assert.match(await card.textContent(), /1 sample/);
      assert.match(await card.textContent(), /Local only/);
      await assertAccessible(page, 'the cases list offline');
      await screenshot(page, 'capture-cases-offline-800x1280');
      await card.click();
      await waitForPage(page, SITE);
      await page.getByTestId('site-note').filter({ hasText: 'Two drums' }).waitFor();
      await assertAccessible(page, 'the case page');
      await screenshot(page, 'capture-case-offline-800x1280');

      // Signing out now would lose the records: it is refused with a reason.
      await openTab(page, 'Account');
      await page.getByRole('button', { name: 'Sign out' }).filter({ visible: true }).click();
      await page.getByText('Some records have not reached the server yet').waitFor();
      // The notice slides in: wait for its entry to finish before the picture.
      await page.waitForFunction(() => getComputedStyle(document.querySelector('ion-toast').shadowRoot.querySelector('.toast-wrapper')).opacity === '1');
      assert.match(page.url(), /\/tabs\/account$/);
      await screenshot(page, 'capture-sign-out-refused-800x1280');
      await page.locator('ion-toast').getByRole('button', { name: 'Close' }).click();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);

      const local = await page.evaluate(readCapture);
      assert.equal(local.outbox.length, 7, 'one change each: case, sample, two photos, hand-over and two site notes');
    });

    it('syncs when the network is back, and the server holds every record and photo with matching SHA-256', async () => {
      const { page, context } = browser;
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const local = await waitForSynced(page);
      await page.getByTestId('case-sync').filter({ visible: true }).filter({ hasText: 'On server' }).waitFor();
      await screenshot(page, 'capture-case-synced-800x1280');

      const detail = await (await api(`/api/cases/${caseId}`, token)).json();
      assert.equal(detail.case.siteName, SITE);
      assert.equal(detail.case.latitude, 51.4502);
      assert.equal(detail.case.locationEnteredByHand, true);
      assert.deepEqual(detail.samples.map((s) => [s.label, s.sealNumber, s.observations.state]), [['HS7-01', 'SB-004211', 'powder']]);
      assert.deepEqual(detail.handovers.map((h) => [h.to, h.sealNumber]), [['K. Marlow, evidence store', 'SB-004211']]);
      assert.equal(detail.notes.length, 2);
      const photos = local.photos.filter((p) => p.caseId === caseId);
      assert.equal(photos.length, 2);
      assert.equal(detail.attachments.length, 2);
      for (const photo of photos) {
        const server = detail.attachments.find((a) => a.id === photo.id);
        assert.ok(server, `photo ${photo.id} is on the server`);
        assert.equal(server.sha256, photo.data.sha256);
        assert.ok(server.uploadedAt, 'the upload completed');
        const bytes = Buffer.from(await (await api(`/api/attachments/${photo.id}/content`, token)).arrayBuffer());
        assert.equal(createHash('sha256').update(bytes).digest('hex'), photo.data.sha256, 'the stored bytes hash to the declared SHA-256');
        assert.equal(bytes.subarray(0, 3).toString('hex'), 'ffd8ff', 'the photo was re-encoded as JPEG on the tablet');
      }
    });

    it('delivers a change exactly once when the answer to a push is lost', async () => {
      const { page } = browser;
      const text = `Wind turned east at ${Date.now()}`;
      let lost = 0;
      // The server receives and commits the push; the tablet never hears the answer.
      await page.route('**/api/sync/push', async (route) => {
        await route.fetch();
        lost += 1;
        await route.abort('connectionreset');
      });
      await page.getByLabel('New site note', { exact: true }).filter({ visible: true }).fill(text);
      await page.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await page.getByTestId('sync-status').filter({ visible: true }).filter({ hasText: 'Last sync failed' }).waitFor();
      assert.equal(lost, 1);
      await page.unroute('**/api/sync/push');
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);

      const detail = await (await api(`/api/cases/${caseId}`, token)).json();
      assert.equal(detail.notes.filter((n) => n.text === text).length, 1, 'the note is on the server once');
      assert.equal(detail.notes.length, 3);
      assert.equal(detail.samples.length, 1);
      assert.equal(detail.handovers.length, 1);
      assert.equal(detail.attachments.length, 2);
    });

    it('saves an acknowledged Raman scan to the sample offline with its raw file and escalation, and syncs them', async () => {
      const { page, context } = browser;
      const sample = (await page.evaluate(readCapture)).samples.find((s) => s.caseId === caseId);
      await page.goto(`${baseUrl}/tabs/cases/${caseId}/samples/${sample.id}`);
      await waitForPage(page, 'Sample HS7-01');
      // Opened online, the scan screen receives the library in force (edited by supervisors in
      // the library suite), which the server's recomputation uses too.
      const library = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/library' && r.ok());
      await page.getByTestId('add-scan').filter({ visible: true }).click();
      await waitForPage(page, 'New scan of HS7-01');
      await library;
      await context.setOffline(true);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Offline' }).waitFor();
      await page.getByLabel('Raman', { exact: true }).check();
      await page.getByLabel('785 nm', { exact: true }).check();
      const name = 'synthetic-raman-ammonium-nitrate-785.csv';
      const raw = readFileSync(join(SPECTRA, name));
      await page.getByTestId('scan-file').last().setInputFiles({ name, mimeType: 'text/csv', buffer: raw });
      await page.getByTestId('candidate-ammonium-nitrate').last().waitFor({ timeout: 30_000 });
      assert.equal(await page.getByTestId('save-scan').count(), 0, 'nothing to save before the caution card is acknowledged');
      await page.getByLabel(/I have read the caution cards/).check();
      await page.getByRole('button', { name: 'Acknowledge and mark reviewed by inspector' }).last().click();
      const save = page.getByTestId('save-scan').last();
      await save.waitFor();
      await assertAccessible(page, 'the sample scan screen, acknowledged');
      await save.scrollIntoViewIfNeeded();
      await screenshot(page, 'capture-sample-scan-acknowledged-800x1280');
      await save.click();
      await waitForPage(page, 'Scan of HS7-01');
      const scanUrl = page.url();
      await page.getByTestId('scan-escalation').filter({ visible: true }).waitFor();
      assert.equal((await page.getByTestId('scan-sha256').filter({ visible: true }).textContent()).trim(), createHash('sha256').update(raw).digest('hex'));
      await assertAccessible(page, 'the saved scan offline');

      await page.reload();
      await waitForPage(page, 'Scan of HS7-01');
      assert.match(await page.getByTestId('stored-candidates').filter({ visible: true }).textContent(), /Ammonium nitrate/);
      assert.equal((await page.getByTestId('scan-sync').filter({ visible: true }).textContent()).trim(), 'Local only');
      const local = await page.evaluate(readCapture);
      const scan = local.scans.find((s) => s.data.sampleId === sample.id);
      assert.ok(scan.data.inspectorAcknowledgedAt, 'the scan is saved as reviewed by the inspector');
      assert.equal(local.escalations.filter((e) => e.data.scanId === scan.id).length, 1);
      await page.goto(`${baseUrl}/tabs/cases/${caseId}/samples/${sample.id}`);
      await waitForPage(page, 'Sample HS7-01');
      const listed = page.getByTestId('sample-scan').filter({ visible: true });
      assert.match(await listed.textContent(), /Raman.*Ammonium nitrate.*Caution card acknowledged.*Local only/s);
      await assertAccessible(page, 'the sample page with a scan');
      await listed.scrollIntoViewIfNeeded();
      await screenshot(page, 'capture-sample-scans-offline-800x1280');

      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);

      let detail;
      for (let attempt = 0; attempt < 150; attempt += 1) {
        detail = await (await api(`/api/cases/${caseId}`, token)).json();
        if (detail.scans[0]?.serverRecomputedAt || detail.scans[0]?.serverRecomputeError) break;
        await page.waitForTimeout(200);
      }
      assert.equal(detail.scans.length, 1);
      const onServer = detail.scans[0];
      assert.equal(onServer.id, scan.id);
      assert.equal(onServer.serverRecomputeError, null);
      assert.equal(onServer.resultMismatch, false, `the server's recomputation agrees: ${JSON.stringify(onServer.mismatch)}`);
      const rawOnServer = detail.attachments.find((a) => a.id === onServer.rawAttachmentId);
      assert.equal(rawOnServer.kind, 'raw-scan');
      assert.equal(rawOnServer.sha256, onServer.rawSha256);
      const bytes = Buffer.from(await (await api(`/api/attachments/${rawOnServer.id}/content`, token)).arrayBuffer());
      assert.ok(bytes.equals(raw), 'the raw file is kept byte for byte');
      assert.deepEqual(detail.escalations.map((e) => [e.scanId, e.status]), [[scan.id, 'raised']]);
      assert.ok(detail.escalations[0].hazardClasses.length > 0);

      // The next pull brings the server's check to the tablet.
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      await page.goto(scanUrl);
      await waitForPage(page, 'Scan of HS7-01');
      await page.locator('[data-testid="server-check"][data-mismatch="false"]').filter({ visible: true }).waitFor();
      await assertAccessible(page, 'the synced scan');
      await screenshot(page, 'capture-sample-scan-synced-800x1280');
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, SITE);
    });

    it('shows both copies when the case changed on the server too, and "keep mine" sends the tablet copy on top', async () => {
      const { page } = browser;
      const before = (await (await api(`/api/cases/${caseId}`, token)).json()).case;
      const fields = ['siteName', 'address', 'latitude', 'longitude', 'locationAccuracyM', 'locationEnteredByHand', 'startedAt', 'weatherNotes', 'accessNotes', 'status'];
      const data = Object.fromEntries(fields.filter((f) => f in before).map((f) => [f, before[f]]));
      // Another tablet of the same inspector changes the weather first.
      await push(baseUrl, token, [{ entity: 'case', id: caseId, baseVersion: before.version, data: { ...data, weatherNotes: 'Heavy rain from noon' } }], 'e2e-second-tablet');

      await page.locator('ion-button', { hasText: 'Edit visit details' }).filter({ visible: true }).click();
      await waitForPage(page, 'Edit case');
      await page.getByLabel('Weather', { exact: true }).filter({ visible: true }).fill('Drizzle, wind from the east');
      await page.getByRole('button', { name: 'Save case' }).filter({ visible: true }).click();
      await waitForPage(page, SITE);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const conflicts = page.getByTestId('conflicts').filter({ visible: true });
      await conflicts.waitFor();
      assert.match(await conflicts.textContent(), /Heavy rain from noon/);
      assert.match(await conflicts.textContent(), /Drizzle, wind from the east/);
      assert.equal((await page.getByTestId('case-sync').filter({ visible: true }).textContent()).trim(), 'Conflict');
      await assertAccessible(page, 'the case page with a conflict');
      await screenshot(page, 'capture-case-conflict-800x1280');

      await conflicts.getByRole('button', { name: 'Keep mine' }).click();
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      await waitForSynced(page);
      await page.getByTestId('case-sync').filter({ visible: true, hasText: 'On server' }).waitFor();
      const after = (await (await api(`/api/cases/${caseId}`, token)).json()).case;
      assert.equal(after.weatherNotes, 'Drizzle, wind from the east');
      assert.equal(after.version, before.version + 2);

      await openTab(page, 'Cases');
      await page.getByTestId(`case-${caseId}`).filter({ hasText: 'On server' }).waitFor();
      await screenshot(page, 'capture-cases-synced-800x1280');

      // With everything on the server, signing out is allowed and leaves no field records on the tablet.
      await signOut(page);
      const left = await page.evaluate(readCapture);
      assert.deepEqual([left.cases.length, left.samples.length, left.photos.length, left.outbox.length], [0, 0, 0, 0]);
      assert.deepEqual(browser.pageErrors, []);
    });
  });
}
