/** Options of the retry delay; defaults in the comments. */
export interface BackoffOptions {
  /** First delay, ms (default 2 000). */
  baseMs?: number;
  /** Longest delay, ms (default 300 000: five minutes). */
  maxMs?: number;
  /** A number in [0, 1) (default Math.random). */
  random?: () => number;
}

/**
 * Delay before retry number `failures` (1 = first failure): exponential with "equal jitter"
 * (half fixed, half random; common practice), so tablets coming back online together do not retry in step.
 */
export function backoffDelayMs(failures: number, { baseMs = 2_000, maxMs = 300_000, random = Math.random }: BackoffOptions = {}): number {
  if (!Number.isInteger(failures) || failures < 1) throw new RangeError(`failures must be a positive integer, got ${failures}`);
  const ceiling = Math.min(maxMs, baseMs * 2 ** (failures - 1));
  return Math.round(ceiling / 2 + (random() * ceiling) / 2);
}
