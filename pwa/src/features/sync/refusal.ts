import { ApiError } from '../api/apiError';

/**
 * HTTP statuses that refuse what was sent as such, so sending it again unchanged gets the same answer:
 * malformed (400), too large (413), wrong type (415), not acceptable (422). Everything else — no
 * connection, 401 (the client refreshes), 403, 404, 408, 409, 429, 5xx — is treated as passing:
 * kept, and retried with backoff.
 */
const REFUSING_STATUSES: ReadonlySet<number> = new Set([400, 413, 415, 422]);

/** The reason to show when the server refused a request for good; undefined for a failure worth retrying. */
export function refusalReason(error: unknown): string | undefined {
  if (error instanceof ApiError && error.kind === 'http' && REFUSING_STATUSES.has(error.status)) return error.details.join('; ') || error.message;
  return undefined;
}
