import { createContext, useCallback, useContext, useEffect, useMemo, useState, useSyncExternalStore, type ReactNode } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../api/ApiClientContext';
import { ApiError } from '../api/apiError';
import { useOnlineStatus } from '../network/onlineStatus';
import { lockStore } from '../lock/lockStore';
import { createVerifier } from '../lock/secretVerifier';
import { notifySignOutBlocked } from '../sync/signOutBlocked';
import { login, logout, meQuery } from './authApi';
import { offlineSessionEndsAt, sessionStatus, type SessionStatus } from './offlineGrace';
import type { SessionStore } from './sessionStore';
import type { Credentials, StoredSession } from './types';

export interface SessionContextValue {
  session: StoredSession | undefined;
  status: SessionStatus;
  /** Epoch milliseconds until which the shell works without the server. */
  offlineUntil: number | undefined;
  offlineSessionHours: number;
  signIn(credentials: Credentials): Promise<StoredSession>;
  /** Revokes the refresh token when the server is reachable, then forgets the session here. */
  signOut(): Promise<void>;
}

const SessionContext = createContext<SessionContextValue | undefined>(undefined);

// How often the expiry of an offline session is re-evaluated while the app stays open.
const STATUS_TICK_MS = 60_000;

/** Provides the signed-in session, its online/offline/expired status and the sign-in and sign-out actions. */
export function SessionProvider({ store, offlineSessionHours, children }: { store: SessionStore; offlineSessionHours: number; children: ReactNode }) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const online = useOnlineStatus();
  const session = useSyncExternalStore(store.subscribe, store.current, store.current);
  const [now, setNow] = useState(() => Date.now());

  useEffect(() => {
    const timer = window.setInterval(() => setNow(Date.now()), STATUS_TICK_MS);
    return () => window.clearInterval(timer);
  }, []);
  // Coming back online or changing the session re-evaluates the status at once.
  useEffect(() => setNow(Date.now()), [online, session]);

  const status = sessionStatus({ session, now, online, offlineSessionHours });

  // Only an online, unexpired session asks the server; offline the shell runs from the stored user.
  const me = useQuery({ ...meQuery(client), enabled: status === 'online' });
  useEffect(() => {
    if (me.data && store.current()) void store.confirm(me.data);
  }, [me.data, store]);

  const signIn = useCallback(
    async (credentials: Credentials) => {
      const auth = await login(client, credentials);
      // Only a verifier of the accepted password is kept, so the idle lock can check it offline.
      lockStore().signedIn(auth.user.id, await createVerifier(credentials.password), Date.now());
      queryClient.clear();
      return store.save(auth);
    },
    [client, queryClient, store],
  );

  const signOut = useCallback(async () => {
    // Refused while field records wait for the server: signing out would lose them. The database
    // code loads here, not with the first screen (main.tsx).
    const [{ captureDb }, { clearCaptureDataIfSynced, UnsyncedWorkError }] = await Promise.all([import('../cases/captureDb'), import('../sync/clearCaptureData')]);
    try {
      await clearCaptureDataIfSynced(captureDb());
    } catch (error) {
      if (!(error instanceof UnsyncedWorkError)) throw error;
      notifySignOutBlocked();
      return;
    }
    try {
      if (store.current() && navigator.onLine) await logout(client);
    } catch (error) {
      // Unreachable server: the token still expires on its own; signing out here must not be blocked.
      if (!(error instanceof ApiError)) throw error;
    } finally {
      await store.clear();
      lockStore().signedOut();
      queryClient.clear();
    }
  }, [client, queryClient, store]);

  const value = useMemo<SessionContextValue>(
    () => ({
      session,
      status,
      offlineUntil: session ? offlineSessionEndsAt(session, offlineSessionHours) : undefined,
      offlineSessionHours,
      signIn,
      signOut,
    }),
    [session, status, offlineSessionHours, signIn, signOut],
  );
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

/** The session context of the nearest SessionProvider. */
export function useSession(): SessionContextValue {
  const value = useContext(SessionContext);
  if (!value) throw new Error('useSession needs a SessionProvider above it');
  return value;
}
