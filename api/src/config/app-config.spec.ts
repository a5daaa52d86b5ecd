import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ConfigError, loadConfig, loadDatabaseConfig } from './app-config';
import { parseDurationSeconds } from './duration';
import { jwtSecretWeakness } from './jwt-secret';
import { REPO_ROOT } from './paths';

const STRONG = 'kQ7v2x9LpZ4mR8tW1yB6nC3dF5gH0jS-aE_uI';

describe('loadConfig', () => {
  let dataDir: string;
  beforeEach(() => {
    dataDir = mkdtempSync(join(tmpdir(), 'siteband-config-'));
  });
  afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

  const env = (extra: Record<string, string> = {}) => ({ NODE_ENV: 'development', SITEBAND_DATA_DIR: dataDir, ...extra });

  it('has the documented defaults', () => {
    const config = loadConfig(env({ JWT_SECRET: STRONG }));
    expect(config.port).toBe(3000);
    expect(config.database).toEqual({ host: '127.0.0.1', port: 3307, name: 'siteband', user: 'siteband', password: 'siteband-local' });
    expect(config.jwt.accessTtlSeconds).toBe(15 * 60);
    expect(config.jwt.refreshTtlSeconds).toBe(30 * 24 * 3600);
    expect(config.corsOrigins).toEqual(['http://127.0.0.1:3000', 'http://localhost:3000']);
    expect(config.demoPassword).toBe('siteband-demo-2026');
    expect(config.pwaDist).toBe(join(REPO_ROOT, 'pwa', 'dist'));
    expect(config.signIn).toEqual({ maxFailures: 5, windowSeconds: 60 });
  });

  it('reads every variable it documents', () => {
    const config = loadConfig(
      env({
        PORT: '4100',
        DB_HOST: 'db.local',
        DB_PORT: '3310',
        DB_NAME: 'siteband_x',
        DB_USER: 'u',
        DB_PASSWORD: 'p',
        JWT_SECRET: STRONG,
        JWT_ACCESS_TTL: '5 min',
        JWT_REFRESH_TTL: '7d',
        CORS_ORIGIN: 'https://siteband.example, http://10.0.0.5:4100/',
        SITEBAND_DEMO_PASSWORD: 'another-demo-pass',
        PWA_DIST: '/srv/pwa',
        LOG_LEVEL: 'debug',
      }),
    );
    expect(config.port).toBe(4100);
    expect(config.database).toEqual({ host: 'db.local', port: 3310, name: 'siteband_x', user: 'u', password: 'p' });
    expect(config.jwt).toMatchObject({ secret: STRONG, secretSource: 'env', accessTtlSeconds: 300, refreshTtlSeconds: 604800 });
    expect(config.corsOrigins).toEqual(['https://siteband.example', 'http://10.0.0.5:4100']);
    expect(config.demoPassword).toBe('another-demo-pass');
    expect(config.pwaDist).toBe('/srv/pwa');
    expect(config.logLevel).toBe('debug');
  });

  describe('in production', () => {
    it('refuses to start without JWT_SECRET', () => {
      expect(() => loadConfig(env({ NODE_ENV: 'production' }))).toThrow(/JWT_SECRET is required in production/);
    });

    it.each([
      ['short', 'tooshort'],
      ['an example value', 'change-me-change-me-change-me-change-me'],
      ['repetitive', 'abababababababababababababababababab'],
    ])('refuses a weak JWT_SECRET (%s)', (_label, secret) => {
      expect(() => loadConfig(env({ NODE_ENV: 'production', JWT_SECRET: secret }))).toThrow(/JWT_SECRET is too weak for production/);
    });

    it('starts with a strong secret and never writes a secret file', () => {
      const production = {
        NODE_ENV: 'production',
        JWT_SECRET: STRONG,
        S3_ACCESS_KEY_ID: 'AKIAEXAMPLEONLY',
        S3_SECRET_ACCESS_KEY: 'not-the-fake-secret',
        APP_PUBLIC_URL: 'https://siteband.example',
      };
      expect(loadConfig(env(production)).jwt.secret).toBe(STRONG);
      expect(() => statSync(join(dataDir, 'jwt-secret'))).toThrow();
    });
  });

  describe('in development without JWT_SECRET', () => {
    it('creates a random secret file (mode 0600) once and reuses it', () => {
      const first = loadConfig(env());
      const file = join(dataDir, 'jwt-secret');
      expect(first.jwt.secretSource).toBe('file');
      expect(jwtSecretWeakness(first.jwt.secret)).toBeNull();
      expect(readFileSync(file, 'utf8').trim()).toBe(first.jwt.secret);
      expect(statSync(file).mode & 0o777).toBe(0o600);
      expect(loadConfig(env()).jwt.secret).toBe(first.jwt.secret);
    });

    it('uses an existing secret file', () => {
      writeFileSync(join(dataDir, 'jwt-secret'), `${STRONG}\n`);
      expect(loadConfig(env()).jwt.secret).toBe(STRONG);
    });
  });

  it('reports every problem at once', () => {
    try {
      loadConfig(env({ PORT: 'eighty', DB_PORT: '70000', JWT_ACCESS_TTL: 'soon', CORS_ORIGIN: 'not an origin', NODE_ENV: 'staging' }));
      throw new Error('expected a ConfigError');
    } catch (error) {
      expect(error).toBeInstanceOf(ConfigError);
      const problems = (error as ConfigError).problems.join('\n');
      expect(problems).toMatch(/NODE_ENV must be one of/);
      expect(problems).toMatch(/PORT must be a whole number/);
      expect(problems).toMatch(/DB_PORT must be a whole number from 1 to 65535/);
      expect(problems).toMatch(/JWT_ACCESS_TTL/);
      expect(problems).toMatch(/CORS_ORIGIN entry "not an origin"/);
    }
  });

  it('refuses an access TTL that is not shorter than the refresh TTL', () => {
    expect(() => loadConfig(env({ JWT_SECRET: STRONG, JWT_ACCESS_TTL: '2d', JWT_REFRESH_TTL: '1d' }))).toThrow(
      /JWT_ACCESS_TTL must be shorter than JWT_REFRESH_TTL/,
    );
  });

  it('loads the database settings alone without needing a JWT secret', () => {
    expect(loadDatabaseConfig({ NODE_ENV: 'production', DB_NAME: 'siteband_only' }).name).toBe('siteband_only');
  });
});

describe('parseDurationSeconds', () => {
  it.each([
    ['900', 900],
    ['45s', 45],
    ['15m', 900],
    ['15 min', 900],
    ['12h', 43200],
    ['30d', 2592000],
    ['30 days', 2592000],
  ])('reads %s as %i seconds', (text, seconds) => {
    expect(parseDurationSeconds(text)).toBe(seconds);
  });

  it.each(['', 'soon', '-5m', '0', '15 fortnights', '1.5h'])('refuses %p', (text) => {
    expect(() => parseDurationSeconds(text)).toThrow(RangeError);
  });
});
