import { describe, expect, it } from 'vitest';
import type { AuthResponse } from '../session/types';
import { ApiError } from './apiError';
import { logout } from '../session/authApi';
import { createApiClient, type TokenSource } from './client';

/** Tokens kept in memory, standing in for the session store. */
function memoryTokens(initial?: { accessToken: string; refreshToken: string }) {
  let tokens = initial;
  const source: TokenSource & { cleared: number } = {
    cleared: 0,
    current: () => tokens,
    async save(auth: AuthResponse) {
      tokens = { accessToken: auth.accessToken, refreshToken: auth.refreshToken };
    },
    async clear() {
      tokens = undefined;
      source.cleared += 1;
    },
  };
  return source;
}

const user = { id: 'u-1', email: 'field@example.test', displayName: 'Field Person', role: 'inspector' as const };

function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/**
 * A small in-memory API with rotating refresh tokens, enough to exercise the client's rules:
 * /api/me answers for the currently valid access token only, refresh hands out a new pair once.
 */
function fakeApi(options: { refreshStatus?: number } = {}) {
  let generation = 1;
  let validAccess = 'access-1';
  let validRefresh = 'refresh-1';
  const calls: { path: string; authorization: string | null; body: unknown }[] = [];
  const revoked: string[] = [];
  const fetchFn = async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const path = String(input);
    const authorization = new Headers(init.headers).get('Authorization');
    const body = init.body ? JSON.parse(String(init.body)) : undefined;
    calls.push({ path, authorization, body });
    await Promise.resolve();
    if (path === '/api/auth/refresh') {
      if (options.refreshStatus) return json(options.refreshStatus, { statusCode: options.refreshStatus, error: 'Refused', message: 'refresh refused', requestId: 'req-r' });
      if (body?.refreshToken !== validRefresh) return json(401, { statusCode: 401, error: 'Unauthorized', message: 'Refresh token is not valid', requestId: 'req-x' });
      generation += 1;
      validAccess = `access-${generation}`;
      validRefresh = `refresh-${generation}`;
      return json(200, { accessToken: validAccess, refreshToken: validRefresh, accessTokenExpiresIn: 900, user });
    }
    if (path === '/api/me') {
      if (authorization !== `Bearer ${validAccess}`) return json(401, { statusCode: 401, error: 'Unauthorized', message: 'Access token expired', requestId: 'req-1' });
      return json(200, user);
    }
    if (path === '/api/auth/login') return json(401, { statusCode: 401, error: 'Unauthorized', message: 'Email or password is wrong', requestId: 'req-2' });
    if (path === '/api/auth/logout') {
      if (authorization !== `Bearer ${validAccess}` || body?.refreshToken !== validRefresh) {
        return json(401, { statusCode: 401, error: 'Unauthorized', message: 'Not signed in', requestId: 'req-3' });
      }
      revoked.push(body.refreshToken);
      return new Response(null, { status: 204 });
    }
    return json(404, { statusCode: 404, error: 'Not Found', message: `Cannot GET ${path}`, requestId: 'req-404' });
  };
  return {
    fetchFn,
    calls,
    revoked,
    expireAccessToken() {
      validAccess = 'rotated-away';
    },
    revokeEverything() {
      validAccess = 'rotated-away';
      validRefresh = 'revoked';
    },
  };
}

