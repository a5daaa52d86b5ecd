/** Default length of the offline session in hours: three days covers a long weekend deployment (common practice). */
export const DEFAULT_OFFLINE_SESSION_HOURS = 72;

/** Reads VITE_OFFLINE_SESSION_HOURS; an unset value gives the default, a wrong one an error naming it. */
export function parseOfflineSessionHours(raw: string | undefined): number {
  if (raw === undefined || raw.trim() === '') return DEFAULT_OFFLINE_SESSION_HOURS;
  const hours = Number(raw);
  if (!Number.isFinite(hours) || hours <= 0) {
    throw new RangeError(`VITE_OFFLINE_SESSION_HOURS must be a positive number of hours, got "${raw}"`);
  }
  return hours;
}
