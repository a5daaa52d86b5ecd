/** The one password rule, for the API and the PWA: 12 to 72 bytes (bcrypt reads no further than 72 bytes). */
export const MIN_PASSWORD_LENGTH = 12;
export const MAX_PASSWORD_BYTES = 72;

/** Which part of the policy a password breaks, or null when it is acceptable. */
export function passwordPolicyBreach(password: string): 'tooShort' | 'tooLong' | null {
  if (password.length < MIN_PASSWORD_LENGTH) return 'tooShort';
  if (new TextEncoder().encode(password).length > MAX_PASSWORD_BYTES) return 'tooLong';
  return null;
}

/** Why a password breaks the policy, or null when it is acceptable. */
export function passwordPolicyProblem(password: string): string | null {
  switch (passwordPolicyBreach(password)) {
    case 'tooShort':
      return `password must have at least ${MIN_PASSWORD_LENGTH} characters`;
    case 'tooLong':
      return `password must be at most ${MAX_PASSWORD_BYTES} bytes long`;
    default:
      return null;
  }
}
