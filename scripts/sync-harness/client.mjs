// Loads the PWA's sync engine in Node: Vite (the PWA's own bundler) builds client-entry.ts for Node
// into .data/sync-client/, with fake-indexeddb standing in for the browser's IndexedDB.
import 'fake-indexeddb/auto';
import { rmSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'vite';

const here = dirname(fileURLToPath(import.meta.url));
const root = resolve(here, '../..');

/** Builds and imports the tablet's sync modules (a few seconds). */
export async function loadClient() {
  const outDir = join(process.env.SITEBAND_DATA_DIR ?? join(root, '.data'), `sync-client-${process.pid}`);
  process.on('exit', () => rmSync(outDir, { recursive: true, force: true }));
  const nodeEnv = process.env.NODE_ENV;
  await build({
    configFile: false,
    root: join(root, 'pwa'),
    logLevel: 'warn',
    build: {
      ssr: join(here, 'client-entry.ts'),
      outDir,
      emptyOutDir: true,
      minify: false,
      rolldownOptions: { output: { entryFileNames: 'client.mjs' } },
    },
  });
  // Vite sets NODE_ENV=production for its build; the API processes started later must not inherit it.
  if (nodeEnv === undefined) delete process.env.NODE_ENV;
  else process.env.NODE_ENV = nodeEnv;
  return import(pathToFileURL(join(outDir, 'client.mjs')).href);
}
