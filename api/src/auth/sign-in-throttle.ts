import type { ThrottlerModuleOptions } from '@nestjs/throttler';
import type { AppConfig } from '../config/app-config';
import { normalizeEmail } from '../users/email';
import type { SignInAttemptStore } from './sign-in-attempt.store';

/**
 * The throttler's name. 'default' keeps the standard header names (Retry-After, X-RateLimit-*); a named
 * throttler would suffix them. Sign-in is the only throttled route.
 */
export const SIGN_IN_THROTTLER = 'default';

/** Who is trying to sign in: the client address and the (normalised) email they try. */
export function signInTracker(req: { ip?: string; socket?: { remoteAddress?: string }; body?: unknown }): string {
  const ip = req.ip ?? req.socket?.remoteAddress ?? 'unknown';
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return `${ip}|${typeof email === 'string' ? normalizeEmail(email) : ''}`;
}

/** The storage key of a tracker's sign-in attempts. */
export function signInThrottleKey(tracker: string): string {
  return `sign-in:${tracker}`;
}

/** At most `maxFailures` failed sign-ins per address and email within the window; then 429 for a window. */
export function signInThrottlerOptions(config: AppConfig, storage: SignInAttemptStore): ThrottlerModuleOptions {
  const windowMs = config.signIn.windowSeconds * 1000;
  return {
    throttlers: [
      {
        name: SIGN_IN_THROTTLER,
        limit: config.signIn.maxFailures,
        ttl: windowMs,
        blockDuration: windowMs,
        getTracker: (req) => signInTracker(req),
        generateKey: (_context, tracker) => signInThrottleKey(tracker),
      },
    ],
    storage,
    errorMessage: 'Too many failed sign-in attempts for this email: wait a minute and try again',
  };
}
