import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ConfigError, loadConfig } from './app-config';

const STRONG = 'kQ7v2x9LpZ4mR8tW1yB6nC3dF5gH0jS-aE_uI';

describe('S3 configuration', () => {
  let dataDir: string;
  beforeEach(() => {
    dataDir = mkdtempSync(join(tmpdir(), 'siteband-s3-config-'));
  });
  afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

  const load = (extra: Record<string, string> = {}) => loadConfig({ NODE_ENV: 'development', SITEBAND_DATA_DIR: dataDir, JWT_SECRET: STRONG, ...extra });
  const problems = (extra: Record<string, string>): string[] => {
    try {
      load(extra);
    } catch (error) {
      if (error instanceof ConfigError) return error.problems;
      throw error;
    }
    return [];
  };

  it('points at the local fake outside production', () => {
    expect(load().s3).toEqual({ endpoint: 'http://127.0.0.1:4569', bucket: 'siteband-dev', region: 'us-east-1', accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' });
    expect(load({ S3_PORT: '4600' }).s3.endpoint).toBe('http://127.0.0.1:4600');
  });

  it('reads every S3 variable', () => {
    const s3 = load({ S3_ENDPOINT: 'https://objects.example.test/', S3_BUCKET: 'siteband.files-01', S3_REGION: 'eu-west-1', S3_ACCESS_KEY_ID: 'id', S3_SECRET_ACCESS_KEY: 'secret' }).s3;
    expect(s3).toEqual({ endpoint: 'https://objects.example.test', bucket: 'siteband.files-01', region: 'eu-west-1', accessKeyId: 'id', secretAccessKey: 'secret' });
  });

  it.each(['ab', 'Siteband', 'a'.repeat(64), '-siteband', 'site_band'])('refuses the bucket name %s', (bucket) => {
    expect(problems({ S3_BUCKET: bucket })).toEqual([expect.stringContaining('S3_BUCKET must be 3–63 lower-case letters')]);
  });

  it('refuses an endpoint that is not an origin', () => {
    expect(problems({ S3_ENDPOINT: 'localhost:4569' })).toEqual([expect.stringContaining('S3_ENDPOINT must be an origin')]);
  });

  it('needs real credentials in production and uses the provider endpoint by default', () => {
    const production = { NODE_ENV: 'production', APP_PUBLIC_URL: 'https://siteband.example' };
    expect(problems(production)).toEqual(['S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY are required in production']);
    expect(problems({ ...production, S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' })).toEqual([
      "S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY may not be the local fake's credentials in production",
    ]);
    const s3 = load({ ...production, S3_ACCESS_KEY_ID: 'id', S3_SECRET_ACCESS_KEY: 'secret' }).s3;
    expect(s3.endpoint).toBeUndefined();
  });
});
