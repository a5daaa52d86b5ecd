import { STATUS_CODES } from 'node:http';
import { ArgumentsHost, Catch, HttpException, HttpStatus, Logger, type ExceptionFilter } from '@nestjs/common';
import type { Request, Response } from 'express';
import type { ErrorResponseDto, FieldErrorDto } from './error-response.dto';

/**
 * Answers every error, from any route or middleware, with `ErrorResponseDto`. Server faults become a
 * plain 500 (logged with their stack, never sent); stack traces never leave the API.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request & { id?: string; log?: { error: (obj: object, msg: string) => void } }>();
    const response = http.getResponse<Response>();
    const body = this.toBody(exception, request);

    if (body.statusCode >= 500) {
      const error = exception instanceof Error ? exception : new Error(String(exception));
      if (request.log) request.log.error({ err: error, requestId: body.requestId }, 'request failed');
      else this.logger.error(error.message, error.stack);
    }
    if (response.headersSent) {
      response.end();
      return;
    }
    response.status(body.statusCode).setHeader('Cache-Control', 'no-store');
    response.json(body);
  }

  private toBody(exception: unknown, request: Request & { id?: string }): ErrorResponseDto {
    let statusCode: number = HttpStatus.INTERNAL_SERVER_ERROR;
    let message = 'Internal server error';
    let details: FieldErrorDto[] | undefined;

    if (exception instanceof HttpException) {
      statusCode = exception.getStatus();
      const payload = exception.getResponse();
      if (typeof payload === 'string') {
        message = payload;
      } else if (payload && typeof payload === 'object') {
        const { message: raw, details: extra } = payload as { message?: unknown; details?: unknown };
        if (Array.isArray(raw)) message = raw.map(String).join('; ');
        else if (typeof raw === 'string') message = raw;
        else message = exception.message;
        if (Array.isArray(extra)) details = extra as FieldErrorDto[];
      }
      if (isMalformedJson(exception.cause)) message = `Malformed JSON in request body: ${exception.cause.message}`;
    }

    const path = (request.originalUrl ?? request.url ?? '').split('?')[0];
    return {
      statusCode,
      error: STATUS_CODES[statusCode] ?? 'Error',
      message,
      ...(details ? { details } : {}),
      requestId: request.id ?? '',
      path,
      timestamp: new Date().toISOString(),
    };
  }
}

/** body-parser's error for a body that is not JSON. */
function isMalformedJson(cause: unknown): cause is SyntaxError {
  return cause instanceof SyntaxError && (cause as SyntaxError & { type?: string }).type === 'entity.parse.failed';
}
