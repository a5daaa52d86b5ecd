// Browser end-to-end tests of the PWA shell against a running Siteband server.
// Usage: BASE_URL=http://127.0.0.1:3999 SITEBAND_DEMO_PASSWORD=... node pwa/e2e/run.mjs
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { adminTests } from './admin.mjs';
import { blockingViolations } from './axe.mjs';
import { captureTests } from './capture.mjs';
import { caseArchiveTests } from './caseArchive.mjs';
import { editingTests } from './editing.mjs';
import { escalationTests } from './escalations.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { identifyTests } from './identify.mjs';
import { inviteTests } from './invite.mjs';
import { idleLockTests } from './idleLock.mjs';
import { libraryTests } from './library.mjs';
import { reviewTests } from './review.mjs';
import { scanEditTests } from './scanEdits.mjs';
import { shareTargetTests } from './shareTarget.mjs';
import { threeRoleTests } from './three-roles.mjs';
import {
  ageStoredSession,
  openTab,
  pageTitle,
  signIn,
  signInTo,
  signOut,
  storedRefreshToken,
  tabLabels,
  waitForNoStoredSession,
  waitForPage,
  waitForServiceWorker,
} from './shell.mjs';

const BASE_URL = (process.env.BASE_URL || '').replace(/\/$/, '');
const PASSWORD = process.env.SITEBAND_DEMO_PASSWORD || 'siteband-demo-2026';
if (!BASE_URL) {
  console.error('BASE_URL is not set: start the server and pass its address, e.g. BASE_URL=http://127.0.0.1:3999');
  process.exit(2);
}

const ALL_TABS = ['Cases', 'Capture', 'Review queue', 'Compound library', 'Escalations', 'Users', 'Audit trail', 'Account'];

// The roles' tabs as the product brief defines them; every role also has Account.
const ROLES = [
  { role: 'inspector', email: 'inspector@demo.test', roleLabel: 'Inspector', tabs: ['Cases', 'Capture', 'Account'] },
  { role: 'supervisor', email: 'supervisor@demo.test', roleLabel: 'Supervisor', tabs: ['Review queue', 'Compound library', 'Account'] },
  { role: 'safety_officer', email: 'safety@demo.test', roleLabel: 'Safety officer', tabs: ['Escalations', 'Account'] },
  { role: 'admin', email: 'admin@demo.test', roleLabel: 'Administrator', tabs: ['Users', 'Audit trail', 'Account'] },
];

/** Asks the API directly whether a refresh token is still accepted. */
async function refreshStatus(refreshToken) {
  const response = await fetch(`${BASE_URL}/api/auth/refresh`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ refreshToken }),
  });
  return response.status;
}

async function assertAccessible(page, where) {
  const violations = await blockingViolations(page);
  assert.deepEqual(violations, [], `axe found serious or critical problems on ${where}`);
}

