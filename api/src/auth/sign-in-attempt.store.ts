import type { ThrottlerStorage } from '@nestjs/throttler';

interface AttemptRecord {
  /** When each counted attempt stops counting (ms since epoch). */
  expiries: number[];
  blockedUntil: number;
}

/** Sweep forgotten records every this many increments, so varied emails cannot grow memory without end. */
const SWEEP_EVERY = 500;

/**
 * In-memory storage for `@nestjs/throttler` with one addition, `reset`: a successful sign-in clears its
 * counter, so only failed attempts add up (the guard counts every attempt; the controller resets on success).
 */
export class SignInAttemptStore implements ThrottlerStorage {
  private readonly records = new Map<string, AttemptRecord>();
  private incrementsSinceSweep = 0;

  /** Counts an attempt; blocks the key for `blockDuration` ms once more than `limit` fall within `ttl` ms. */
  async increment(key: string, ttl: number, limit: number, blockDuration: number): Promise<{
    totalHits: number;
    timeToExpire: number;
    isBlocked: boolean;
    timeToBlockExpire: number;
  }> {
    const now = Date.now();
    if (++this.incrementsSinceSweep >= SWEEP_EVERY) this.sweep(now);
    const record = this.records.get(key) ?? { expiries: [], blockedUntil: 0 };
    this.records.set(key, record);
    record.expiries = record.expiries.filter((expiry) => expiry > now);
    if (record.blockedUntil <= now) {
      record.expiries.push(now + ttl);
      if (record.expiries.length > limit) record.blockedUntil = now + blockDuration;
    }
    const isBlocked = record.blockedUntil > now;
    return {
      totalHits: record.expiries.length,
      timeToExpire: secondsUntil(Math.max(now, ...record.expiries), now),
      isBlocked,
      timeToBlockExpire: isBlocked ? secondsUntil(record.blockedUntil, now) : 0,
    };
  }

  /** Forgets the attempts counted for the key. */
  reset(key: string): void {
    this.records.delete(key);
  }

  private sweep(now: number): void {
    this.incrementsSinceSweep = 0;
    for (const [key, record] of this.records) {
      if (record.blockedUntil <= now && record.expiries.every((expiry) => expiry <= now)) this.records.delete(key);
    }
  }
}

function secondsUntil(time: number, now: number): number {
  return Math.max(0, Math.ceil((time - now) / 1000));
}
