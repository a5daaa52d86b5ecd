import { isIdleLockMinutes } from '../../config/idleLockMinutes';
import { PASSWORD_TRIES, PIN_TRIES } from './idleLockRules';
import { isSecretVerifier, type SecretVerifier } from './secretVerifier';

/** The idle lock of the signed-in person on this tablet. */
export interface LockState {
  userId: string;
  locked: boolean;
  /** Epoch milliseconds of the last touch, key press or input while unlocked. */
  lastActiveAt: number;
  pinFailures: number;
  passwordFailures: number;
  /** Verifier of the PIN set on this tablet, if any. */
  pin?: SecretVerifier;
  /** Verifier of the password of the last online sign-in, so the app unlocks offline too. */
  password?: SecretVerifier;
}

// localStorage, not IndexedDB: read synchronously before the first paint, so case data never flashes before the lock.
const STATE_KEY = 'siteband.lock';
// A device setting: it survives sign-out, unlike the state above.
const IDLE_MINUTES_KEY = 'siteband.idleLockMinutes';

function parseState(raw: string | null): LockState | undefined {
  if (!raw) return undefined;
  try {
    const value = JSON.parse(raw) as Partial<LockState>;
    if (typeof value.userId !== 'string' || typeof value.lastActiveAt !== 'number') return undefined;
    return {
      userId: value.userId,
      // Anything unreadable errs on the locked, used-up side.
      locked: value.locked !== false,
      lastActiveAt: value.lastActiveAt,
      pinFailures: Number.isInteger(value.pinFailures) ? value.pinFailures! : PIN_TRIES,
      passwordFailures: Number.isInteger(value.passwordFailures) ? value.passwordFailures! : PASSWORD_TRIES,
      pin: isSecretVerifier(value.pin) ? value.pin : undefined,
      password: isSecretVerifier(value.password) ? value.password : undefined,
    };
  } catch {
    return undefined;
  }
}

/** Reads and writes the lock state and the idle-time setting in the given storage, and tells subscribers. */
export function createLockStore(storage: Storage) {
  const listeners = new Set<() => void>();
  let cachedRaw: string | null = null;
  let cached: LockState | undefined;

  function read(): LockState | undefined {
    const raw = storage.getItem(STATE_KEY);
    // The same object while nothing changed, as useSyncExternalStore requires.
    if (raw !== cachedRaw) {
      cachedRaw = raw;
      cached = parseState(raw);
    }
    return cached;
  }
  function notify() {
    listeners.forEach((listener) => listener());
  }
  function write(next: LockState | undefined) {
    if (next) storage.setItem(STATE_KEY, JSON.stringify(next));
    else storage.removeItem(STATE_KEY);
    notify();
  }
  function update(change: (state: LockState) => LockState) {
    const state = read();
    if (state) write(change(state));
  }

  return {
    read,
    subscribe(listener: () => void) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    /** Another tab changed the storage: re-read. */
    notify,
    /** A sign-in that the server accepted: unlocked, counters reset, the password's verifier kept; a PIN survives only for the same person. */
    signedIn(userId: string, password: SecretVerifier, now: number) {
      const previous = read();
      const pin = previous?.userId === userId ? previous.pin : undefined;
      write({ userId, locked: false, lastActiveAt: now, pinFailures: 0, passwordFailures: 0, pin, password });
    },
    /** A session from before the lock existed: start it unlocked, with nothing to check offline yet. */
    adopt(userId: string, now: number) {
      write({ userId, locked: false, lastActiveAt: now, pinFailures: 0, passwordFailures: 0 });
    },
    signedOut() {
      write(undefined);
    },
    touch(now: number) {
      update((state) => (state.locked ? state : { ...state, lastActiveAt: now }));
    },
    lock() {
      update((state) => ({ ...state, locked: true }));
    },
    unlocked(now: number) {
      update((state) => ({ ...state, locked: false, lastActiveAt: now, pinFailures: 0, passwordFailures: 0 }));
    },
    failed(kind: 'pin' | 'password') {
      update((state) =>
        kind === 'pin' ? { ...state, pinFailures: state.pinFailures + 1 } : { ...state, passwordFailures: state.passwordFailures + 1 },
      );
    },
    setPin(pin: SecretVerifier | undefined) {
      update((state) => ({ ...state, pin, pinFailures: 0 }));
    },
    /** The person's idle time on this tablet, or undefined to use the build's default. */
    idleMinutes(): number | undefined {
      const stored = Number(storage.getItem(IDLE_MINUTES_KEY));
      return isIdleLockMinutes(stored) ? stored : undefined;
    },
    setIdleMinutes(minutes: number) {
      if (!isIdleLockMinutes(minutes)) throw new RangeError(`The idle time must be within the allowed bounds, got ${minutes}`);
      storage.setItem(IDLE_MINUTES_KEY, String(minutes));
      notify();
    },
  };
}

export type LockStore = ReturnType<typeof createLockStore>;

let shared: LockStore | undefined;
/** The tablet's lock store over localStorage. */
export function lockStore(): LockStore {
  shared ??= createLockStore(localStorage);
  return shared;
}
