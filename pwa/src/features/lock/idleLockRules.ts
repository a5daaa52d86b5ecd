import { CLOCK_SKEW_TOLERANCE_MS } from '../session/offlineGrace';

/** Wrong PINs allowed before the password is required (common practice for device PINs). */
export const PIN_TRIES = 3;
/** Wrong passwords allowed on the tablet before only the server may check the password (common practice). */
export const PASSWORD_TRIES = 3;

/** A PIN is four to eight digits (common practice for device PINs). */
export const PIN_PATTERN = /^\d{4,8}$/;
export const PIN_MIN_DIGITS = 4;
export const PIN_MAX_DIGITS = 8;

/** What may unlock the app now: the PIN, the password checked on the tablet, or only the server. */
export type UnlockStage = 'pin' | 'password' | 'server';

export interface UnlockStanding {
  hasPin: boolean;
  hasPasswordVerifier: boolean;
  pinFailures: number;
  passwordFailures: number;
}

/** The first way of unlocking still open: each is closed after its wrong tries, the server is always last. */
export function unlockStage({ hasPin, hasPasswordVerifier, pinFailures, passwordFailures }: UnlockStanding): UnlockStage {
  if (hasPin && pinFailures < PIN_TRIES) return 'pin';
  if (hasPasswordVerifier && passwordFailures < PASSWORD_TRIES) return 'password';
  return 'server';
}

/**
 * True when the app has been untouched for the idle time. A clock set back by more than the skew
 * tolerance counts as idle too, so turning the clock back cannot keep a lost tablet open.
 */
export function idleTimeReached(lastActiveAt: number, now: number, idleMinutes: number): boolean {
  return now - lastActiveAt >= idleMinutes * 60_000 || now < lastActiveAt - CLOCK_SKEW_TOLERANCE_MS;
}
