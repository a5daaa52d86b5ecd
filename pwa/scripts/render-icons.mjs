// Rasterises the hand-drawn SVG icons into the PNG sizes the web manifest lists.
// Run once after editing an SVG: node pwa/scripts/render-icons.mjs (uses Debian's Chromium, no downloads).
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const iconsDir = join(dirname(fileURLToPath(import.meta.url)), '..', 'public', 'icons');
const outputs = [
  { svg: 'siteband.svg', png: 'siteband-192.png', size: 192 },
  { svg: 'siteband.svg', png: 'siteband-512.png', size: 512 },
  { svg: 'siteband-maskable.svg', png: 'siteband-maskable-512.png', size: 512 },
];

const profile = await mkdtemp(join(tmpdir(), 'siteband-icons-'));
const context = await chromium.launchPersistentContext(profile, {
  executablePath: '/usr/bin/chromium',
  headless: true,
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
    '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const page = await context.newPage();
  for (const { svg, png, size } of outputs) {
    const markup = await readFile(join(iconsDir, svg), 'utf8');
    await page.setViewportSize({ width: size, height: size });
    await page.setContent(
      `<html><body style="margin:0;background:transparent">` +
        `<img src="data:image/svg+xml;base64,${Buffer.from(markup).toString('base64')}" width="${size}" height="${size}"></body></html>`,
    );
    await page.locator('img').evaluate((img) => img.decode());
    await writeFile(join(iconsDir, png), await page.screenshot({ omitBackground: true }));
    console.log(`wrote ${png} (${size}×${size})`);
  }
} finally {
  await context.close();
  await rm(profile, { recursive: true, force: true });
}
