// Launches Debian's Chromium through playwright-core with a throwaway profile (nothing is downloaded).
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync'];

/** The repository's ignored folder for screenshots. */
export const SCREENSHOT_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '.artifacts', 'screenshots');

/**
 * Opens a fresh browser profile; close() also deletes the profile folder. Every request that leaves
 * `origin` (a font CDN, an analytics call) is collected in `foreignRequests`.
 */
export async function openBrowser({ origin, width = 1024, height = 768, colorScheme = 'light' } = {}) {
  const profile = await mkdtemp(join(tmpdir(), 'siteband-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width, height },
    colorScheme,
    locale: 'en-GB',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  const pageErrors = [];
  const foreignRequests = [];
  page.on('pageerror', (error) => pageErrors.push(error.message));
  context.on('request', (request) => {
    const url = request.url();
    if (origin && !url.startsWith(`${origin}/`) && !url.startsWith('data:') && !url.startsWith('blob:')) foreignRequests.push(url);
  });
  return {
    context,
    page,
    pageErrors,
    foreignRequests,
    async close() {
      await context.close();
      await rm(profile, { recursive: true, force: true });
    },
  };
}

/** Saves a full-viewport screenshot under .artifacts/screenshots/. */
export async function screenshot(page, name) {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  // Let Ionic's page transition settle so the picture shows the finished screen.
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}
