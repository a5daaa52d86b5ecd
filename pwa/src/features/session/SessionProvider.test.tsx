import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, cleanup, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openDb, type SitebandDb } from '../../db/db';
import { sessionRowStorage } from '../../db/sessionTable';
import { ApiClientProvider } from '../api/ApiClientContext';
import { createApiClient } from '../api/client';
import { SessionProvider, useSession, type SessionContextValue } from './SessionProvider';
import { createSessionStore, type SessionStore } from './sessionStore';
import type { AuthResponse } from './types';

const HOUR = 3_600_000;
const auth: AuthResponse = {
  accessToken: 'access-1',
  refreshToken: 'refresh-1',
  accessTokenExpiresIn: 900,
  user: { id: 'u-3', email: 'hazmat.tech@example.test', displayName: 'Hazmat Tech', role: 'inspector' },
};

let online = true;
let db: SitebandDb;
let store: SessionStore;
let calls: string[];
let answers: Record<string, () => Response>;
let latest: SessionContextValue | undefined;

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

function Probe() {
  latest = useSession();
  return <p data-testid="probe">{`${latest.status}:${latest.session?.user.displayName ?? '-'}`}</p>;
}

function renderProvider() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const client = createApiClient({
    tokens: store,
    fetchFn: async (input) => {
      const path = String(input);
      calls.push(path);
      const answer = answers[path];
      if (!answer) throw new TypeError('Failed to fetch');
      return answer();
    },
  });
  render(
    <QueryClientProvider client={queryClient}>
      <ApiClientProvider client={client}>
        <SessionProvider store={store} offlineSessionHours={72}>
          <Probe />
        </SessionProvider>
      </ApiClientProvider>
    </QueryClientProvider>,
  );
}

const probeText = () => screen.getByTestId('probe').textContent;

beforeEach(async () => {
  online = true;
  Object.defineProperty(window.navigator, 'onLine', { configurable: true, get: () => online });
  db = await openDb(`siteband-provider-${Math.random().toString(36).slice(2)}`);
  store = createSessionStore(sessionRowStorage(db));
  calls = [];
  answers = {};
  latest = undefined;
});

afterEach(async () => {
  cleanup();
  await db.delete();
});

describe('SessionProvider', () => {
  it('offline, runs from the stored session and never calls the API', async () => {
    await store.save(auth, Date.now() - 2 * HOUR);
    online = false;
    renderProvider();
    expect(probeText()).toBe('offline:Hazmat Tech');
    await act(() => new Promise((resolve) => setTimeout(resolve, 50)));
    expect(calls).toEqual([]);
  });

  it('online, asks the server and moves the confirmation time forward', async () => {
    const before = Date.now() - 2 * HOUR;
    await store.save(auth, before);
    answers['/api/me'] = () => json(200, { ...auth.user, displayName: 'Hazmat Tech (renamed)' });
    renderProvider();
    await waitFor(() => expect(probeText()).toBe('online:Hazmat Tech (renamed)'));
    expect(calls).toEqual(['/api/me']);
    expect(store.current()!.confirmedAt).toBeGreaterThan(before);
  });

  it('past the offline period, reports expired without calling the API', async () => {
    await store.save(auth, Date.now() - 73 * HOUR);
    renderProvider();
    expect(probeText()).toBe('expired:Hazmat Tech');
    await act(() => new Promise((resolve) => setTimeout(resolve, 50)));
    expect(calls).toEqual([]);
  });

  it('signs out when the server refuses both the access and the refresh token', async () => {
    await store.save(auth);
    answers['/api/me'] = () => json(401, { statusCode: 401, error: 'Unauthorized', message: 'Token revoked', requestId: 'r1' });
    answers['/api/auth/refresh'] = () => json(401, { statusCode: 401, error: 'Unauthorized', message: 'Revoked', requestId: 'r2' });
    renderProvider();
    await waitFor(() => expect(probeText()).toBe('signed-out:-'));
    expect(calls).toEqual(['/api/me', '/api/auth/refresh']);
    expect(await db.session.count()).toBe(0);
  });

  it('signs out offline by forgetting the session here, without waiting for the server', async () => {
    await store.save(auth);
    online = false;
    renderProvider();
    await act(() => latest!.signOut());
    expect(probeText()).toBe('signed-out:-');
    expect(calls).toEqual([]);
    expect(await db.session.count()).toBe(0);
  });

  it('stores nothing when the sign-in is refused', async () => {
    answers['/api/auth/login'] = () => json(401, { statusCode: 401, error: 'Unauthorized', message: 'Email or password is wrong', requestId: 'r3' });
    renderProvider();
    await expect(latest!.signIn({ email: 'hazmat.tech@example.test', password: 'not-the-password' })).rejects.toMatchObject({ status: 401 });
    expect(probeText()).toBe('signed-out:-');
    expect(await db.session.count()).toBe(0);
  });
});
