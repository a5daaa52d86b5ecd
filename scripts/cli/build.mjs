// Builds @siteband/shared when its compiled output is missing or older than its sources,
// so the command line works straight after `npm ci`.
import { execSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const sharedDir = fileURLToPath(new URL('../../shared/', import.meta.url));

function newestMtime(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(path) : statSync(path).mtimeMs);
  }
  return newest;
}

/** Compile shared (tsc -b) if dist/index.js is absent or stale; output goes to stderr. */
export function ensureSharedBuilt() {
  const built = join(sharedDir, 'dist', 'index.js');
  if (existsSync(built) && statSync(built).mtimeMs >= newestMtime(join(sharedDir, 'src'))) return;
  execSync('npm run -s build -w shared', { cwd: join(sharedDir, '..'), stdio: ['ignore', 2, 2] });
}
