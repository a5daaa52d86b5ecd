// Browser end-to-end tests of the supervisor's review: the queue (filters in the link, CSV), the
// case review page with its evidence, a decision per scan, the refusal of a stale decision, and a
// case returned with a comment. Registered in run.mjs. Sites and people are invented demo data.
import assert from 'node:assert/strict';
import { readFile } from 'node:fs/promises';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { submitFieldCase } from './fieldCase.mjs';
import { apiToken, signInTo, waitForPage } from './shell.mjs';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

export function reviewTests({ baseUrl, password }) {
  describe('supervisor review', { concurrency: false }, () => {
    const site = `Quayside drum store ${Date.now() % 100000} (e2e)`;
    let browser;
    let field;
    let supervisorToken;

    async function bundle() {
      const response = await fetch(`${baseUrl}/api/review/cases/${field.caseId}`, { headers: { Authorization: `Bearer ${supervisorToken}` } });
      assert.equal(response.status, 200);
      return response.json();
    }

    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 1280, height: 900 });
      field = await submitFieldCase({ baseUrl, token: await apiToken(baseUrl, 'inspector@demo.test', password), site });
      supervisorToken = await apiToken(baseUrl, 'supervisor@demo.test', password);
    });
    after(async () => {
      await browser?.close();
    });

    it('finds the submitted case by a filter, keeps the filter in the link, and exports the matching rows as CSV', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'supervisor@demo.test', password, 'Review queue');
      await page.getByTestId('queue-count').filter({ visible: true }).waitFor();
      const form = page.getByRole('search', { name: 'Filters of the review queue' });
      await form.getByLabel('Site name contains').fill(site);
      await form.getByRole('button', { name: 'Apply filters' }).click();
      const row = page.getByTestId(`queue-item-${field.caseId}`);
      // The case is on the unfiltered first page too: wait for the filtered count, not only for its row.
      await page.getByTestId('queue-count').filter({ hasText: /^\s*1 case matches\.\s*$/ }).waitFor();
      await row.waitFor();
      assert.match(await row.textContent(), /Submitted.*Demo Inspector|Submitted/s);
      assert.match(await row.textContent(), /Ethanol/);
      assert.match(page.url(), /[?&]site=/);
      await assertAccessible(page, 'the review queue, desktop');
      await row.scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-review-queue-1280x900');

      // The link restores the filter.
      await page.reload();
      await page.getByTestId(`queue-item-${field.caseId}`).waitFor();
      assert.equal(await form.getByLabel('Site name contains').inputValue(), site);

      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('queue-csv').click()]);
      const csv = await readFile(await download.path(), 'utf8');
      assert.ok(csv.includes(site), 'the CSV holds the filtered case');
      assert.equal(csv.trim().split('\n').length, 2, 'a header and the one matching row');

      // On a tablet the same queue is a list of large cards.
      await page.setViewportSize({ width: 800, height: 1280 });
      await page.getByTestId('queue-cards').waitFor();
      await page.getByTestId(`queue-item-${field.caseId}`).scrollIntoViewIfNeeded();
      await assertAccessible(page, 'the review queue, tablet');
      await screenshot(page, 'supervisor-review-queue-800x1280');
      await page.setViewportSize({ width: 1280, height: 900 });
    });

    it('opens the case with its spectrum, evidence, chain of custody and site notes, and accepts the scan', async () => {
      const { page } = browser;
      await page.getByTestId(`queue-item-${field.caseId}`).locator('a, ion-item').first().click();
      await waitForPage(page, site);
      const scan = page.getByTestId(`review-scan-${field.scanId}`);
      await scan.getByTestId('candidate-ethanol').waitFor({ timeout: 30_000 });
      assert.ok((await scan.getByTestId('explained-peaks').count()) > 0, 'the explained peaks are listed');
      await scan.locator('canvas').first().waitFor();
      await scan.getByTestId('server-check').waitFor();
      assert.match(await page.getByTestId('review-handovers').textContent(), /Courier J\. Demo/);
      assert.match(await page.getByText('Sweet solvent-like smell').textContent(), /drum label torn/);
      await assertAccessible(page, 'the case review page');
      await screenshot(page, 'supervisor-case-review-1280x900');
      await scan.scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-case-review-scan-1280x900');
      await scan.getByTestId(`scan-decision-${field.scanId}`).scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-case-review-decision-1280x900');

      await scan.getByLabel('Accept Ethanol').check();
      await scan.getByRole('button', { name: 'Record the decision' }).click();
      await scan.getByTestId('decision-line').filter({ hasText: 'Accepted Ethanol' }).waitFor();
      assert.equal((await page.getByTestId('review-case-status').textContent()).trim(), 'In review');
    });

    it('refuses a decision made on an old version of the case, and decides again after a reload', async () => {
      const { page } = browser;
      // The page's live refresh is held back (its reads of the case fail) until the decision is sent,
      // so the page decides on the version it showed however slowly the steps below run.
      const caseUrl = `${baseUrl}/api/review/cases/${field.caseId}`;
      await page.route(caseUrl, (route) => route.abort());
      // Another supervisor decides meanwhile, through the API.
      const seen = await bundle();
      const other = await fetch(`${baseUrl}/api/review/cases/${field.caseId}/decisions`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${supervisorToken}` },
        body: JSON.stringify({ kind: 'needs_lab', scanId: field.scanId, comment: 'Send to the laboratory', baseVersion: seen.case.version }),
      });
      assert.equal(other.status, 201, await other.text());

      const scan = page.getByTestId(`review-scan-${field.scanId}`);
      await scan.getByLabel('Replace with another library compound').check();
      await scan.getByLabel('Library compound', { exact: true }).selectOption({ label: 'Methanol' });
      await scan.getByLabel('Reason for the replacement').fill('The C–O stretch sits nearer methanol');
      await scan.getByRole('button', { name: 'Record the decision' }).click();
      const stale = page.getByTestId('decision-stale');
      await stale.waitFor();
      await page.unroute(caseUrl);
      await assertAccessible(page, 'the case review page with a stale decision');
      await stale.getByRole('button', { name: 'Reload the case' }).click();
      await scan.getByTestId('decision-line').filter({ hasText: 'Needs laboratory confirmation' }).first().waitFor();
    });

    it('returns the case to the inspector with a comment, shown in the decision history', async () => {
      const { page } = browser;
      const comment = 'Add a photo of the drum label and a second scan of RV-01, please.';
      await page.getByLabel('Comment for the inspector').fill(comment);
      await page.getByTestId('return-case').click();
      await page.locator('[data-testid="review-case-status"]', { hasText: 'Returned' }).waitFor();
      const history = page.getByTestId('decision-history');
      assert.match(await history.textContent(), new RegExp(`Returned to the inspector.*${comment.replace('.', '\\.')}`, 's'));
      await assertAccessible(page, 'the returned case');
      await history.scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-case-returned-1280x900');
      const after = await bundle();
      assert.equal(after.case.status, 'returned');
    });
  });
}
