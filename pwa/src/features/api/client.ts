import type { AuthResponse } from '../session/types';
import { ApiError } from './apiError';

/** The pair of tokens of a session. */
export interface SessionTokens {
  accessToken: string;
  refreshToken: string;
}

/** Where the client reads and keeps the session's tokens (the session store in the app). */
export interface TokenSource {
  current(): SessionTokens | undefined;
  save(auth: AuthResponse): Promise<unknown>;
  clear(): Promise<void>;
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /**
   * Sent as JSON. A function is called with the current tokens on every attempt, so a body that
   * names the refresh token (sign-out) carries the rotated one when the request is repeated.
   */
  body?: object | ((tokens: SessionTokens | undefined) => object);
  /** Adds the bearer token and refreshes it on a 401 (default true). */
  auth?: boolean;
  signal?: AbortSignal;
}

/** The one door to the API: feature modules call this, nothing else calls fetch. */
export interface ApiClient {
  request<T>(path: string, options?: RequestOptions): Promise<T>;
  /**
   * A fetch with the bearer token and the same one refresh on 401, answering the raw response:
   * for streams the JSON reader cannot take (the live events). The caller reads the status.
   */
  authorizedFetch(input: RequestInfo | URL, init?: RequestInit): Promise<Response>;
}

export interface ApiClientOptions {
  tokens: TokenSource;
  fetchFn?: typeof fetch;
}

const REFRESH_PATH = '/api/auth/refresh';

/** Builds the API client: bearer token, one refresh on 401, typed errors. */
export function createApiClient({ tokens, fetchFn = (...args) => fetch(...args) }: ApiClientOptions): ApiClient {
  // Refresh tokens rotate, so concurrent 401s must share one refresh instead of racing and revoking each other.
  let refreshing: Promise<string | undefined> | undefined;

  async function send(path: string, options: RequestOptions, accessToken: string | undefined): Promise<Response> {
    const body = typeof options.body === 'function' ? options.body(tokens.current()) : options.body;
    const headers: Record<string, string> = { Accept: 'application/json' };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
    try {
      return await fetchFn(path, {
        method: options.method ?? 'GET',
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: options.signal,
      });
    } catch (cause) {
      if (options.signal?.aborted) throw cause;
      throw ApiError.network(path, cause);
    }
  }

  async function refresh(): Promise<string | undefined> {
    const refreshToken = tokens.current()?.refreshToken;
    if (!refreshToken) return undefined;
    const response = await send(REFRESH_PATH, { method: 'POST', body: { refreshToken } }, undefined);
    if (response.ok) {
      const auth = (await response.json()) as AuthResponse;
      await tokens.save(auth);
      return auth.accessToken;
    }
    // A refused refresh token ends the session; a server fault keeps it for a later attempt.
    if (response.status === 400 || response.status === 401) {
      await tokens.clear();
      return undefined;
    }
    throw await ApiError.fromResponse(response);
  }

  function refreshOnce(): Promise<string | undefined> {
    refreshing ??= refresh().finally(() => {
      refreshing = undefined;
    });
    return refreshing;
  }

  async function read<T>(response: Response): Promise<T> {
    if (!response.ok) throw await ApiError.fromResponse(response);
    if (response.status === 204) return undefined as T;
    const text = await response.text();
    if (!text) return undefined as T;
    try {
      return JSON.parse(text) as T;
    } catch {
      throw new ApiError('invalid-response', response.status, 'The server sent an answer that is not JSON');
    }
  }

  /** Sends with the current access token; on a 401 once more with a refreshed one. */
  async function withToken(auth: boolean, attempt: (accessToken: string | undefined) => Promise<Response>): Promise<Response> {
    const usedToken = auth ? tokens.current()?.accessToken : undefined;
    const first = await attempt(usedToken);
    if (first.status !== 401 || !usedToken) return first;

    // Another request may already have refreshed while this one was in flight: reuse its token.
    const latest = tokens.current()?.accessToken;
    const nextToken = latest && latest !== usedToken ? latest : await refreshOnce();
    if (!nextToken) return first;
    return attempt(nextToken);
  }

  return {
    async request<T>(path: string, options: RequestOptions = {}): Promise<T> {
      return read<T>(await withToken(options.auth ?? true, (token) => send(path, options, token)));
    },
    authorizedFetch(input, init = {}) {
      return withToken(true, (token) => {
        const headers = new Headers(init.headers);
        if (token) headers.set('Authorization', `Bearer ${token}`);
        return fetchFn(input, { ...init, headers });
      });
    },
  };
}
