import { BadRequestException, ForbiddenException, type ArgumentsHost } from '@nestjs/common';
import { ApiExceptionFilter } from './api-exception.filter';

function run(exception: unknown) {
  const response = {
    headersSent: false,
    statusCode: 0,
    headers: {} as Record<string, string>,
    body: undefined as unknown,
    status(code: number) {
      this.statusCode = code;
      return this;
    },
    setHeader(name: string, value: string) {
      this.headers[name] = value;
      return this;
    },
    json(body: unknown) {
      this.body = body;
    },
    end() {},
  };
  const request = { id: 'req-1', originalUrl: '/api/things?token=secret', log: { error: jest.fn() } };
  const host = { switchToHttp: () => ({ getRequest: () => request, getResponse: () => response }) } as unknown as ArgumentsHost;
  new ApiExceptionFilter().catch(exception, host);
  return { response, request, body: response.body as Record<string, unknown> };
}

describe('ApiExceptionFilter', () => {
  it('answers an HttpException in the one error shape, without the query string', () => {
    const { response, body } = run(new ForbiddenException('Not for you'));
    expect(response.statusCode).toBe(403);
    expect(body).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Not for you',
      requestId: 'req-1',
      path: '/api/things',
      timestamp: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
    });
  });

  it('keeps validation details', () => {
    const details = [{ field: 'email', messages: ['email must be an email address'] }];
    const { body } = run(new BadRequestException({ message: 'Validation failed: email must be an email address', details }));
    expect(body).toMatchObject({ statusCode: 400, message: 'Validation failed: email must be an email address', details });
  });

  it('names malformed JSON as such', () => {
    const cause = Object.assign(new SyntaxError('Unexpected end of JSON input'), { type: 'entity.parse.failed', status: 400 });
    const { body } = run(new BadRequestException(cause.message, { cause }));
    expect(body.message).toBe('Malformed JSON in request body: Unexpected end of JSON input');
  });

  it('turns anything else into a bare 500, logging it but never sending the message or stack', () => {
    const { response, body, request } = run(new Error('connect ECONNREFUSED 10.1.2.3:3306 at /srv/app/db.js:12'));
    expect(response.statusCode).toBe(500);
    expect(body).toMatchObject({ statusCode: 500, error: 'Internal Server Error', message: 'Internal server error' });
    expect(JSON.stringify(body)).not.toMatch(/ECONNREFUSED|db\.js|at /);
    expect(request.log.error).toHaveBeenCalledTimes(1);
  });
});