describe('Siteband PWA shell', { concurrency: false }, () => {
  let browser;
  before(async () => {
    browser = await openBrowser({ origin: BASE_URL });
  });
  after(async () => {
    await browser?.close();
  });

  it('loads nothing from outside the server and throws no script errors', async () => {
    const { page, foreignRequests, pageErrors } = browser;
    await page.goto(`${BASE_URL}/signin`);
    await waitForPage(page, 'Sign in');
    const fontFaces = await page.evaluate(async () => {
      await document.fonts.ready;
      return [...document.fonts].filter((f) => f.status === 'loaded').map((f) => f.family);
    });
    assert.ok(fontFaces.some((family) => family.includes('Atkinson Hyperlegible')), 'the bundled font is in use');
    assert.deepEqual(foreignRequests, []);
    assert.deepEqual(pageErrors, []);
  });

  it('shows the sign-in page without accessibility problems and refuses a wrong password', async () => {
    const { page } = browser;
    await page.goto(`${BASE_URL}/`);
    await page.waitForURL(/\/signin$/);
    await waitForPage(page, 'Sign in');
    await assertAccessible(page, 'the sign-in page');
    await screenshot(page, 'signin-1024x768');

    await signIn(page, BASE_URL, 'inspector@demo.test', `${PASSWORD}-not-this-one`);
    const alert = page.getByRole('alert');
    await alert.waitFor();
    assert.equal((await alert.textContent()).trim(), 'Email or password is wrong.');
    assert.match(page.url(), /\/signin$/);
    assert.equal(await page.locator('ion-tab-bar').count(), 0, 'no tab bar after a refused sign-in');
    await assertAccessible(page, 'the sign-in page with its error');
    await screenshot(page, 'signin-wrong-password');
  });

  for (const { role, email, roleLabel, tabs } of ROLES) {
    it(`signs in as ${role} and offers that role's tabs only`, async () => {
      const { page } = browser;
      await signInTo(page, BASE_URL, email, PASSWORD, tabs[0]);
      assert.deepEqual(await tabLabels(page), tabs);
      for (const other of ALL_TABS.filter((t) => !tabs.includes(t))) {
        assert.equal(await page.locator('ion-tab-bar ion-tab-button', { hasText: other }).count(), 0, `${role} must not see ${other}`);
      }

      for (const label of tabs) {
        await openTab(page, label);
        await assertAccessible(page, `${role} → ${label}`);
        await screenshot(page, `${role}-${label.toLowerCase().replace(/\s+/g, '-')}`);
      }

      // Account shows who is signed in, with the role named in words.
      assert.equal((await page.getByTestId('account-role').last().textContent()).trim(), roleLabel);
      assert.ok((await page.getByTestId('account-name').last().textContent()).trim().length > 0);

      const refreshToken = await storedRefreshToken(page);
      assert.ok(refreshToken, 'the session is kept in IndexedDB');
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL(/\/signin$/);
      assert.equal(await refreshStatus(refreshToken), 401, 'sign-out revoked the refresh token on the server');
      assert.equal(await storedRefreshToken(page), undefined, 'sign-out removed the session from the tablet');
      await page.reload();
      await waitForPage(page, 'Sign in');
      assert.equal(await page.locator('ion-tab-bar').count(), 0, 'signed out stays signed out after a reload');
    });
  }

  it("keeps a role's own pages behind its tabs: an inspector sent to /tabs/users lands on Cases", async () => {
    const { page } = browser;
    await signInTo(page, BASE_URL, 'inspector@demo.test', PASSWORD, 'Cases');
    await page.goto(`${BASE_URL}/tabs/users`);
    await waitForPage(page, 'Cases');
    assert.match(page.url(), /\/tabs\/cases$/);
    assert.equal(await pageTitle(page, 'Users').count(), 0);
    await signOut(page);
  });

  it('opens the structure check from the compound library', async () => {
    const { page } = browser;
    await signInTo(page, BASE_URL, 'supervisor@demo.test', PASSWORD, 'Review queue');
    await openTab(page, 'Compound library');
    await page.getByText('Open the structure check').click();
    await waitForPage(page, 'Structure check');
    assert.match(page.url(), /\/tabs\/library\/structure$/);
    await assertAccessible(page, 'the structure check page');
    await screenshot(page, 'supervisor-structure-check');
    await signOut(page);
    assert.deepEqual(browser.foreignRequests, [], 'no request left the server during the whole run');
    assert.deepEqual(browser.pageErrors, [], 'no script error during the whole run');
  });
});

describe('administering users', { concurrency: false }, () => {
  let browser;
  before(async () => {
    browser = await openBrowser({ origin: BASE_URL });
  });
  after(async () => {
    await browser?.close();
  });

  it('creates a user, changes the role and deactivates them, and the change survives a reload', async () => {
    const { page } = browser;
    const email = `e2e-${Date.now()}@demo.test`;
    const name = `Field Trial ${Date.now() % 100000}`;
    await signInTo(page, BASE_URL, 'admin@demo.test', PASSWORD, 'Users');
    await page.getByRole('table');

    await page.getByLabel('Full name').fill(name);
    // By role: the sign-in page may still be in the DOM, hidden, with its own Email field.
    await page.getByRole('textbox', { name: 'Email', exact: true }).fill(email);
    await page.getByLabel('Role', { exact: true }).selectOption('inspector');
    await page.getByLabel('First password').fill(`${PASSWORD}-e2e`);
    await page.getByRole('button', { name: 'Create user' }).click();
    await page.getByRole('status').filter({ hasText: `${name} can now sign in as Inspector.` });

    const row = page.getByTestId(`user-row-${email}`);
    await row.waitFor();
    await row.getByLabel(`Role of ${name}`).selectOption('safety_officer');
    await row.getByRole('button', { name: `Deactivate ${name}` }).click();
    await row.getByText('Deactivated');
    await assertAccessible(page, 'the users page');
    await screenshot(page, 'admin-users-after-changes');

    await page.reload();
    const reloaded = page.getByTestId(`user-row-${email}`);
    await reloaded.waitFor();
    assert.equal(await reloaded.getByLabel(`Role of ${name}`).inputValue(), 'safety_officer');
    assert.equal((await reloaded.locator('.sb-pill').textContent()).trim(), 'Deactivated');
    await page.setViewportSize({ width: 800, height: 1280 });
    await screenshot(page, 'admin-users-800x1280');
    await page.setViewportSize({ width: 1024, height: 768 });

    // The deactivated person can no longer sign in.
    await signOut(page);
    await signIn(page, BASE_URL, email, `${PASSWORD}-e2e`);
    await page.getByRole('alert');
    assert.match(page.url(), /\/signin$/);
  });
});

