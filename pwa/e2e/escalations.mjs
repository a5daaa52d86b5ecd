// Browser end-to-end test of the escalation workflow across two roles against a running server: an
// inspector's synced hazardous scan raises an escalation, the safety officer's open inbox shows it live
// (with a browser notification), the safety officer acknowledges it, and the inspector's tablet shows
// who acknowledged it, with which action, after the next sync. Registered in run.mjs.
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { recordHazardousScan } from './hazardousScan.mjs';
import { apiToken, signInTo, signOut, waitForPage } from './shell.mjs';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

export function escalationTests({ baseUrl, password }) {
  describe('escalations: raised by a synced scan, acknowledged by the safety officer, seen on the tablet', { concurrency: false }, () => {
    let inspector;
    let officer;
    const site = `Grain silo 3 (e2e ${Date.now() % 100000})`;
    const caseId = crypto.randomUUID();
    const sampleId = crypto.randomUUID();

    before(async () => {
      inspector = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      officer = await openBrowser({ origin: baseUrl, width: 1024, height: 900 });
      // The case and its sample reach the server the way another tablet of this inspector would send them.
      const token = await apiToken(baseUrl, 'inspector@demo.test', password);
      const now = new Date().toISOString();
      const push = await fetch(`${baseUrl}/api/sync/push`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
        body: JSON.stringify({
          clientId: 'e2e-escalations',
          batchId: crypto.randomUUID(),
          changes: [
            {
              changeId: crypto.randomUUID(), entity: 'case', op: 'upsert', id: caseId, baseVersion: null,
              data: { siteName: site, address: 'Mill Lane 4, Eastport', latitude: null, longitude: null, locationAccuracyM: null, locationEnteredByHand: false, startedAt: now, weatherNotes: null, accessNotes: null, status: 'open' },
            },
            {
              changeId: crypto.randomUUID(), entity: 'sample', op: 'upsert', id: sampleId, baseVersion: null,
              data: { caseId, label: 'GS3-01', container: 'Paper sack', description: 'White prills', locationOnSite: 'Loading bay', observations: { state: 'solid' }, collectedBy: 'R. Inspector', collectedAt: now, sealNumber: 'S-3301' },
            },
          ],
        }),
      });
      assert.equal(push.status, 200);
      assert.deepEqual((await push.json()).results.map((r) => r.status), ['applied', 'applied']);
    });
    after(async () => {
      await inspector?.close();
      await officer?.close();
    });

    it("brings the inspector's synced hazardous scan into the safety officer's inbox as a raised escalation", async () => {
      const { page: so } = officer;
      await signInTo(so, baseUrl, 'safety@demo.test', password, 'Escalations');
      await assertAccessible(so, 'the escalation inbox');

      // The inspector records a Raman scan of ammonium nitrate on the synced sample and syncs.
      const { page } = inspector;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      // The tablet's first sync brings the case pushed above.
      await page.getByTestId(`case-${caseId}`).filter({ visible: true }).waitFor({ timeout: 30_000 });
      await page.goto(`${baseUrl}/tabs/cases/${caseId}/samples/${sampleId}`);
      await waitForPage(page, 'Sample GS3-01');
      await recordHazardousScan(page, 'GS3-01');
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, site);
      await page.getByTestId('sync-now').filter({ visible: true }).click();

      const soToken = await apiToken(baseUrl, 'safety@demo.test', password);
      for (let attempt = 0; attempt < 150; attempt += 1) {
        const raised = await (await fetch(`${baseUrl}/api/escalations?status=raised`, { headers: { Authorization: `Bearer ${soToken}` } })).json();
        if (raised.items.some((e) => e.caseId === caseId)) break;
        await so.waitForTimeout(200);
      }
      await so.getByTestId('inbox-filter-raised').filter({ visible: true }).click();
      const card = so.locator('[data-testid^="escalation-"]').filter({ hasText: site });
      await card.waitFor();
      assert.match(await card.textContent(), /Raised/);
      assert.match(await card.textContent(), /Ammonium nitrate/);
      await assertAccessible(so, 'the inbox with a raised escalation');
      await screenshot(so, 'safety-inbox-raised');
    });

    it('acknowledges with PPE level B and a comment, and adds a note', async () => {
      const { page: so } = officer;
      const card = so.locator('[data-testid^="escalation-"]').filter({ hasText: site });
      await card.click();
      await waitForPage(so, 'Escalation');
      const summary = so.getByTestId('escalation-summary').filter({ visible: true });
      assert.match(await summary.textContent(), new RegExp(site.replace(/[()]/g, '\\$&')));
      await so.getByTestId('caution-card-ammonium-nitrate').filter({ visible: true }).waitFor();
      await assertAccessible(so, 'the escalation page');
      await screenshot(so, 'safety-escalation-raised');

      // Acknowledging without an action is refused on the page, before anything is sent.
      const form = so.getByTestId('acknowledge-form').filter({ visible: true });
      await form.getByRole('button', { name: 'Acknowledge escalation' }).click();
      assert.equal((await form.getByRole('alert').textContent()).trim(), 'Choose the action taken.');
      await form.getByLabel('PPE required').check();
      await form.getByLabel('Level B').check();
      await form.getByLabel('Comment (optional)').fill('Level B until the laboratory confirms');
      await form.getByRole('button', { name: 'Acknowledge escalation' }).click();
      const ack = so.getByTestId('acknowledgement').filter({ visible: true });
      await ack.waitFor();
      assert.match(await ack.textContent(), /^Acknowledged by .+ at .+: PPE required, level B/);
      assert.match(await ack.textContent(), /Level B until the laboratory confirms/);

      await so.getByLabel('Add a note').filter({ visible: true }).fill('Fire service informed; area cordoned');
      await so.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
      await so.getByTestId('escalation-notes').filter({ visible: true }).filter({ hasText: 'Fire service informed; area cordoned' }).waitFor();
      await assertAccessible(so, 'the acknowledged escalation');
      await screenshot(so, 'safety-escalation-acknowledged');
    });

    it('shows on the inspector\'s tablet who acknowledged it and the action taken, after sync and offline', async () => {
      const { page, context } = inspector;
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, site);
      await page.getByTestId('sync-now').filter({ visible: true }).click();
      const panel = page.getByTestId('case-escalations').filter({ visible: true });
      await panel.getByTestId('acknowledgement').waitFor({ timeout: 30_000 });
      assert.match(await panel.textContent(), /Acknowledged by .+ at .+: PPE required, level B/);
      assert.match(await panel.textContent(), /Fire service informed; area cordoned/);

      await context.setOffline(true);
      await page.reload();
      await waitForPage(page, site);
      const offline = page.getByTestId('case-escalations').filter({ visible: true });
      await offline.getByTestId('acknowledgement').waitFor();
      assert.match(await offline.textContent(), /PPE required, level B/);
      await assertAccessible(page, 'the case page with an acknowledged escalation, offline');
      await screenshot(page, 'inspector-case-escalation-acknowledged-800x1280');
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
    });

    it('says plainly when someone else closed it first, then shows the closed state; the inbox filter finds it', async () => {
      const { page: so } = officer;
      // Live events held back, so this page keeps the version it saw while another screen closes the escalation.
      await so.route('**/api/events', (route) => route.abort());
      await so.reload();
      await waitForPage(so, 'Escalation');
      const close = so.getByTestId('close-form').filter({ visible: true });
      await close.getByRole('button', { name: 'Close escalation' }).click();
      assert.equal((await close.getByRole('alert').textContent()).trim(), 'Say why the escalation can be closed.');

      const id = new URL(so.url()).pathname.split('/').pop();
      const token = await apiToken(baseUrl, 'safety@demo.test', password);
      const seen = await (await fetch(`${baseUrl}/api/escalations/${id}`, { headers: { Authorization: `Bearer ${token}` } })).json();
      const closedElsewhere = await fetch(`${baseUrl}/api/escalations/${id}/close`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
        body: JSON.stringify({ comment: 'Laboratory confirmed; sacks removed by the specialist team', baseVersion: seen.version }),
      });
      assert.equal(closedElsewhere.status, 200);

      await close.getByLabel('Closing comment').fill('Closing from the tablet in the van');
      await close.getByRole('button', { name: 'Close escalation' }).click();
      const refused = so.getByRole('alert').filter({ hasText: 'Someone changed this escalation meanwhile' }).filter({ visible: true });
      await refused.waitFor();
      await so.getByTestId('closed-line').filter({ visible: true }).filter({ hasText: 'Laboratory confirmed' }).waitFor();
      await assertAccessible(so, 'the escalation closed elsewhere');
      await screenshot(so, 'safety-escalation-closed-elsewhere');
      await so.unroute('**/api/events');

      await so.locator('ion-button.sb-back').filter({ visible: true, hasText: 'Back to the inbox' }).click();
      await waitForPage(so, 'Escalations');
      await so.getByTestId('inbox-filter-closed').filter({ visible: true }).click();
      await so.locator('[data-testid^="escalation-"]').filter({ hasText: site }).filter({ hasText: 'Closed' }).waitFor();
      await so.getByTestId('inbox-filter-raised').filter({ visible: true }).click();
      // The closed escalation leaves the list once the raised ones have loaded.
      await so.locator('[data-testid^="escalation-"]').filter({ visible: true }).filter({ hasText: site }).waitFor({ state: 'detached' });
      assert.match(so.url(), /status=raised/);
      await assertAccessible(so, 'the inbox filtered');
      await screenshot(so, 'safety-inbox-closed-filter');
    });

    it('an escalation the inspector raises by hand, offline, reaches the inbox after sync', async () => {
      const { page, context } = inspector;
      const reason = 'Second drum bulging and hissing at the bung (demo)';
      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, site);
      await context.setOffline(true);
      const panel = page.getByTestId('raise-escalation').filter({ visible: true });
      await panel.getByRole('button', { name: 'Raise escalation' }).click();
      assert.equal((await panel.getByRole('alert').textContent()).trim(), 'Write what you see first.');
      await panel.getByLabel('What you see and why it is dangerous').fill(reason);
      await panel.locator('summary').click();
      await panel.getByLabel('Flammable gas', { exact: true }).check();
      await panel.getByRole('button', { name: 'Raise escalation' }).click();
      await panel.getByTestId('escalation-raised').waitFor();
      await page.getByTestId('case-escalations').filter({ visible: true }).filter({ hasText: reason }).waitFor();
      await assertAccessible(page, 'the case page with an escalation raised by hand, offline');
      await screenshot(page, 'inspector-escalation-raised-by-hand-800x1280');
      await context.setOffline(false);
      await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Online' }).waitFor();
      await page.getByTestId('sync-now').filter({ visible: true }).click();

      const token = await apiToken(baseUrl, 'safety@demo.test', password);
      let found;
      for (let i = 0; i < 150 && !found; i += 1) {
        const raised = await (await fetch(`${baseUrl}/api/escalations?status=raised&pageSize=100`, { headers: { Authorization: `Bearer ${token}` } })).json();
        found = raised.items.find((e) => e.reason === reason);
        if (!found) await page.waitForTimeout(200);
      }
      assert.ok(found, 'the escalation raised by hand is on the server');
      assert.deepEqual(found.hazardClasses, ['flammable-gas']);
      const { page: so } = officer;
      await so.getByTestId(`escalation-${found.id}`).filter({ visible: true }).waitFor({ timeout: 30_000 });
      await signOut(so);
      await signOut(page);
    });
  });
}
