// Steps through the Siteband shell the way a person would: sign in, read the tab bar, open a tab.

/** Signs in from the sign-in page with the given email and password. */
export async function signIn(page, baseUrl, email, password) {
  await page.goto(`${baseUrl}/signin`);
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Signs in and waits for the landing page, as a person would before touching the tab bar. */
export async function signInTo(page, baseUrl, email, password, landingTitle) {
  await signIn(page, baseUrl, email, password);
  await waitForPage(page, landingTitle);
}

/** Signs out from the Account tab and waits for the sign-in page. */
export async function signOut(page) {
  await openTab(page, 'Account');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/signin$/);
  await waitForPage(page, 'Sign in');
}

/** Runs inside the page: the app's session row read straight from IndexedDB, not through the app's code. */
function readSessionRow() {
  return new Promise((resolve, reject) => {
    const open = indexedDB.open('siteband');
    open.onerror = () => reject(open.error);
    open.onsuccess = () => {
      const get = open.result.transaction('session').objectStore('session').get('current');
      get.onsuccess = () => {
        open.result.close();
        resolve(get.result);
      };
      get.onerror = () => reject(get.error);
    };
  });
}

/** The session row the app keeps in IndexedDB. */
export function storedSession(page) {
  return page.evaluate(readSessionRow);
}

/** Waits until the app has removed its stored session (up to 10 s). */
export async function waitForNoStoredSession(page) {
  for (let attempt = 0; attempt < 100; attempt += 1) {
    if ((await storedSession(page)) === undefined) return;
    await page.waitForTimeout(100);
  }
  throw new Error('The stored session was still there after 10 s');
}

/** The refresh token of the stored session, if any. */
export async function storedRefreshToken(page) {
  return (await storedSession(page))?.refreshToken;
}

/** Moves the time the server last confirmed the stored session back by `ms`, as if the tablet had been away. */
export function ageStoredSession(page, ms) {
  return page.evaluate(
    (age) =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('siteband');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const tx = open.result.transaction('session', 'readwrite');
          const table = tx.objectStore('session');
          const get = table.get('current');
          get.onsuccess = () => table.put({ ...get.result, confirmedAt: get.result.confirmedAt - age });
          tx.oncomplete = () => {
            open.result.close();
            resolve();
          };
          tx.onerror = () => reject(tx.error);
        };
      }),
    ms,
  );
}

/** The labels of the tab bar, in order. */
export async function tabLabels(page) {
  await page.locator('ion-tab-bar ion-tab-button').first().waitFor();
  return page.locator('ion-tab-bar ion-tab-button ion-label').allTextContents();
}

/** Opens a tab by its label and waits for its page to be shown. */
export async function openTab(page, label, title = label) {
  await page.locator('ion-tab-bar ion-tab-button', { hasText: label }).click();
  await waitForPage(page, title);
}

/** The page title (h1) with that text. */
export function pageTitle(page, title) {
  return page.getByRole('heading', { level: 1, name: title, exact: true });
}

/**
 * Waits until the page with that title is really on screen. Playwright's own visibility ignores
 * opacity, and Ionic keeps an entering page at opacity 0 until its transition ends, so a page stuck
 * mid-transition would otherwise pass as visible.
 */
export async function waitForPage(page, title) {
  await pageTitle(page, title).waitFor();
  await page.waitForFunction((text) => {
    const heading = [...document.querySelectorAll('h1')].find((h) => h.textContent.trim() === text && h.getClientRects().length > 0);
    if (!heading) return false;
    for (let node = heading; node; node = node.parentElement) {
      const style = getComputedStyle(node);
      if (style.opacity !== '1' || style.visibility === 'hidden' || node.classList.contains('ion-page-invisible')) return false;
    }
    return true;
  }, title, { timeout: 10_000 });
}

/** Waits until the service worker controls the page, so an offline reload is served from its cache. */
export async function waitForServiceWorker(page) {
  await page.waitForFunction(() => navigator.serviceWorker?.controller != null, undefined, { timeout: 20_000 });
}

/** An access token for calls straight to the API (fails the test on anything but 200). */
export async function apiToken(baseUrl, email, password) {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in of ${email} through the API answered ${login.status}`);
  return (await login.json()).accessToken;
}

/** Makes a case on the tablet from the page showing the case list, as the inspector does; gives its id. */
export async function newCaseOnTablet(page, site, { address } = {}) {
  await page.getByTestId('new-case').filter({ visible: true }).click();
  await waitForPage(page, 'New case');
  await page.getByLabel('Site name', { exact: true }).fill(site);
  if (address) await page.getByLabel('Address', { exact: true }).fill(address);
  await page.getByRole('button', { name: 'Save case' }).filter({ visible: true }).click();
  await waitForPage(page, site);
  return page.url().split('/').pop();
}

/** Adds a sample to the case on screen, as the inspector does; gives its id. */
export async function newSampleOnTablet(page, label) {
  await page.getByTestId('new-sample').filter({ visible: true }).click();
  await waitForPage(page, 'New sample');
  await page.getByLabel('Label', { exact: true }).filter({ visible: true }).fill(label);
  await page.getByRole('button', { name: 'Save sample' }).filter({ visible: true }).click();
  await waitForPage(page, `Sample ${label}`);
  return page.url().split('/').pop();
}

/** Takes the browser offline after the service worker controls the page, and waits for the app to say so. */
export async function goOffline(page, context) {
  await waitForServiceWorker(page);
  await context.setOffline(true);
  await page.getByTestId('connection-status').filter({ visible: true }).filter({ hasText: 'Offline' }).waitFor();
}
