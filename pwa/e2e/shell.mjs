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
  await pageTitle(page, landingTitle).waitFor();
}

/** Signs out from the Account tab and waits for the sign-in page. */
export async function signOut(page) {
  await openTab(page, 'Account');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(/\/signin$/);
}

/** The refresh token the app keeps in IndexedDB (read the way the app stores it, not through its code). */
export function storedRefreshToken(page) {
  return page.evaluate(
    () =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('siteband');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const get = open.result.transaction('session').objectStore('session').get('current');
          get.onsuccess = () => resolve(get.result?.refreshToken);
          get.onerror = () => reject(get.error);
        };
      }),
  );
}

/** The labels of the tab bar, in order. */
export async function tabLabels(page) {
  await page.locator('ion-tab-bar ion-tab-button').first().waitFor();
  return page.locator('ion-tab-bar ion-tab-button ion-label').allTextContents();
}

/** Opens a tab by its label and waits for its page title. */
export async function openTab(page, label, title = label) {
  await page.locator('ion-tab-bar ion-tab-button', { hasText: label }).click();
  await pageTitle(page, title).waitFor();
}

/** The visible page title (h1) with that text. */
export function pageTitle(page, title) {
  return page.getByRole('heading', { level: 1, name: title, exact: true });
}

/** Waits until the service worker controls the page, so an offline reload is served from its cache. */
export async function waitForServiceWorker(page) {
  await page.waitForFunction(() => navigator.serviceWorker?.controller != null, undefined, { timeout: 20_000 });
}
