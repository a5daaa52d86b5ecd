// Browser end-to-end tests of the admin's audit trail page against a running server.
// Registered in run.mjs; the same launch and sign-in helpers as the shell tests.
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { apiToken, openTab, signInTo, signOut } from './shell.mjs';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

export function adminTests({ baseUrl, password }) {
  describe('the audit trail', { concurrency: false }, () => {
    let browser;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl });
    });
    after(async () => {
      await browser?.close();
    });

    it('verifies the hash chain and lists the newest entries, a user just added among them', async () => {
      const { page } = browser;
      // One audited change made now, so the chain has a known newest entry.
      const token = await apiToken(baseUrl, 'admin@demo.test', password);
      const email = `audit-${Date.now()}@demo.test`;
      const created = await fetch(`${baseUrl}/api/users`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
        body: JSON.stringify({ email, displayName: 'Audit Trail Check', role: 'inspector', password: `${password}-audit` }),
      });
      assert.equal(created.status, 201);
      const user = await created.json();

      await signInTo(page, baseUrl, 'admin@demo.test', password, 'Users');
      await openTab(page, 'Audit trail');
      const entries = page.getByTestId('audit-entries');
      await entries.waitFor();
      const firstRow = entries.locator('tbody tr').first();
      assert.match(await firstRow.textContent(), new RegExp(`user ${user.id.slice(0, 8)}`));
      assert.match(await firstRow.textContent(), /create/);

      await page.getByTestId('audit-verify').click();
      const result = page.getByTestId('audit-result');
      await result.waitFor();
      const text = (await result.textContent()).trim();
      const match = /^The chain is intact: (\d+) entr(y|ies) checked\.$/.exec(text);
      assert.ok(match, `the chain verifies as intact, got "${text}"`);
      assert.ok(Number(match[1]) >= 1);
      await assertAccessible(page, 'the audit trail page');
      await screenshot(page, 'admin-audit-verified');
      await signOut(page);
    });
  });
}
