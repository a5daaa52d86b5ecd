import { createContext, useContext, useEffect, useMemo, useRef, useSyncExternalStore, type ReactNode } from 'react';
import { SignOutBlockedNotice } from '../../components/cases/SignOutBlockedNotice';
import { useApiClient } from '../api/ApiClientContext';
import { captureDb } from '../cases/captureDb';
import { useSession } from '../session/SessionProvider';
import { createByteSender } from './byteSender';
import { clientId } from './clientId';
import { createSyncEngine, type SyncEngine, type SyncStatus } from './syncEngine';

/** How often sync runs while the tablet is online and the app is open (common practice: once a minute). */
export const SYNC_INTERVAL_MS = 60_000;

const SyncContext = createContext<SyncEngine | undefined>(undefined);

/**
 * Runs sync for the signed-in inspector: at start, when the network comes back, every minute while
 * online (unless a backoff after failures runs longer), and whenever a screen asks ("sync now").
 * Offline, nothing is tried.
 */
export function SyncProvider({ children }: { children: ReactNode }) {
  const api = useApiClient();
  const { session } = useSession();
  const token = useRef(session?.accessToken);
  token.current = session?.accessToken;
  const engine = useMemo(() => {
    const db = captureDb();
    return createSyncEngine({ db, api, sender: createByteSender(() => token.current), clientId: () => clientId(db) });
  }, [api]);
  const enabled = session?.user.role === 'inspector';

  useEffect(() => {
    if (!enabled) return undefined;
    const run = () => {
      if (navigator.onLine) void engine.syncNow();
    };
    // The clock never cuts a backoff short: after failures the next try waits for the engine's retry.
    const tick = () => {
      const { retryAt } = engine.status();
      if (retryAt === null || retryAt <= Date.now()) run();
    };
    run();
    window.addEventListener('online', run);
    const timer = window.setInterval(tick, SYNC_INTERVAL_MS);
    return () => {
      window.removeEventListener('online', run);
      window.clearInterval(timer);
      engine.stop();
    };
  }, [engine, enabled]);

  return (
    <SyncContext.Provider value={engine}>
      {children}
      <SignOutBlockedNotice />
    </SyncContext.Provider>
  );
}

/** The sync status and the "sync now" action of the nearest SyncProvider. */
export function useSync(): { status: SyncStatus; syncNow: () => Promise<SyncStatus> } {
  const engine = useContext(SyncContext);
  if (!engine) throw new Error('useSync needs a SyncProvider above it');
  const status = useSyncExternalStore(engine.subscribe, engine.status, engine.status);
  return { status, syncNow: engine.syncNow };
}
