import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import { seedDemoData } from '../src/database/seeder';
import { DEMO_USERS } from '../src/database/seed-data';
import { DEMO_PASSWORD, expectErrorShape, startTestApp, type TestApp } from './support/test-app';

describe('The app around the routes (e2e, MariaDB)', () => {
  let t: TestApp;
  let pwaDist: string;

  beforeAll(async () => {
    pwaDist = mkdtempSync(join(tmpdir(), 'siteband-pwa-'));
    mkdirSync(join(pwaDist, 'assets'));
    writeFileSync(join(pwaDist, 'index.html'), '<!doctype html><html><body><div id="root">Siteband PWA</div></body></html>');
    writeFileSync(join(pwaDist, 'sw.js'), 'self.addEventListener("fetch", () => {});');
    writeFileSync(join(pwaDist, 'assets', 'index-Bx3k9q_Z.js'), 'console.log("app");');
    // The compressed copies the PWA build writes beside its text files.
    writeFileSync(join(pwaDist, 'assets', 'index-Bx3k9q_Z.js.br'), brotliCompressSync('console.log("app");'));
    writeFileSync(join(pwaDist, 'assets', 'index-Bx3k9q_Z.js.gz'), gzipSync('console.log("app");'));
    writeFileSync(join(pwaDist, '.env'), 'SECRET=1');
    t = await startTestApp({ pwaDist, env: { PORT: '3456' } });
  });
  afterAll(async () => {
    await t?.close();
    rmSync(pwaDist, { recursive: true, force: true });
  });

  describe('GET /api/health', () => {
    it('is public and reports the database up', async () => {
      const response = await t.http().get('/api/health').expect(200);
      expect(response.body).toEqual({ status: 'ok', database: 'up', version: '0.1.0' });
      expect(response.headers['cache-control']).toBe('no-store');
    });
  });

  describe('errors', () => {
    it.each([
      ['GET', '/api/no-such-route'],
      ['POST', '/api/auth/nothing'],
      ['DELETE', '/api/users'],
      ['GET', '/api'],
    ])('%s %s → 404 in the error shape', async (method, path) => {
      const response = await t.http()[method.toLowerCase() as 'get' | 'post' | 'delete'](path).expect(404);
      expect(response.headers['content-type']).toMatch(/application\/json/);
      expectErrorShape(response.body, 404, path);
      expect(response.body.error).toBe('Not Found');
    });

    it('echoes a well-formed X-Request-Id and puts it in the error body', async () => {
      const response = await t.http().get('/api/no-such-route').set('X-Request-Id', 'field-tablet-42.req-7').expect(404);
      expect(response.headers['x-request-id']).toBe('field-tablet-42.req-7');
      expect(response.body.requestId).toBe('field-tablet-42.req-7');
    });

    it('replaces an ill-formed X-Request-Id with its own', async () => {
      const response = await t.http().get('/api/health').set('X-Request-Id', 'bad id "with" quotes').expect(200);
      expect(response.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    });

    it('answers malformed JSON anywhere under /api with a 400 that names the problem', async () => {
      const response = await t
        .http()
        .post('/api/users')
        .set('Content-Type', 'application/json')
        .send('{not json')
        .expect(400);
      expectErrorShape(response.body, 400, '/api/users');
      expect(response.body.message).toMatch(/^Malformed JSON in request body: .+/);
    });
  });

  describe('OpenAPI', () => {
    it('serves the document at /api/docs-json', async () => {
      const response = await t.http().get('/api/docs-json').expect(200);
      expect(response.body.openapi).toMatch(/^3\./);
      expect(Object.keys(response.body.paths)).toEqual(
        expect.arrayContaining(['/api/auth/login', '/api/auth/refresh', '/api/auth/logout', '/api/me', '/api/users', '/api/users/{id}', '/api/health']),
      );
      expect(response.body.components.securitySchemes.bearer).toMatchObject({ type: 'http', scheme: 'bearer' });
      expect(response.body.components.schemas.ErrorResponseDto).toBeDefined();
    });

    it('serves Swagger UI at /api/docs', async () => {
      const response = await t.http().get('/api/docs').expect(200);
      expect(response.headers['content-type']).toMatch(/text\/html/);
    });
  });

  describe('the PWA from PWA_DIST', () => {
    it('serves index.html for a deep link, uncached', async () => {
      const response = await t.http().get('/cases/42/samples').set('Accept', 'text/html').expect(200);
      expect(response.text).toContain('Siteband PWA');
      expect(response.headers['content-type']).toMatch(/text\/html/);
      expect(response.headers['cache-control']).toBe('no-cache');
    });

    it('serves / and a path that only starts like the API (/apiary) from the app', async () => {
      expect((await t.http().get('/').expect(200)).text).toContain('Siteband PWA');
      expect((await t.http().get('/apiary').expect(200)).text).toContain('Siteband PWA');
    });

    it('caches hashed assets for a year and revalidates the service worker', async () => {
      const asset = await t.http().get('/assets/index-Bx3k9q_Z.js').expect(200);
      expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(asset.headers['content-type']).toMatch(/javascript/);
      const worker = await t.http().get('/sw.js').expect(200);
      expect(worker.headers['cache-control']).toBe('no-cache');
    });

    it('sends the compressed copy a browser accepts, with the type of the file itself', async () => {
      const brotli = await t.http().get('/assets/index-Bx3k9q_Z.js').set('Accept-Encoding', 'gzip, deflate, br').expect(200);
      expect(brotli.headers['content-encoding']).toBe('br');
      expect(brotli.headers['content-type']).toMatch(/javascript/);
      expect(brotli.headers.vary).toMatch(/Accept-Encoding/);
      expect(brotli.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      const gzip = await t.http().get('/assets/index-Bx3k9q_Z.js').set('Accept-Encoding', 'gzip').expect(200);
      expect(gzip.headers['content-encoding']).toBe('gzip');
      expect(gzip.text).toBe('console.log("app");');
      const plain = await t.http().get('/assets/index-Bx3k9q_Z.js').set('Accept-Encoding', 'identity').expect(200);
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(plain.text).toBe('console.log("app");');
      // index.html has no compressed copy here: sent as it is.
      const page = await t.http().get('/').set('Accept-Encoding', 'br').expect(200);
      expect(page.headers['content-encoding']).toBeUndefined();
    });

    it('answers a missing asset with 404, not with index.html', async () => {
      const response = await t.http().get('/assets/missing-Abc12345.js').expect(404);
      expectErrorShape(response.body, 404, '/assets/missing-Abc12345.js');
    });

    it('never serves dotfiles or anything outside the folder', async () => {
      await t.http().get('/.env').expect(404);
      await t.http().get('/..%2f..%2fetc%2fpasswd').expect(404);
    });

    it('sends the CSP that admits the app and no CDN', async () => {
      const response = await t.http().get('/').expect(200);
      const csp = response.headers['content-security-policy'];
      expect(csp).toContain("default-src 'self'");
      expect(csp).toContain("script-src 'self'");
      expect(csp).toContain("style-src 'self' 'unsafe-inline'");
      expect(csp).toContain("img-src 'self' data: blob:");
      expect(csp).toContain("worker-src 'self'");
      expect(csp).not.toMatch(/https?:\/\//);
      expect(response.headers['x-content-type-options']).toBe('nosniff');
    });
  });

  describe('CORS', () => {
    it("allows the app's own origins", async () => {
      const response = await t
        .http()
        .options('/api/auth/login')
        .set('Origin', 'http://localhost:3456')
        .set('Access-Control-Request-Method', 'POST')
        .expect(204);
      expect(response.headers['access-control-allow-origin']).toBe('http://localhost:3456');
    });

    it('does not allow other origins', async () => {
      const response = await t.http().get('/api/health').set('Origin', 'https://evil.example');
      expect(response.headers['access-control-allow-origin']).toBeUndefined();
    });
  });

  describe('database', () => {
    it('has exactly the schema of the entities after the committed migrations', async () => {
      const pending = await t.dataSource.driver.createSchemaBuilder().log();
      expect(pending.upQueries.map((query) => query.query)).toEqual([]);
    });

    it('seeds idempotently: a second run adds nothing', async () => {
      const report = await seedDemoData(t.dataSource, DEMO_PASSWORD);
      expect(report).toEqual({ created: [], updated: [], unchanged: DEMO_USERS.map((user) => user.email) });
      const [count] = await t.dataSource.query("SELECT COUNT(*) AS n FROM users WHERE email LIKE '%@demo.test'");
      expect(Number(count.n)).toBeGreaterThanOrEqual(DEMO_USERS.length);
      const emails: { email: string }[] = await t.dataSource.query('SELECT email FROM users');
      expect(new Set(emails.map((row) => row.email)).size).toBe(emails.length);
    });
  });
});
