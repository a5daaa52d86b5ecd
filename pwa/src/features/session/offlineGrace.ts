import type { StoredSession } from './types';

/** Where the stored session stands right now. */
export type SessionStatus = 'signed-out' | 'online' | 'offline' | 'expired';

export interface SessionStatusInput {
  session: StoredSession | undefined;
  /** Epoch milliseconds. */
  now: number;
  online: boolean;
  /** How long a session stays usable without the server confirming it. */
  offlineSessionHours: number;
}

const HOUR_MS = 3_600_000;

/**
 * A device clock may be corrected backwards by a few minutes; a larger jump back is treated as
 * tampering with the offline period, so the person must sign in again (common practice).
 */
export const CLOCK_SKEW_TOLERANCE_MS = 5 * 60_000;

/** Epoch milliseconds until which the session may be used without the server. */
export function offlineSessionEndsAt(session: StoredSession, offlineSessionHours: number): number {
  return session.confirmedAt + offlineSessionHours * HOUR_MS;
}

/** Decides whether the stored session may be used, and whether the shell runs online or offline. */
export function sessionStatus({ session, now, online, offlineSessionHours }: SessionStatusInput): SessionStatus {
  if (!session) return 'signed-out';
  const clockWentBack = now < session.confirmedAt - CLOCK_SKEW_TOLERANCE_MS;
  if (clockWentBack || now > offlineSessionEndsAt(session, offlineSessionHours)) return 'expired';
  return online ? 'online' : 'offline';
}
