import type { EnvReader, NodeEnv } from './app-config';

/** Where attachment bytes are kept: an S3 bucket (the local fake in development and tests). */
export interface S3Config {
  /** Undefined means the provider's default endpoint for the region (AWS itself). */
  endpoint: string | undefined;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
}

/** The local fake's well-known credentials: accepted outside production only. */
export const S3_FAKE_CREDENTIAL = 'S3RVER';

/** S3 bucket naming: 3–63 characters, lower-case letters, digits, dots and hyphens, starting and ending alphanumeric. */
const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

/**
 * Reads the S3 settings. Outside production they default to the local fake (s3rver on S3_PORT or 4569);
 * in production the credentials must come from the environment and may not be the fake's.
 */
export function readS3Config(reader: EnvReader, nodeEnv: NodeEnv): S3Config {
  const production = nodeEnv === 'production';
  const fakePort = reader.integer('S3_PORT', 4569, 1, 65535);
  const endpoint = reader.optional('S3_ENDPOINT') ?? (production ? undefined : `http://127.0.0.1:${fakePort}`);
  if (endpoint !== undefined && !/^https?:\/\/[^/\s]+\/?$/.test(endpoint)) {
    reader.problems.push(`S3_ENDPOINT must be an origin like http://host:port, got "${endpoint}"`);
  }
  const bucket = reader.string('S3_BUCKET', 'siteband-dev');
  if (!BUCKET_NAME.test(bucket)) {
    reader.problems.push(`S3_BUCKET must be 3–63 lower-case letters, digits, dots or hyphens, got "${bucket}"`);
  }
  const region = reader.string('S3_REGION', 'us-east-1');
  const fallback = production ? '' : S3_FAKE_CREDENTIAL;
  const accessKeyId = reader.string('S3_ACCESS_KEY_ID', fallback);
  const secretAccessKey = reader.string('S3_SECRET_ACCESS_KEY', fallback);
  if (production) {
    if (!accessKeyId || !secretAccessKey) reader.problems.push('S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY are required in production');
    else if (accessKeyId === S3_FAKE_CREDENTIAL || secretAccessKey === S3_FAKE_CREDENTIAL) {
      reader.problems.push("S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY may not be the local fake's credentials in production");
    }
  }
  return { endpoint: endpoint?.replace(/\/$/, ''), bucket, region, accessKeyId, secretAccessKey };
}
