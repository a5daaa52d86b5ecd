/**
 * How long the tablet may sit untouched before it locks. Ten minutes is a common device-lock setting for
 * field equipment holding personal and case data (common practice); a person may choose within the bounds.
 */
export const DEFAULT_IDLE_LOCK_MINUTES = 10;
/** The choices offered on the Account page; the build default must be one of the bounds' range too. */
export const IDLE_LOCK_CHOICES: readonly number[] = [1, 2, 5, 10, 15, 30, 60];
export const MIN_IDLE_LOCK_MINUTES = IDLE_LOCK_CHOICES[0];
export const MAX_IDLE_LOCK_MINUTES = IDLE_LOCK_CHOICES[IDLE_LOCK_CHOICES.length - 1];

/** True for a whole or fractional number of minutes within the safe bounds. */
export function isIdleLockMinutes(value: unknown): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value >= MIN_IDLE_LOCK_MINUTES && value <= MAX_IDLE_LOCK_MINUTES;
}

/** Reads VITE_IDLE_LOCK_MINUTES; an unset value gives the default, one outside the bounds an error naming it. */
export function parseIdleLockMinutes(raw: string | undefined): number {
  if (raw === undefined || raw.trim() === '') return DEFAULT_IDLE_LOCK_MINUTES;
  const minutes = Number(raw);
  if (!isIdleLockMinutes(minutes)) {
    throw new RangeError(
      `VITE_IDLE_LOCK_MINUTES must be a number of minutes from ${MIN_IDLE_LOCK_MINUTES} to ${MAX_IDLE_LOCK_MINUTES}, got "${raw}"`,
    );
  }
  return minutes;
}
