import { QueryClient, QueryClientProvider, useQuery } from '@tanstack/react-query';
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { sessionRowStorage } from '../../db/sessionTable';
import { ApiClientProvider } from '../api/ApiClientContext';
import { createApiClient } from '../api/client';
import { SessionProvider } from '../session/SessionProvider';
import { createSessionStore, type SessionStore } from '../session/sessionStore';
import type { AuthResponse } from '../session/types';
import { EventsProvider, useLiveEvents } from './EventsProvider';
import type { LiveEvent } from './liveEvent';

const auth: AuthResponse = {
  accessToken: 'access-1',
  refreshToken: 'refresh-1',
  accessTokenExpiresIn: 900,
  user: { id: 'so-1', email: 'safety@example.test', displayName: 'Sam Safety', role: 'safety_officer' },
};

let db: SitebandDb;
/** Who `/api/me` says is signed in: the same person the session holds. */
let me: AuthResponse['user'];
let store: SessionStore;
let inboxLoads: number;
let streamRequests: { authorization: string | null }[];
let pushEvent: ((text: string) => void) | undefined;
const seen: LiveEvent[] = [];

/** An open event stream the test writes to. */
function openStream(): Response {
  const encoder = new TextEncoder();
  const body = new ReadableStream<Uint8Array>({
    start(controller) {
      pushEvent = (text) => controller.enqueue(encoder.encode(text));
    },
  });
  return new Response(body, { status: 200, headers: { 'Content-Type': 'text/event-stream' } });
}

function Inbox() {
  const status = useLiveEvents((event) => seen.push(event));
  const inbox = useQuery({
    queryKey: ['escalations', 'list'],
    queryFn: async () => {
      inboxLoads += 1;
      return inboxLoads;
    },
  });
  return <p data-testid="inbox">{`${status}:${inbox.data ?? '-'}`}</p>;
}

function renderInbox() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  const client = createApiClient({
    tokens: store,
    fetchFn: async (input, init) => {
      const path = String(input);
      if (path === '/api/me') return new Response(JSON.stringify(me), { status: 200, headers: { 'Content-Type': 'application/json' } });
      if (path === '/api/events') {
        streamRequests.push({ authorization: new Headers(init?.headers).get('Authorization') });
        return openStream();
      }
      throw new TypeError('Failed to fetch');
    },
  });
  render(
    <QueryClientProvider client={queryClient}>
      <ApiClientProvider client={client}>
        <SessionProvider store={store} offlineSessionHours={72}>
          <MemoryRouter>
            <EventsProvider>
              <Inbox />
            </EventsProvider>
          </MemoryRouter>
        </SessionProvider>
      </ApiClientProvider>
    </QueryClientProvider>,
  );
}

beforeEach(async () => {
  Object.defineProperty(window.navigator, 'onLine', { configurable: true, get: () => true });
  db = await openDb(`siteband-events-${Math.random().toString(36).slice(2)}`);
  store = createSessionStore(sessionRowStorage(db));
  await store.save(auth);
  me = auth.user;
  inboxLoads = 0;
  streamRequests = [];
  pushEvent = undefined;
  seen.length = 0;
});

afterEach(async () => {
  cleanup();
  await db.delete();
});

describe('EventsProvider', () => {
  it('opens the stream with the bearer token, and each event reloads the escalations and reaches the listeners', async () => {
    renderInbox();
    await waitFor(() => expect(screen.getByTestId('inbox').textContent).toBe('live:1'));
    expect(streamRequests).toEqual([{ authorization: 'Bearer access-1' }]);

    pushEvent!('data: {"type":"escalation.raised","id":"e1","caseId":"c1","at":"2026-12-01T10:00:00.000Z"}\n\n');
    await waitFor(() => expect(screen.getByTestId('inbox').textContent).toBe('live:2'));
    expect(seen.map((e) => `${e.type} ${e.id}`)).toEqual(['escalation.raised e1']);

    // A message this build does not know refreshes nothing.
    pushEvent!('data: {"type":"case.deleted","id":"c1"}\n\n');
    pushEvent!('data: {"type":"escalation.acknowledged","id":"e1","caseId":"c1","at":"2026-12-01T10:05:00.000Z"}\n\n');
    await waitFor(() => expect(screen.getByTestId('inbox').textContent).toBe('live:3'));
    expect(seen.map((e) => e.type)).toEqual(['escalation.raised', 'escalation.acknowledged']);
  });

  it('stays off for an administrator, who has no case access', async () => {
    me = { ...auth.user, role: 'admin' };
    await store.save({ ...auth, user: me });
    renderInbox();
    await waitFor(() => expect(screen.getByTestId('inbox').textContent).toBe('off:1'));
    expect(streamRequests).toEqual([]);
  });
});