describe('offline', { concurrency: false }, () => {
  let browser;
  before(async () => {
    browser = await openBrowser({ origin: BASE_URL, width: 800, height: 1280 });
  });
  after(async () => {
    await browser?.close();
  });

  it('reloads the shell for the stored user without a network, and says it is offline', async () => {
    const { page, context } = browser;
    await signInTo(page, BASE_URL, 'inspector@demo.test', PASSWORD, 'Cases');
    await openTab(page, 'Account');
    const name = (await page.getByTestId('account-name').last().textContent()).trim();
    await waitForServiceWorker(page);

    const apiCallsWhileOffline = [];
    page.on('request', (request) => {
      if (new URL(request.url()).pathname.startsWith('/api/')) apiCallsWhileOffline.push(request.url());
    });
    await context.setOffline(true);
    await page.reload();
    await waitForPage(page, 'Account');
    const status = page.getByTestId('connection-status').last();
    assert.equal((await status.textContent()).trim(), 'Offline');
    assert.equal((await page.getByTestId('account-name').last().textContent()).trim(), name);
    assert.deepEqual(await tabLabels(page), ['Cases', 'Capture', 'Account']);
    await openTab(page, 'Capture');
    await assertAccessible(page, 'the capture page offline');
    await screenshot(page, 'offline-capture-800x1280');

    // A deep link typed while offline is served by the service worker's navigation fallback too.
    await page.goto(`${BASE_URL}/tabs/cases`);
    await waitForPage(page, 'Cases');
    assert.deepEqual(apiCallsWhileOffline, [], 'offline, the shell must not call the API');

    await context.setOffline(false);
    await page.getByTestId('connection-status').last().filter({ hasText: 'Online' });
    await screenshot(page, 'inspector-cases-800x1280');
  });

  it('shows the shell in the dark palette when the tablet asks for it', async () => {
    const { page } = browser;
    await page.emulateMedia({ colorScheme: 'dark' });
    await page.reload();
    await waitForPage(page, 'Cases');
    assert.equal(await page.evaluate(() => document.documentElement.classList.contains('ion-palette-dark')), true);
    await assertAccessible(page, 'the cases page, dark palette');
    await screenshot(page, 'dark-cases-800x1280');
    await openTab(page, 'Account');
    await assertAccessible(page, 'the account page, dark palette');
    await screenshot(page, 'dark-account-800x1280');

    // The Account page's choice overrides the tablet's setting and survives a reload.
    const isDark = () => page.evaluate(() => document.documentElement.classList.contains('ion-palette-dark'));
    await page.getByLabel('Light', { exact: true }).check();
    assert.equal(await isDark(), false);
    await page.reload();
    await waitForPage(page, 'Account');
    assert.equal(await isDark(), false, 'the light choice is remembered');
    await page.getByLabel('Follow the tablet').check();
    assert.equal(await isDark(), true);
  });

  it('asks for a new sign-in once the offline period has run out, and revokes the old session when back online', async () => {
    const { page, context } = browser;
    await page.emulateMedia({ colorScheme: 'light' });
    const oldRefreshToken = await storedRefreshToken(page);
    assert.ok(oldRefreshToken, 'still signed in from the offline test');
    // Ten years back: past any offline period the build may be configured with.
    await ageStoredSession(page, 10 * 365 * 24 * 3_600_000);

    await context.setOffline(true);
    await page.reload();
    await waitForPage(page, 'Sign in');
    assert.match(page.url(), /\/signin$/);
    const notice = (await page.getByText('Your offline session has ended').textContent()).trim();
    assert.match(notice, /connect to the network to sign in again/);
    assert.equal(await page.locator('ion-tab-bar').count(), 0);
    await screenshot(page, 'offline-session-ended-800x1280');

    await context.setOffline(false);
    await waitForNoStoredSession(page);
    assert.equal(await refreshStatus(oldRefreshToken), 401, 'the ended session was revoked on the server');

    await signInTo(page, BASE_URL, 'inspector@demo.test', PASSWORD, 'Cases');
  });
});

identifyTests({ baseUrl: BASE_URL, password: PASSWORD });
libraryTests({ baseUrl: BASE_URL, password: PASSWORD });
captureTests({ baseUrl: BASE_URL, password: PASSWORD });
caseArchiveTests({ baseUrl: BASE_URL, password: PASSWORD });
editingTests({ baseUrl: BASE_URL, password: PASSWORD });
scanEditTests({ baseUrl: BASE_URL, password: PASSWORD });
escalationTests({ baseUrl: BASE_URL, password: PASSWORD });
adminTests({ baseUrl: BASE_URL, password: PASSWORD });
inviteTests({ baseUrl: BASE_URL, password: PASSWORD });
reviewTests({ baseUrl: BASE_URL, password: PASSWORD });
idleLockTests({ baseUrl: BASE_URL, password: PASSWORD });
shareTargetTests({ baseUrl: BASE_URL, password: PASSWORD });
threeRoleTests({ baseUrl: BASE_URL, password: PASSWORD });
