import { beforeEach, describe, expect, it } from 'vitest';
import { idleTimeReached, PASSWORD_TRIES, PIN_TRIES, unlockStage } from './idleLockRules';
import { createLockStore } from './lockStore';
import { createVerifier, matchesVerifier } from './secretVerifier';

// Fewer iterations than the app's keep these tests quick; the derivation is the same.
const FAST = 1_000;

describe('secret verifiers', () => {
  it('match the secret they were made from and nothing else, and never hold the secret', async () => {
    const verifier = await createVerifier('4821', FAST);
    expect(await matchesVerifier('4821', verifier)).toBe(true);
    expect(await matchesVerifier('4822', verifier)).toBe(false);
    expect(await matchesVerifier('', verifier)).toBe(false);
    expect(JSON.stringify(verifier)).not.toContain('4821');
  });

  it('use a fresh salt each time, so the same PIN gives different verifiers', async () => {
    const [a, b] = await Promise.all([createVerifier('4821', FAST), createVerifier('4821', FAST)]);
    expect(a.salt).not.toBe(b.salt);
    expect(a.hash).not.toBe(b.hash);
  });
});

describe('unlock stages', () => {
  const none = { hasPin: false, hasPasswordVerifier: false, pinFailures: 0, passwordFailures: 0 };
  it('offer the PIN first, the password after the wrong PINs, the server after the wrong passwords', () => {
    expect(unlockStage({ ...none, hasPin: true, hasPasswordVerifier: true })).toBe('pin');
    expect(unlockStage({ ...none, hasPin: true, hasPasswordVerifier: true, pinFailures: PIN_TRIES })).toBe('password');
    expect(
      unlockStage({ hasPin: true, hasPasswordVerifier: true, pinFailures: PIN_TRIES, passwordFailures: PASSWORD_TRIES }),
    ).toBe('server');
    expect(unlockStage({ ...none, hasPasswordVerifier: true })).toBe('password');
    expect(unlockStage(none)).toBe('server');
  });
});

describe('idle time', () => {
  const start = Date.UTC(2026, 11, 1, 9, 0);
  it('is reached after the chosen minutes untouched, or when the clock is set back', () => {
    expect(idleTimeReached(start, start + 4 * 60_000, 5)).toBe(false);
    expect(idleTimeReached(start, start + 5 * 60_000, 5)).toBe(true);
    expect(idleTimeReached(start, start - 60 * 60_000, 5)).toBe(true);
  });
});

describe('lock store', () => {
  let storage: Storage;
  beforeEach(() => {
    localStorage.clear();
    storage = localStorage;
  });

  it('locks, counts wrong tries, and a sign-in by the same person keeps the PIN but not the tries', async () => {
    const store = createLockStore(storage);
    const password = await createVerifier('secret', FAST);
    store.signedIn('u-1', password, 1_000);
    store.setPin(await createVerifier('4821', FAST));
    store.lock();
    store.failed('pin');
    store.failed('pin');
    // A fresh store reads the same state back, as after a reload.
    const reloaded = createLockStore(storage);
    expect(reloaded.read()).toMatchObject({ userId: 'u-1', locked: true, pinFailures: 2, passwordFailures: 0 });

    reloaded.signedIn('u-1', password, 2_000);
    expect(reloaded.read()).toMatchObject({ locked: false, pinFailures: 0, lastActiveAt: 2_000 });
    expect(reloaded.read()?.pin).toBeDefined();

    reloaded.signedIn('u-2', password, 3_000);
    expect(reloaded.read()?.pin).toBeUndefined();
  });

  it('ignores activity while locked, and forgets everything but the idle setting on sign-out', () => {
    const store = createLockStore(storage);
    store.adopt('u-1', 1_000);
    store.lock();
    store.touch(5_000);
    expect(store.read()?.lastActiveAt).toBe(1_000);
    store.setIdleMinutes(2);
    store.signedOut();
    expect(store.read()).toBeUndefined();
    expect(store.idleMinutes()).toBe(2);
    expect(() => store.setIdleMinutes(0.1)).toThrow(RangeError);
  });

  it('treats a damaged state as locked with its tries used up', () => {
    storage.setItem('siteband.lock', JSON.stringify({ userId: 'u-1', lastActiveAt: 1, pinFailures: 'x' }));
    expect(createLockStore(storage).read()).toMatchObject({ locked: true, pinFailures: PIN_TRIES, passwordFailures: PASSWORD_TRIES });
  });
});
