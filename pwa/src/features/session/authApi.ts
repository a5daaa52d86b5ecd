import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../api/client';
import type { AuthResponse, Credentials, SessionUser } from './types';

/** Query keys of the session feature. */
export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

/** Signs in with email and password. */
export function login(client: ApiClient, credentials: Credentials): Promise<AuthResponse> {
  return client.request<AuthResponse>('/api/auth/login', { method: 'POST', body: credentials, auth: false });
}

/** Sets a password from an invitation's single-use token (public: the person is not signed in yet). */
export function setPassword(client: ApiClient, token: string, password: string): Promise<unknown> {
  return client.request<unknown>('/api/auth/set-password', { method: 'POST', body: { token, password }, auth: false });
}

/** Revokes the session's refresh token on the server (the call itself needs the access token). */
export function logout(client: ApiClient): Promise<void> {
  return client.request<void>('/api/auth/logout', {
    method: 'POST',
    // Read at send time: if the access token is refreshed first, the rotated refresh token is the one to revoke.
    body: (tokens) => ({ refreshToken: tokens?.refreshToken }),
  });
}

/** Asks the server who the token belongs to; succeeding confirms the session. */
export function meQuery(client: ApiClient) {
  return queryOptions({
    queryKey: sessionKeys.me(),
    queryFn: ({ signal }) => client.request<SessionUser>('/api/me', { signal }),
    // Re-confirm now and then so a tablet left online does not run out its offline period.
    refetchInterval: 15 * 60_000,
    staleTime: 60_000,
  });
}
