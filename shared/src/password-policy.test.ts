import { describe, expect, it } from 'vitest';
import { MAX_PASSWORD_BYTES, MIN_PASSWORD_LENGTH, passwordPolicyBreach, passwordPolicyProblem } from './password-policy.js';

describe('the password policy', () => {
  it('takes 12 characters up to 72 bytes', () => {
    expect(passwordPolicyBreach('a'.repeat(MIN_PASSWORD_LENGTH))).toBeNull();
    expect(passwordPolicyBreach('a'.repeat(MAX_PASSWORD_BYTES))).toBeNull();
    expect(passwordPolicyProblem('a'.repeat(MIN_PASSWORD_LENGTH))).toBeNull();
  });

  it('refuses fewer than 12 characters', () => {
    expect(passwordPolicyBreach('a'.repeat(MIN_PASSWORD_LENGTH - 1))).toBe('tooShort');
    expect(passwordPolicyProblem('short')).toBe('password must have at least 12 characters');
  });

  it('counts bytes, not characters, against the upper limit (what bcrypt reads)', () => {
    // 37 two-byte characters: 37 characters but 74 bytes.
    const accented = 'é'.repeat(37);
    expect(passwordPolicyBreach(accented)).toBe('tooLong');
    expect(passwordPolicyProblem(accented)).toBe('password must be at most 72 bytes long');
    expect(passwordPolicyBreach('é'.repeat(36))).toBeNull();
  });
});
