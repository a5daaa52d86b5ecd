/**
 * A salted PBKDF2 verifier of a PIN or password: enough to check a later entry on this tablet, never
 * enough to read the secret back. Only the verifier is stored; the secret itself never is.
 */
export interface SecretVerifier {
  /** Base64 of the random salt. */
  salt: string;
  /** Base64 of the derived bits. */
  hash: string;
  iterations: number;
}

/** PBKDF2-HMAC-SHA256 with 600,000 iterations (OWASP Password Storage Cheat Sheet, 2023; from memory). */
export const PBKDF2_ITERATIONS = 600_000;
const SALT_BYTES = 16;
const HASH_BITS = 256;

function toBase64(bytes: Uint8Array): string {
  return btoa(String.fromCharCode(...bytes));
}

function fromBase64(text: string): Uint8Array<ArrayBuffer> {
  return Uint8Array.from(atob(text), (char) => char.charCodeAt(0));
}

async function derive(secret: string, salt: Uint8Array<ArrayBuffer>, iterations: number): Promise<Uint8Array> {
  const key = await crypto.subtle.importKey('raw', new TextEncoder().encode(secret), 'PBKDF2', false, ['deriveBits']);
  const bits = await crypto.subtle.deriveBits({ name: 'PBKDF2', salt, iterations, hash: 'SHA-256' }, key, HASH_BITS);
  return new Uint8Array(bits);
}

/** Derives a fresh verifier of the secret with a new random salt. */
export async function createVerifier(secret: string, iterations = PBKDF2_ITERATIONS): Promise<SecretVerifier> {
  const salt = crypto.getRandomValues(new Uint8Array(SALT_BYTES));
  return { salt: toBase64(salt), hash: toBase64(await derive(secret, salt, iterations)), iterations };
}

/** True when the secret derives to the verifier's bits; compares every byte so timing does not tell how close a guess was. */
export async function matchesVerifier(secret: string, verifier: SecretVerifier): Promise<boolean> {
  const expected = fromBase64(verifier.hash);
  const actual = await derive(secret, fromBase64(verifier.salt), verifier.iterations);
  let difference = expected.length ^ actual.length;
  for (let i = 0; i < expected.length; i += 1) difference |= expected[i] ^ (actual[i] ?? 0);
  return difference === 0;
}

/** True for a stored value shaped like a verifier (storage may hold anything). */
export function isSecretVerifier(value: unknown): value is SecretVerifier {
  const v = value as SecretVerifier | null;
  return typeof v === 'object' && v !== null && typeof v.salt === 'string' && typeof v.hash === 'string' && Number.isInteger(v.iterations) && v.iterations > 0;
}
