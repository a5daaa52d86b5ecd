// The three roles on one case, each in their own browser: the inspector records and syncs a case
// with a hazardous scan; the safety officer is mailed and acknowledges the escalation, which the
// inspector sees after sync; the supervisor returns the case with a comment, the inspector fixes
// and resubmits it, the supervisor decides on the scan afresh (the decision before the return is
// marked earlier), signs it off and downloads the case report. Registered in run.mjs.
// The site and people are an invented demo scenario.
import assert from 'node:assert/strict';
import { execFileSync } from 'node:child_process';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { readCapture, waitForSynced } from './capture.mjs';
import { recordHazardousScan } from './hazardousScan.mjs';
import { waitForMail } from './inbox.mjs';
import { newCaseOnTablet, newSampleOnTablet, signInTo, waitForPage } from './shell.mjs';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

/** Syncs the inspector's tablet from the case page and waits until nothing is left to send. */
async function syncNow(page) {
  await page.getByTestId('sync-now').filter({ visible: true }).click();
  await waitForSynced(page);
}

export function threeRoleTests({ baseUrl, password }) {
  describe('three roles on one case', { concurrency: false }, () => {
    const site = `Container yard 9, bay C (three roles ${Date.now() % 100000})`;
    const returnComment = 'Record the seal number of TR-01 in a site note before I sign off.';
    let inspector;
    let officer;
    let supervisor;
    let caseId;
    let scanId;

    before(async () => {
      inspector = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      officer = await openBrowser({ origin: baseUrl, width: 1024, height: 900 });
      supervisor = await openBrowser({ origin: baseUrl, width: 1280, height: 900 });
    });
    after(async () => {
      await inspector?.close();
      await officer?.close();
      await supervisor?.close();
    });

    it("the inspector records a case with a hazardous Raman scan, submits it and syncs", async () => {
      const { page } = inspector;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      caseId = await newCaseOnTablet(page, site);
      await newSampleOnTablet(page, 'TR-01');

      scanId = await recordHazardousScan(page, 'TR-01');

      await page.goto(`${baseUrl}/tabs/cases/${caseId}`);
      await waitForPage(page, site);
      await page.getByTestId('case-submit-toggle').filter({ visible: true }).filter({ hasText: 'Submit case' }).click();
      await syncNow(page);
      const local = await page.evaluate(readCapture);
      assert.equal(local.cases.find((c) => c.id === caseId).data.status, 'submitted');
      assert.equal(local.escalations.filter((e) => e.data.caseId === caseId).length, 1, 'the hazardous scan raised one escalation');
    });

    it('the safety officer is mailed, finds the escalation in the inbox and acknowledges it; the inspector sees it after sync', async () => {
      const { page: so } = officer;
      const mail = await waitForMail(so, site);
      const text = JSON.stringify(mail);
      assert.match(text, /Ammonium nitrate/, 'the mail names the compound');
      assert.match(text, /\/tabs\/escalations\//, 'the mail links into the app');

      await signInTo(so, baseUrl, 'safety@demo.test', password, 'Escalations');
      await so.getByTestId('inbox-filter-raised').filter({ visible: true }).click();
      const card = so.locator('[data-testid^="escalation-"]').filter({ hasText: site });
      await card.waitFor({ timeout: 30_000 });
      await card.click();
      await waitForPage(so, 'Escalation');
      const form = so.getByTestId('acknowledge-form').filter({ visible: true });
      await form.getByLabel('PPE required').check();
      await form.getByLabel('Level B').check();
      await form.getByLabel('Comment (optional)').fill('Level B for anyone near bay C');
      await form.getByRole('button', { name: 'Acknowledge escalation' }).click();
      await so.getByTestId('acknowledgement').filter({ visible: true }).waitFor();
      await screenshot(so, 'three-roles-safety-acknowledged');

      const { page } = inspector;
      await syncNow(page);
      const panel = page.getByTestId('case-escalations').filter({ visible: true });
      await panel.getByTestId('acknowledgement').waitFor({ timeout: 30_000 });
      assert.match(await panel.textContent(), /Acknowledged by .+: PPE required, level B/);
    });

    it('the supervisor finds the case, accepts the scan and returns the case with a comment', async () => {
      const { page } = supervisor;
      await signInTo(page, baseUrl, 'supervisor@demo.test', password, 'Review queue');
      const form = page.getByRole('search', { name: 'Filters of the review queue' });
      await form.getByLabel('Site name contains').fill(site);
      await form.getByRole('button', { name: 'Apply filters' }).click();
      const row = page.getByTestId(`queue-item-${caseId}`);
      await row.waitFor();
      assert.match(await row.textContent(), /Escalation/, 'the open escalation ranks the case highest');
      await row.locator('a, ion-item').first().click();
      await waitForPage(page, site);
      const scan = page.getByTestId(`review-scan-${scanId}`);
      await scan.getByTestId('candidate-ammonium-nitrate').waitFor({ timeout: 30_000 });
      await scan.getByLabel('Accept Ammonium nitrate').check();
      await scan.getByRole('button', { name: 'Record the decision' }).click();
      await scan.getByTestId('decision-line').filter({ hasText: 'Accepted Ammonium nitrate' }).waitFor();
      await page.getByLabel('Comment for the inspector').fill(returnComment);
      await page.getByTestId('return-case').click();
      await page.locator('[data-testid="review-case-status"]', { hasText: 'Returned' }).waitFor();
      await assertAccessible(page, 'the returned case, supervisor');
    });

    it('the inspector sees the comment after sync, fixes the case and submits it again', async () => {
      const { page } = inspector;
      await syncNow(page);
      const returned = page.getByTestId('case-returned').filter({ visible: true });
      await returned.waitFor();
      assert.match(await returned.textContent(), new RegExp(returnComment.replace('.', '\\.')));
      await assertAccessible(page, 'the returned case, inspector');
      await screenshot(page, 'three-roles-inspector-returned-800x1280');
      await page.getByTestId('case-submit-toggle').filter({ visible: true }).filter({ hasText: 'Reopen to fix' }).click();
      // Reopen, fix and resubmit before the next sync: the tablet queues the moves in order.
      await page.getByLabel('New site note', { exact: true }).filter({ visible: true }).fill('Seal number of TR-01: SB-009913, intact.');
      await page.getByRole('button', { name: 'Add note' }).filter({ visible: true }).click();
      await page.getByTestId('site-note').filter({ hasText: 'SB-009913' }).waitFor();
      await page.getByTestId('case-submit-toggle').filter({ visible: true }).filter({ hasText: 'Submit case' }).click();
      await syncNow(page);
      // The acceptance before the return is history on the tablet too, read by the server's rule.
      const decided = page.getByTestId(`scan-decision-${scanId}`).filter({ visible: true });
      await decided.getByTestId('decision-earlier').waitFor();
      assert.match(await decided.textContent(), /Accepted Ammonium nitrate/);
      await assertAccessible(page, 'the resubmitted case with an earlier decision, inspector');
    });

    it('the supervisor signs the case off and the case report holds every section', async () => {
      const { page } = supervisor;
      await page.reload();
      await waitForPage(page, site);
      await page.locator('[data-testid="review-case-status"]', { hasText: 'Submitted' }).waitFor();
      await page.getByText('Seal number of TR-01: SB-009913').waitFor();
      // The acceptance before the return is history: shown as earlier, it does not allow sign-off.
      const scan = page.getByTestId(`review-scan-${scanId}`);
      await scan.getByTestId('decision-earlier').waitFor();
      assert.match(await page.getByTestId('decision-history').textContent(), /Earlier submission/);
      assert.equal(await page.getByRole('button', { name: 'Sign off the case' }).isDisabled(), true, 'no sign-off on decisions of an earlier submission');
      await assertAccessible(page, 'the resubmitted case with an earlier decision');
      await scan.getByLabel('Accept Ammonium nitrate').check();
      await scan.getByRole('button', { name: 'Record the decision' }).click();
      await scan.locator('[data-testid="decision-line"]:not([data-earlier])').filter({ hasText: 'Accepted Ammonium nitrate' }).waitFor();
      await page.getByTestId('sign-off').click();
      await page.locator('[data-testid="review-case-status"]', { hasText: 'Accepted' }).waitFor();
      assert.match(await page.getByTestId('decision-history').textContent(), /Signed off/);
      await assertAccessible(page, 'the accepted case');
      await screenshot(page, 'three-roles-supervisor-accepted-1280x900');

      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('download-report').click()]);
      // One space for every run of white space: the layout wraps long lines.
      const text = execFileSync('pdftotext', [await download.path(), '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      for (const section of ['Site', 'Samples and chain of custody', 'Scans', 'Likely compounds', 'Hazards and cautions', 'Review decisions and sign-off', 'Escalations', 'Audit summary']) {
        assert.ok(text.includes(section), `the report has the section "${section}"`);
      }
      assert.ok(text.includes(site), 'the report names the site');
      assert.ok(text.includes('Ammonium nitrate'), 'the report names the likely compound');
      assert.ok(text.includes(returnComment), 'the report keeps the return comment');

      const { page: tablet } = inspector;
      await syncNow(tablet);
      await tablet.getByTestId('case-accepted').filter({ visible: true }).waitFor();
      const fresh = tablet.getByTestId(`scan-decision-${scanId}`).filter({ visible: true });
      await fresh.locator('[data-testid="decision-line"]:not([data-earlier])').filter({ hasText: 'Accepted Ammonium nitrate' }).waitFor();
      assert.equal(await fresh.getByTestId('decision-earlier').count(), 0, 'the fresh acceptance is current, nothing earlier is shown for the scan');
    });
  });
}
