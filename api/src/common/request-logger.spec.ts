import { createServer } from 'node:http';
import { Writable } from 'node:stream';
import request from 'supertest';
import { createRequestLogger } from './request-logger';

/** A server whose only middleware is the request logger, writing its lines into `lines`. */
function loggedServer(lines: string[]) {
  const sink = new Writable({
    write(chunk, _encoding, done) {
      lines.push(...chunk.toString().split('\n').filter(Boolean));
      done();
    },
  });
  const logger = createRequestLogger('info', sink);
  return createServer((req, res) => {
    logger(req, res);
    res.statusCode = req.url?.startsWith('/missing') ? 404 : 200;
    res.end('ok');
  });
}

describe('createRequestLogger', () => {
  it('writes one JSON line per request with id, method, path and status — no headers, query or body', async () => {
    const lines: string[] = [];
    await request(loggedServer(lines))
      .post('/api/auth/login?token=query-secret')
      .set('Authorization', 'Bearer header-secret')
      .set('Cookie', 'session=cookie-secret')
      .set('X-Request-Id', 'abc-123')
      .send({ email: 'inspector@demo.test', password: 'body-secret' })
      .expect('X-Request-Id', 'abc-123');
    await new Promise((resolve) => setImmediate(resolve));

    expect(lines).toHaveLength(1);
    const entry = JSON.parse(lines[0]);
    expect(entry).toMatchObject({
      level: 30,
      service: 'siteband-api',
      req: { id: 'abc-123', method: 'POST', path: '/api/auth/login' },
      res: { statusCode: 200 },
      msg: 'request completed',
    });
    expect(entry.time).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(lines[0]).not.toMatch(/secret|inspector@demo\.test|authorization|cookie/i);
  });

  it('logs client errors as warnings and makes up an id when none is given', async () => {
    const lines: string[] = [];
    const response = await request(loggedServer(lines)).get('/missing');
    await new Promise((resolve) => setImmediate(resolve));
    const entry = JSON.parse(lines[0]);
    expect(entry.level).toBe(40);
    expect(entry.req.id).toBe(response.headers['x-request-id']);
    expect(entry.req.id).toMatch(/^[0-9a-f-]{36}$/);
  });
});
