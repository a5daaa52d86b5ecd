import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { backoffDelayMs } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router-dom';
import { useApiClient } from '../api/ApiClientContext';
import { useOnlineStatus } from '../network/onlineStatus';
import { useSession } from '../session/SessionProvider';
import { streamEvents } from './eventsApi';
import { LIVE_QUERY_ROOTS, type LiveEvent } from './liveEvent';
import { followsLiveEvents, notificationFor, notificationsAllowed } from './notifications';

/**
 * Where the live events stand: `off` (offline, signed out or a role without them), `connecting`,
 * `live`, `retrying` after a drop, `refused` by the server.
 */
export type LiveStatus = 'off' | 'connecting' | 'live' | 'retrying' | 'refused';

type Listener = (event: LiveEvent) => void;

interface EventsContextValue {
  status: LiveStatus;
  subscribe(listener: Listener): () => void;
}

const EventsContext = createContext<EventsContextValue | undefined>(undefined);

/** Reconnect delays: from one second, doubling, at most a minute (common practice for live screens). */
const RECONNECT = { baseMs: 1_000, maxMs: 60_000 } as const;

/**
 * Keeps one live-events stream open while the person is signed in and online. Each event refreshes the
 * server data it may change (TanStack Query keys under LIVE_QUERY_ROOTS), reaches the screens that
 * subscribed with useLiveEvents, and notifies through the browser where the person allowed it.
 * After a reconnect everything under the roots is refreshed, since events may have been missed.
 */
export function EventsProvider({ children }: { children: ReactNode }) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const { session, status: sessionStatus } = useSession();
  const online = useOnlineStatus();
  const navigate = useNavigate();
  const { t } = useTranslation();
  const [status, setStatus] = useState<LiveStatus>('off');
  const listeners = useRef(new Set<Listener>());
  // The latest navigate and t, read when an event arrives, so a new render does not reopen the stream.
  const latest = useRef({ navigate, t });
  latest.current = { navigate, t };

  const role = session?.user.role;
  const userId = session?.user.id;
  const enabled = role !== undefined && followsLiveEvents(role) && online && sessionStatus === 'online';

  useEffect(() => {
    if (!enabled || !role) {
      setStatus('off');
      return undefined;
    }
    const controller = new AbortController();
    let failures = 0;
    let opened = false;
    const refreshAll = () => LIVE_QUERY_ROOTS.forEach((queryKey) => void queryClient.invalidateQueries({ queryKey }));
    setStatus('connecting');
    streamEvents(client, controller.signal, {
      onOpen() {
        if (opened) refreshAll();
        opened = true;
        failures = 0;
        setStatus('live');
      },
      onEvent(event) {
        refreshAll();
        listeners.current.forEach((listener) => listener(event));
        const note = notificationFor(role, event);
        if (note && notificationsAllowed()) {
          const { t: translate } = latest.current;
          const notification = new Notification(translate(note.titleKey), { body: translate(note.bodyKey), tag: `${event.type}:${event.id}` });
          notification.onclick = () => {
            window.focus();
            latest.current.navigate(note.path);
            notification.close();
          };
        }
      },
      onDrop() {
        failures += 1;
        setStatus('retrying');
        return backoffDelayMs(failures, RECONNECT);
      },
    }).catch(() => {
      if (!controller.signal.aborted) setStatus('refused');
    });
    return () => controller.abort();
  }, [client, queryClient, enabled, role, userId]);

  const subscribe = useCallback((listener: Listener) => {
    listeners.current.add(listener);
    return () => {
      listeners.current.delete(listener);
    };
  }, []);
  const value = useMemo<EventsContextValue>(() => ({ status, subscribe }), [status, subscribe]);
  return <EventsContext.Provider value={value}>{children}</EventsContext.Provider>;
}

function useEventsContext(): EventsContextValue {
  const value = useContext(EventsContext);
  if (!value) throw new Error('useLiveEvents needs an EventsProvider above it');
  return value;
}

/**
 * The live events' status; with a listener, also calls it for every event while the screen is mounted.
 * Server data under LIVE_QUERY_ROOTS refreshes by itself: a listener is for anything else.
 */
export function useLiveEvents(listener?: Listener): LiveStatus {
  const { status, subscribe } = useEventsContext();
  const current = useRef(listener);
  current.current = listener;
  const listening = listener !== undefined;
  useEffect(() => {
    if (!listening) return undefined;
    return subscribe((event) => current.current?.(event));
  }, [subscribe, listening]);
  return status;
}
