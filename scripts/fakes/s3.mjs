#!/usr/bin/env node
// Local S3 fake for development: s3rver on 127.0.0.1 with its files under <repo>/.data/s3-<port>.
//
// Usage:
//   node scripts/fakes/s3.mjs [--port 4569] [--bucket siteband-dev]
//
// Defaults come from S3_PORT (4569) and S3_BUCKET (siteband-dev), the same variables the API reads, so
// the API's default S3_ENDPOINT (http://127.0.0.1:${S3_PORT}) finds it. The bucket is created if it is
// missing. It prints one line "s3 fake ready on http://127.0.0.1:<port> bucket <name>" and runs until
// SIGINT or SIGTERM. Credentials are s3rver's fixed development pair S3RVER / S3RVER.
import { mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';

const require = createRequire(join(resolve(dirname(fileURLToPath(import.meta.url)), '../../api'), 'package.json'));
const S3rver = require('s3rver');

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: process.env.S3_PORT || '4569' },
    bucket: { type: 'string', default: process.env.S3_BUCKET || 'siteband-dev' },
  },
});

const port = Number(values.port);
if (!Number.isInteger(port) || port < 1 || port > 65535) {
  console.error(`s3 fake: --port must be a whole number from 1 to 65535, got "${values.port}"`);
  process.exit(2);
}
// S3's bucket naming rule: 3–63 lower-case letters, digits, dots and hyphens.
if (!/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(values.bucket)) {
  console.error(`s3 fake: bucket names need 3–63 lower-case letters, digits, dots or hyphens, got "${values.bucket}"`);
  process.exit(2);
}

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const directory = join(repoRoot, '.data', `s3-${port}`);
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  address: '127.0.0.1',
  port,
  directory,
  silent: true,
  configureBuckets: [{ name: values.bucket }],
});

try {
  await server.run();
} catch (error) {
  console.error(`s3 fake: could not start on 127.0.0.1:${port}: ${error.message}`);
  process.exit(1);
}
console.log(`s3 fake ready on http://127.0.0.1:${port} bucket ${values.bucket} (files in ${directory})`);

let stopping = false;
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, async () => {
    if (stopping) return;
    stopping = true;
    await server.close();
    process.exit(0);
  });
}
