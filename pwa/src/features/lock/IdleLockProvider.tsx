import { createContext, useCallback, useContext, useEffect, useLayoutEffect, useMemo, useSyncExternalStore, type ReactNode } from 'react';
import { useSession } from '../session/SessionProvider';
import { idleTimeReached, PASSWORD_TRIES, PIN_PATTERN, PIN_TRIES, unlockStage, type UnlockStage } from './idleLockRules';
import { lockStore } from './lockStore';
import { createVerifier, matchesVerifier } from './secretVerifier';

export interface IdleLockValue {
  /** True while the lock screen hides the app. */
  locked: boolean;
  stage: UnlockStage;
  /** Whether the tablet can check the password itself (a verifier from the last online sign-in). */
  canCheckPasswordHere: boolean;
  pinTriesLeft: number;
  passwordTriesLeft: number;
  hasPin: boolean;
  idleMinutes: number;
  defaultIdleMinutes: number;
  lockNow(): void;
  /** True when the PIN matched and the app unlocked. */
  unlockWithPin(pin: string): Promise<boolean>;
  /** True when the password matched the verifier kept on the tablet and the app unlocked. */
  unlockWithPassword(password: string): Promise<boolean>;
  /** Signs in again with the server; throws the sign-in's error when it refuses or cannot be reached. */
  unlockWithServer(password: string): Promise<void>;
  setPin(pin: string): Promise<void>;
  removePin(): void;
  setIdleMinutes(minutes: number): void;
}

const IdleLockContext = createContext<IdleLockValue | undefined>(undefined);

/** How often the idle time is checked while the app is open; a sleeping tablet is checked again when it wakes. */
const IDLE_CHECK_MS = 10_000;
/** Activity is recorded at most this often, so typing does not write storage on every key. */
const TOUCH_THROTTLE_MS = 1_000;
const ACTIVITY_EVENTS = ['pointerdown', 'keydown', 'input', 'wheel', 'touchstart'] as const;
const LOCKED_CLASS = 'sb-locked';

/**
 * Locks the signed-in app after the idle time: the lock screen covers it and the app below is hidden
 * and inert but stays mounted, so nothing typed or stored is lost by locking.
 */
export function IdleLockProvider({ defaultIdleMinutes, children }: { defaultIdleMinutes: number; children: ReactNode }) {
  const store = lockStore();
  const { session, status, signIn } = useSession();
  const usable = session !== undefined && (status === 'online' || status === 'offline');
  const userId = session?.user.id;
  const state = useSyncExternalStore(store.subscribe, store.read, store.read);
  const chosenMinutes = useSyncExternalStore(store.subscribe, store.idleMinutes, store.idleMinutes);
  const idleMinutes = chosenMinutes ?? defaultIdleMinutes;
  const mine = state && state.userId === userId ? state : undefined;

  // A session signed in before this tablet had a lock starts one now.
  useEffect(() => {
    if (usable && userId && !mine) store.adopt(userId, Date.now());
  }, [usable, userId, mine, store]);

  const locked = usable && mine !== undefined && mine.locked;

  // Another tab of the app locking or unlocking shows here too.
  useEffect(() => {
    const onStorage = () => store.notify();
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, [store]);

  useEffect(() => {
    if (!usable || locked) return;
    let lastTouch = 0;
    const onActivity = () => {
      const now = Date.now();
      if (now - lastTouch < TOUCH_THROTTLE_MS) return;
      lastTouch = now;
      // Once the event has gone through the app: a store update in the middle of it re-renders a
      // controlled field before React has read the typed text, and the text is lost (a paste, a fill).
      window.setTimeout(() => store.touch(now), 0);
    };
    const check = () => {
      const current = store.read();
      if (current && !current.locked && idleTimeReached(current.lastActiveAt, Date.now(), idleMinutes)) store.lock();
    };
    check();
    ACTIVITY_EVENTS.forEach((name) => window.addEventListener(name, onActivity, { capture: true, passive: true }));
    document.addEventListener('visibilitychange', check);
    const timer = window.setInterval(check, IDLE_CHECK_MS);
    return () => {
      ACTIVITY_EVENTS.forEach((name) => window.removeEventListener(name, onActivity, { capture: true }));
      document.removeEventListener('visibilitychange', check);
      window.clearInterval(timer);
    };
  }, [usable, locked, idleMinutes, store]);

  // Before paint, so a locked app never shows for a frame.
  useLayoutEffect(() => {
    document.documentElement.classList.toggle(LOCKED_CLASS, locked);
    document.querySelector('.sb-app')?.toggleAttribute('inert', locked);
  }, [locked]);

  // The PIN and the password are checked alike against their verifier on the tablet, each with its own tries.
  const unlockHere = useCallback(
    async (kind: 'pin' | 'password', secret: string) => {
      const current = store.read();
      const verifier = current?.[kind];
      const failures = kind === 'pin' ? current?.pinFailures : current?.passwordFailures;
      const tries = kind === 'pin' ? PIN_TRIES : PASSWORD_TRIES;
      if (!verifier || failures === undefined || failures >= tries) return false;
      if (await matchesVerifier(secret, verifier)) {
        store.unlocked(Date.now());
        return true;
      }
      store.failed(kind);
      return false;
    },
    [store],
  );

  const unlockWithServer = useCallback(
    async (password: string) => {
      if (!session) throw new Error('No one is signed in on this tablet');
      // A sign-in the server accepts unlocks, resets the tries and renews the password's verifier.
      await signIn({ email: session.user.email, password });
    },
    [session, signIn],
  );

  const setPin = useCallback(
    async (pin: string) => {
      if (!PIN_PATTERN.test(pin)) throw new RangeError('A PIN is 4 to 8 digits');
      store.setPin(await createVerifier(pin));
    },
    [store],
  );

  const value = useMemo<IdleLockValue>(() => {
    const standing = {
      hasPin: mine?.pin !== undefined,
      hasPasswordVerifier: mine?.password !== undefined,
      pinFailures: mine?.pinFailures ?? 0,
      passwordFailures: mine?.passwordFailures ?? 0,
    };
    return {
      locked,
      stage: unlockStage(standing),
      canCheckPasswordHere: standing.hasPasswordVerifier && standing.passwordFailures < PASSWORD_TRIES,
      pinTriesLeft: Math.max(0, PIN_TRIES - standing.pinFailures),
      passwordTriesLeft: Math.max(0, PASSWORD_TRIES - standing.passwordFailures),
      hasPin: standing.hasPin,
      idleMinutes,
      defaultIdleMinutes,
      lockNow: () => store.lock(),
      unlockWithPin: (pin) => unlockHere('pin', pin),
      unlockWithPassword: (password) => unlockHere('password', password),
      unlockWithServer,
      setPin,
      removePin: () => store.setPin(undefined),
      setIdleMinutes: (minutes) => store.setIdleMinutes(minutes),
    };
  }, [mine, locked, idleMinutes, defaultIdleMinutes, store, unlockHere, unlockWithServer, setPin]);

  return <IdleLockContext.Provider value={value}>{children}</IdleLockContext.Provider>;
}

/** The idle lock of the nearest IdleLockProvider. */
export function useIdleLock(): IdleLockValue {
  const value = useContext(IdleLockContext);
  if (!value) throw new Error('useIdleLock needs an IdleLockProvider above it');
  return value;
}
