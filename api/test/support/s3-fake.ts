import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';

/** An in-process s3rver on a free loopback port, with a temporary directory and one bucket. */
export interface S3Fake {
  /** The S3_* variables that point the API at it. */
  env: Record<string, string>;
  directory: string;
  close: () => Promise<void>;
}

/** Starts the fake; `close()` stops it and removes its files. */
export async function startS3Fake(bucket = 'siteband-e2e'): Promise<S3Fake> {
  const directory = mkdtempSync(join(tmpdir(), 'siteband-s3-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, directory, silent: true, configureBuckets: [{ name: bucket }] });
  const address = await server.run();
  return {
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${address.port}`,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    },
    directory,
    close: async () => {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
