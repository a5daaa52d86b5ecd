/** What went wrong, in terms the screens can act on. */
export type ApiErrorKind = 'network' | 'http' | 'invalid-response';

/** JSON error body the API sends (NestJS shape plus our request id). */
interface ApiErrorBody {
  statusCode?: number;
  error?: string;
  message?: string | string[];
  /** Per-field reasons, e.g. every reason a library entry was refused. */
  details?: { field?: string; messages?: unknown[] }[];
  requestId?: string;
}

/** A failed API call: no connection, an error status with the API's message, or an unreadable answer. */
export class ApiError extends Error {
  readonly kind: ApiErrorKind;
  /** HTTP status; 0 when no answer arrived. */
  readonly status: number;
  /** The API's short error name, e.g. "Unauthorized". */
  readonly error?: string;
  /** Every message line the API gave (validation errors come as several). */
  readonly details: readonly string[];
  /** The API's request id, to quote when reporting a problem. */
  readonly requestId?: string;

  constructor(kind: ApiErrorKind, status: number, message: string, extra: { error?: string; details?: string[]; requestId?: string } = {}) {
    super(message);
    this.name = 'ApiError';
    this.kind = kind;
    this.status = status;
    this.error = extra.error;
    this.details = extra.details ?? [message];
    this.requestId = extra.requestId;
  }

  /** The request never reached the server (offline, DNS, refused). */
  static network(path: string, cause: unknown): ApiError {
    const reason = cause instanceof Error ? cause.message : String(cause);
    return new ApiError('network', 0, `No connection to the server for ${path}: ${reason}`);
  }

  /** Builds the error from an error response, reading the API's JSON body when there is one. */
  static async fromResponse(response: Response): Promise<ApiError> {
    const body = await readJson(response);
    if (!body || typeof body !== 'object') {
      return new ApiError('http', response.status, `The server answered ${response.status} ${response.statusText}`.trim());
    }
    const { error, message, requestId, details: fields } = body as ApiErrorBody;
    // Per-field reasons are the precise list; the message then only joins them.
    const reasons = Array.isArray(fields) ? fields.flatMap((f) => (Array.isArray(f?.messages) ? f.messages.map(String) : [])) : [];
    const lines = Array.isArray(message) ? message.map(String) : message ? [String(message)] : [];
    const details = reasons.length > 0 ? reasons : lines;
    const text = lines.join('; ') || error || `The server answered ${response.status}`;
    return new ApiError('http', response.status, text, { error, details: details.length ? details : [text], requestId });
  }
}

/** Parses a JSON body, or gives undefined when the body is empty or not JSON. */
async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** True for an ApiError with the given HTTP status. */
export function isApiStatus(error: unknown, status: number): error is ApiError {
  return error instanceof ApiError && error.status === status;
}
