import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** Shortest JWT secret accepted: 32 characters, about 256 bits when random. */
export const MIN_JWT_SECRET_LENGTH = 32;

/** Values copied from examples and tutorials: never accepted as a production secret. */
const KNOWN_WEAK_SECRETS = new Set(
  ['secret', 'changeme', 'change-me', 'changethis', 'jwt-secret', 'jwtsecret', 'your-secret', 'your_jwt_secret', 'supersecret', 'password', 'siteband']
    .map((s) => s.toLowerCase()),
);

/** Why a JWT secret is too weak to sign tokens with, or null when it is acceptable. */
export function jwtSecretWeakness(secret: string): string | null {
  if (secret.length < MIN_JWT_SECRET_LENGTH) return `it has ${secret.length} characters, fewer than ${MIN_JWT_SECRET_LENGTH}`;
  const lowered = secret.toLowerCase();
  for (const weak of KNOWN_WEAK_SECRETS) {
    if (lowered.replace(/[^a-z_-]/g, '') === weak) return 'it is a well-known example value';
  }
  if (new Set(secret).size < 10) return 'it repeats too few distinct characters';
  return null;
}

/**
 * Development only: the secret kept in `<dataDir>/jwt-secret`, created (mode 0600) with 48 random bytes
 * the first time, so tokens survive restarts without anyone committing a secret.
 */
export function readOrCreateDevJwtSecret(dataDir: string): string {
  const file = join(dataDir, 'jwt-secret');
  try {
    return readFileSync(file, 'utf8').trim();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  mkdirSync(dataDir, { recursive: true, mode: 0o700 });
  const secret = randomBytes(48).toString('base64url');
  try {
    // 'wx' fails if another process created the file meanwhile: then theirs wins.
    writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: 'wx' });
    return secret;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST') return readFileSync(file, 'utf8').trim();
    throw error;
  }
}
