import { describe, expect, it } from 'vitest';
import { CLOCK_SKEW_TOLERANCE_MS, offlineSessionEndsAt, sessionStatus } from './offlineGrace';
import type { StoredSession } from './types';

const HOUR = 3_600_000;
const confirmedAt = Date.UTC(2026, 5, 1, 8, 0, 0);
const session: StoredSession = {
  user: { id: 'u-1', email: 'field@example.test', displayName: 'Field Person', role: 'inspector' },
  accessToken: 'access',
  refreshToken: 'refresh',
  accessTokenExpiresAt: confirmedAt + 15 * 60_000,
  confirmedAt,
};

describe('sessionStatus', () => {
  it('is signed-out without a stored session, online or not', () => {
    expect(sessionStatus({ session: undefined, now: confirmedAt, online: true, offlineSessionHours: 72 })).toBe('signed-out');
    expect(sessionStatus({ session: undefined, now: confirmedAt, online: false, offlineSessionHours: 72 })).toBe('signed-out');
  });

  it('follows the connection while inside the offline period', () => {
    const now = confirmedAt + 10 * HOUR;
    expect(sessionStatus({ session, now, online: true, offlineSessionHours: 72 })).toBe('online');
    expect(sessionStatus({ session, now, online: false, offlineSessionHours: 72 })).toBe('offline');
  });

  it('still works at the last millisecond of the period and expires one after', () => {
    const end = offlineSessionEndsAt(session, 72);
    expect(end - confirmedAt).toBe(72 * HOUR);
    expect(sessionStatus({ session, now: end, online: false, offlineSessionHours: 72 })).toBe('offline');
    expect(sessionStatus({ session, now: end + 1, online: false, offlineSessionHours: 72 })).toBe('expired');
    expect(sessionStatus({ session, now: end + 1, online: true, offlineSessionHours: 72 })).toBe('expired');
  });

  it('uses the configured period, not a fixed one', () => {
    const now = confirmedAt + 5 * HOUR;
    expect(sessionStatus({ session, now, online: false, offlineSessionHours: 4 })).toBe('expired');
    expect(sessionStatus({ session, now, online: false, offlineSessionHours: 6 })).toBe('offline');
    expect(offlineSessionEndsAt(session, 0.5)).toBe(confirmedAt + 30 * 60_000);
  });

  it('tolerates a small clock correction backwards but not a large one', () => {
    const slightlyBack = confirmedAt - CLOCK_SKEW_TOLERANCE_MS + 1;
    const farBack = confirmedAt - CLOCK_SKEW_TOLERANCE_MS - 1;
    expect(sessionStatus({ session, now: slightlyBack, online: false, offlineSessionHours: 72 })).toBe('offline');
    expect(sessionStatus({ session, now: farBack, online: false, offlineSessionHours: 72 })).toBe('expired');
  });
});
