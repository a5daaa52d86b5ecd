// Browser end-to-end tests of the idle lock: the app locks when left untouched, hides the case data,
// and unlocks with the PIN, the password (offline too) or, after wrong tries, only the server.
// Registered in run.mjs. Time is moved on with Playwright's clock, so the test waits for nothing.
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { openTab, signInTo, signOut, waitForPage } from './shell.mjs';

const PIN = '2468';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

function lockScreen(page) {
  return page.getByTestId('lock-screen');
}

async function typePinOnKeypad(page, pin) {
  const keypad = page.getByRole('group', { name: 'PIN keypad' });
  for (const digit of pin) await keypad.getByRole('button', { name: digit, exact: true }).click();
  await keypad.getByRole('button', { name: 'Unlock' }).click();
}

async function enterPassword(page, password) {
  await lockScreen(page).getByLabel('Password', { exact: true }).fill(password);
  await lockScreen(page).getByRole('button', { name: 'Unlock' }).click();
}

/** Leaves the tablet untouched for longer than one minute, the shortest idle time. */
async function leaveIdle(page) {
  await page.clock.fastForward('01:30');
  await lockScreen(page).waitFor();
}

export function idleLockTests({ baseUrl, password }) {
  describe('idle lock', { concurrency: false }, () => {
    let browser;
    before(async () => {
      browser = await openBrowser({ origin: baseUrl, width: 800, height: 1280 });
      // Fake timers that run at normal speed until the test jumps them forward.
      await browser.context.clock.install();
    });
    after(async () => {
      await browser?.close();
    });

    it('locks after the idle time set on this tablet, hides the case data and keeps what was being typed', async () => {
      const { page } = browser;
      await signInTo(page, baseUrl, 'inspector@demo.test', password, 'Cases');
      await openTab(page, 'Account');
      await page.getByLabel('Lock after', { exact: true }).selectOption('1');
      await page.getByLabel('New PIN (4 to 8 digits)').fill(PIN);
      await page.getByLabel('The same PIN again').fill(`${PIN}0`);
      await page.getByRole('button', { name: 'Save the PIN' }).click();
      await page.getByRole('alert').filter({ hasText: 'The two PINs differ' }).waitFor();
      await page.getByLabel('The same PIN again').fill(PIN);
      await page.getByRole('button', { name: 'Save the PIN' }).click();
      await page.getByRole('status').filter({ hasText: 'The PIN is saved on this tablet.' }).waitFor();
      const stored = await page.evaluate(() => localStorage.getItem('siteband.lock'));
      assert.ok(!stored.includes(PIN) && !stored.includes(password), 'neither the PIN nor the password is stored');

      await openTab(page, 'Cases');
      await page.getByTestId('new-case').filter({ visible: true }).click();
      await waitForPage(page, 'New case');
      const site = page.getByLabel('Site name', { exact: true }).filter({ visible: true });
      await site.fill('Lock test yard, not yet saved');

      await leaveIdle(page);
      await waitForPage(page, 'Siteband is locked');
      assert.equal(await page.getByLabel('Site name', { exact: true }).filter({ visible: true }).count(), 0, 'the case form is hidden');
      assert.equal(await page.locator('.sb-app').getAttribute('inert'), '', 'the app below cannot be reached');
      await assertAccessible(page, 'the lock screen');
      await screenshot(page, 'idle-lock-pin-800x1280');

      await typePinOnKeypad(page, PIN);
      await lockScreen(page).waitFor({ state: 'detached' });
      assert.equal(await page.getByLabel('Site name', { exact: true }).filter({ visible: true }).inputValue(), 'Lock test yard, not yet saved');
    });

    it('stays locked across a reload, takes the password offline after three wrong PINs', async () => {
      const { page, context } = browser;
      await leaveIdle(page);
      await page.reload();
      await waitForPage(page, 'Siteband is locked');

      for (const tries of ['2 tries left', '1 try left']) {
        await typePinOnKeypad(page, '1111');
        await lockScreen(page).getByRole('alert').filter({ hasText: tries }).waitFor();
      }
      await typePinOnKeypad(page, '1111');
      await lockScreen(page).getByRole('alert').filter({ hasText: 'Too many wrong PINs: enter your password.' }).waitFor();
      assert.equal(await page.getByRole('group', { name: 'PIN keypad' }).count(), 0, 'the PIN no longer unlocks');

      await context.setOffline(true);
      await enterPassword(page, password);
      await lockScreen(page).waitFor({ state: 'detached' });
      await waitForPage(page, 'New case');
      await context.setOffline(false);
    });

    it('after three wrong passwords asks the server, which unlocks once the network is back', async () => {
      const { page, context } = browser;
      await openTab(page, 'Account');
      await page.getByRole('button', { name: 'Lock now' }).click();
      await lockScreen(page).waitFor();
      await lockScreen(page).getByRole('button', { name: 'Use my password instead' }).click();
      await context.setOffline(true);
      for (const said of ['2 tries left', '1 try left', 'must now be checked by the server']) {
        await enterPassword(page, `${password}-wrong`);
        await lockScreen(page).getByRole('alert').filter({ hasText: said }).waitFor();
      }
      await lockScreen(page).getByText(/you are offline: connect to the network/).waitFor();
      assert.equal(await lockScreen(page).getByRole('button', { name: 'Unlock' }).isDisabled(), true);
      await screenshot(page, 'idle-lock-server-needed-offline');

      await context.setOffline(false);
      await enterPassword(page, `${password}-still-wrong`);
      await lockScreen(page).getByRole('alert').filter({ hasText: 'Email or password is wrong.' }).waitFor();
      await enterPassword(page, password);
      await lockScreen(page).waitFor({ state: 'detached' });
      await waitForPage(page, 'Account');
      // Unlocked by the server: the PIN is offered again from the next lock on.
      assert.equal((await page.getByTestId('pin-state').textContent()).trim(), 'A PIN is set on this tablet.');
      await signOut(page);
      assert.equal(await page.evaluate(() => localStorage.getItem('siteband.lock')), null, 'signing out forgets the PIN and the password check');
      assert.deepEqual(browser.pageErrors, []);
    });
  });
}
