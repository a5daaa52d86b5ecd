import type { ByteSender } from './uploadAttachments';

/**
 * Sends attachment bytes with the session's bearer token. The JSON API client has no raw-body request,
 * so this is the one other place that calls fetch; a 401 is handed back to the uploader, which
 * asks the status route through the API client (and so refreshes the token) before going on.
 */
export function createByteSender(accessToken: () => string | undefined, fetchFn: typeof fetch = (...args) => fetch(...args)): ByteSender {
  return {
    put(path, bytes, headers) {
      const token = accessToken();
      return fetchFn(path, { method: 'PUT', body: bytes, headers: { ...headers, ...(token ? { Authorization: `Bearer ${token}` } : {}) } });
    },
  };
}