describe('API client', () => {
  it('sends the bearer token and returns the parsed body', async () => {
    const api = fakeApi();
    const client = createApiClient({ tokens: memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' }), fetchFn: api.fetchFn });
    await expect(client.request('/api/me')).resolves.toEqual(user);
    expect(api.calls).toEqual([{ path: '/api/me', authorization: 'Bearer access-1', body: undefined }]);
  });

  it('on a 401 refreshes once, keeps the rotated tokens and repeats the request', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    await expect(client.request('/api/me')).resolves.toEqual(user);
    expect(api.calls.map((c) => c.path)).toEqual(['/api/me', '/api/auth/refresh', '/api/me']);
    expect(api.calls[1]).toMatchObject({ authorization: null, body: { refreshToken: 'refresh-1' } });
    expect(api.calls[2].authorization).toBe('Bearer access-2');
    expect(tokens.current()).toEqual({ accessToken: 'access-2', refreshToken: 'refresh-2' });
  });

  it('hands back the raw response of an authorized fetch, refreshing once on a 401', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    const response = await client.authorizedFetch('/api/me', { headers: { Accept: 'text/event-stream' } });
    expect(response.status).toBe(200);
    await expect(response.json()).resolves.toEqual(user);
    expect(api.calls.map((c) => [c.path, c.authorization])).toEqual([
      ['/api/me', 'Bearer access-1'],
      ['/api/auth/refresh', null],
      ['/api/me', 'Bearer access-2'],
    ]);
  });

  it('answers the 401 of an authorized fetch as it is when the session has ended', async () => {
    const api = fakeApi({ refreshStatus: 401 });
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    const response = await client.authorizedFetch('/api/me');
    expect(response.status).toBe(401);
    expect(tokens.cleared).toBe(1);
  });

  it('shares one refresh between requests that fail together, since refresh tokens rotate', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    const results = await Promise.all([client.request('/api/me'), client.request('/api/me'), client.request('/api/me')]);
    expect(results).toEqual([user, user, user]);
    expect(api.calls.filter((c) => c.path === '/api/auth/refresh')).toHaveLength(1);
    expect(tokens.cleared).toBe(0);
  });

  it('ends the session when the refresh token is refused, and reports the original 401', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.revokeEverything();
    const error = await client.request('/api/me').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ kind: 'http', status: 401, error: 'Unauthorized', message: 'Access token expired', requestId: 'req-1' });
    expect(tokens.current()).toBeUndefined();
    expect(tokens.cleared).toBe(1);
    expect(api.calls.map((c) => c.path)).toEqual(['/api/me', '/api/auth/refresh']);
  });

  it('does not refresh a second time when the repeated request is refused too', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    // Every refresh succeeds, yet the server keeps refusing the access token.
    const refusingFetch: typeof fetch = async (input, init) => {
      const response = await api.fetchFn(input, init);
      if (String(input) === '/api/me') return json(401, { statusCode: 401, error: 'Unauthorized', message: 'Token not accepted', requestId: 'req-9' });
      return response;
    };
    const client = createApiClient({ tokens, fetchFn: refusingFetch });
    await expect(client.request('/api/me')).rejects.toMatchObject({ status: 401, message: 'Token not accepted' });
    expect(api.calls.map((c) => c.path)).toEqual(['/api/me', '/api/auth/refresh', '/api/me']);
  });

  it('keeps the session when the refresh fails for a server fault', async () => {
    const api = fakeApi({ refreshStatus: 503 });
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    await expect(client.request('/api/me')).rejects.toMatchObject({ status: 503, message: 'refresh refused' });
    expect(tokens.current()).toEqual({ accessToken: 'access-1', refreshToken: 'refresh-1' });
  });

  it('sends unauthenticated calls without a token and never refreshes them', async () => {
    const api = fakeApi();
    const client = createApiClient({ tokens: memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' }), fetchFn: api.fetchFn });
    const error = await client
      .request('/api/auth/login', { method: 'POST', body: { email: 'a@example.test', password: 'wrong-password' }, auth: false })
      .catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 401, message: 'Email or password is wrong', requestId: 'req-2' });
    expect(api.calls).toEqual([
      { path: '/api/auth/login', authorization: null, body: { email: 'a@example.test', password: 'wrong-password' } },
    ]);
  });

  it('gives undefined for 204 No Content', async () => {
    const api = fakeApi();
    const client = createApiClient({ tokens: memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' }), fetchFn: api.fetchFn });
    await expect(logout(client)).resolves.toBeUndefined();
    expect(api.revoked).toEqual(['refresh-1']);
  });

  it('signs out with the rotated refresh token when the access token had to be refreshed first', async () => {
    const api = fakeApi();
    const tokens = memoryTokens({ accessToken: 'access-1', refreshToken: 'refresh-1' });
    const client = createApiClient({ tokens, fetchFn: api.fetchFn });
    api.expireAccessToken();
    await logout(client);
    expect(api.calls.map((c) => [c.path, c.body])).toEqual([
      ['/api/auth/logout', { refreshToken: 'refresh-1' }],
      ['/api/auth/refresh', { refreshToken: 'refresh-1' }],
      ['/api/auth/logout', { refreshToken: 'refresh-2' }],
    ]);
    expect(api.revoked).toEqual(['refresh-2']);
  });
});

describe('API errors', () => {
  const client = (response: () => Response | Promise<Response>) =>
    createApiClient({ tokens: memoryTokens(), fetchFn: async () => response() });

  it('joins validation messages and keeps each one', async () => {
    const error = await client(() =>
      json(400, { statusCode: 400, error: 'Bad Request', message: ['email must be an email', 'password is too short'], requestId: 'req-v' }),
    )
      .request('/api/users', { method: 'POST', body: {} })
      .catch((e: unknown) => e);
    expect(error).toMatchObject({
      status: 400,
      error: 'Bad Request',
      message: 'email must be an email; password is too short',
      details: ['email must be an email', 'password is too short'],
      requestId: 'req-v',
    });
  });

  it('describes an error response that is not JSON by its status', async () => {
    const error = await client(() => new Response('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' }))
      .request('/api/health')
      .catch((e: unknown) => e);
    expect(error).toMatchObject({ kind: 'http', status: 502, message: 'The server answered 502 Bad Gateway' });
  });

  it('flags a success answer that is not JSON', async () => {
    const error = await client(() => new Response('<html>portal login</html>', { status: 200 }))
      .request('/api/health')
      .catch((e: unknown) => e);
    expect(error).toMatchObject({ kind: 'invalid-response', status: 200 });
  });

  it('turns a failed fetch into a network error with status 0', async () => {
    const error = await createApiClient({
      tokens: memoryTokens(),
      fetchFn: async () => {
        throw new TypeError('Failed to fetch');
      },
    })
      .request('/api/health')
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ kind: 'network', status: 0 });
    expect((error as ApiError).message).toContain('Failed to fetch');
  });
});
