/** The one password rule: 12 to 72 bytes (bcrypt reads no further than 72 bytes). */
export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_BYTES = 72;

/** Why a password breaks the policy, or null when it is acceptable. */
export function passwordPolicyProblem(password: string): string | null {
  if (password.length < MIN_PASSWORD_LENGTH) return `password must have at least ${MIN_PASSWORD_LENGTH} characters`;
  if (Buffer.byteLength(password, 'utf8') > MAX_PASSWORD_BYTES) return `password must be at most ${MAX_PASSWORD_BYTES} bytes long`;
  return null;
}
