import { readdir, readFile, stat, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import type { Plugin } from 'vite';

/** Text files worth sending compressed; images and fonts are compressed formats already. */
const TEXT_FILE = /\.(js|mjs|css|html|svg|json|webmanifest)$/;
/** Below this, compression saves less than the header costs (common practice: about 1 kB). */
const MIN_BYTES = 1024;

async function filesBelow(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true });
  const nested = await Promise.all(entries.map((e) => (e.isDirectory() ? filesBelow(join(dir, e.name)) : [join(dir, e.name)])));
  return nested.flat();
}

/**
 * Writes `.br` (Brotli, highest quality) and `.gz` (gzip, level 9) copies beside every text file of
 * the build, once, so the API sends them without compressing per request (api/src/common/spa.ts).
 */
export function precompress(): Plugin {
  let outDir = 'dist';
  return {
    name: 'siteband-precompress',
    apply: 'build',
    configResolved(config) {
      outDir = resolve(config.root, config.build.outDir);
    },
    async closeBundle() {
      for (const file of await filesBelow(outDir)) {
        if (!TEXT_FILE.test(file) || (await stat(file)).size < MIN_BYTES) continue;
        const bytes = await readFile(file);
        await writeFile(`${file}.br`, brotliCompressSync(bytes, { params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY, [constants.BROTLI_PARAM_SIZE_HINT]: bytes.length } }));
        await writeFile(`${file}.gz`, gzipSync(bytes, { level: 9 }));
      }
    },
  };
}
