import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import pinoHttp, { type Options } from 'pino-http';
import type { LogLevel } from '../config/app-config';

/** An incoming X-Request-Id is reused only if it looks like an id (no spaces, quotes or control characters). */
const REQUEST_ID_PATTERN = /^[A-Za-z0-9._:-]{1,128}$/;

/** The request id: the caller's `X-Request-Id` when well-formed, else a new UUID; echoed in the response. */
export function requestId(request: IncomingMessage, response: ServerResponse): string {
  const incoming = request.headers['x-request-id'];
  const id = typeof incoming === 'string' && REQUEST_ID_PATTERN.test(incoming) ? incoming : randomUUID();
  response.setHeader('X-Request-Id', id);
  return id;
}

/**
 * One JSON line per request, with its id, method, path (no query string), status and duration. No
 * headers and no bodies are logged, so tokens, passwords and cookies never reach the logs.
 */
export function createRequestLogger(level: LogLevel, destination?: NodeJS.WritableStream) {
  const options: Options = {
    level,
    base: { service: 'siteband-api' },
    timestamp: () => `,"time":"${new Date().toISOString()}"`,
    genReqId: requestId,
    serializers: {
      req: (req: { id?: string; method?: string; url?: string; remoteAddress?: string }) => ({
        id: req.id,
        method: req.method,
        path: (req.url ?? '').split('?')[0],
        remoteAddress: req.remoteAddress,
      }),
      res: (res: { statusCode?: number }) => ({ statusCode: res.statusCode }),
    },
    // Belt and braces, should a later change add headers to the serializers.
    redact: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
    customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
  };
  return destination ? pinoHttp(options, destination) : pinoHttp(options);
}
