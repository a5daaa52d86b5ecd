import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { Test } from '@nestjs/testing';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/app.setup';
import { loadConfig, loadDatabaseConfig, type AppConfig, type DatabaseConfig } from '../../src/config/app-config';
import { APP_CONFIG } from '../../src/config/config.module';
import { buildDataSourceOptions } from '../../src/database/data-source-options';
import { seedDemoData } from '../../src/database/seeder';

export const DEMO_PASSWORD = 'e2e-demo-password-2026';

export const DEMO = {
  inspector: 'inspector@demo.test',
  supervisor: 'supervisor@demo.test',
  safety_officer: 'safety@demo.test',
  admin: 'admin@demo.test',
} as const;

/** A running app on its own throwaway database `siteband_test_<random>`, migrated and seeded. */
export interface TestApp {
  app: NestExpressApplication;
  config: AppConfig;
  database: DatabaseConfig;
  /** A DataSource of its own on the test database, for looking behind the API. */
  dataSource: DataSource;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

/** A connection to the server without a database, to create and drop the throwaway one. */
async function serverConnection(database: DatabaseConfig): Promise<DataSource> {
  const server = new DataSource({
    type: 'mariadb',
    host: database.host,
    port: database.port,
    username: database.user,
    password: database.password,
  });
  return server.initialize();
}

/**
 * Creates the database, runs the committed migrations (not synchronize), seeds the demo users and boots
 * the full AppModule with `configureApp`, exactly as `main.ts` does.
 */
export async function startTestApp(
  options: { pwaDist?: string; env?: Record<string, string>; sameDatabaseAs?: TestApp } = {},
): Promise<TestApp> {
  if (options.sameDatabaseAs) return startAnotherInstance(options.sameDatabaseAs, options.env);
  const base = loadDatabaseConfig(process.env);
  const database: DatabaseConfig = { ...base, name: `siteband_test_${randomBytes(6).toString('hex')}` };
  const server = await serverConnection(database);
  await server.query(`CREATE DATABASE \`${database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);

  const dataDir = mkdtempSync(join(tmpdir(), 'siteband-e2e-'));
  let dataSource: DataSource | undefined;
  let app: NestExpressApplication | undefined;
  const cleanUp = async () => {
    await app?.close();
    if (dataSource?.isInitialized) await dataSource.destroy();
    await server.query(`DROP DATABASE IF EXISTS \`${database.name}\``);
    await server.destroy();
    rmSync(dataDir, { recursive: true, force: true });
  };

  try {
    dataSource = await new DataSource(buildDataSourceOptions(database)).initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    await seedDemoData(dataSource, DEMO_PASSWORD);

    const config = loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      DB_HOST: database.host,
      DB_PORT: String(database.port),
      DB_NAME: database.name,
      DB_USER: database.user,
      DB_PASSWORD: database.password,
      JWT_SECRET: randomBytes(32).toString('base64url'),
      SITEBAND_DATA_DIR: dataDir,
      SITEBAND_DEMO_PASSWORD: DEMO_PASSWORD,
      PWA_DIST: options.pwaDist ?? join(dataDir, 'no-pwa-here'),
      LOG_LEVEL: 'silent',
      PORT: '3000',
      CORS_ORIGIN: '',
      ...options.env,
    });
    app = await bootApp(config);
    const server$ = app.getHttpServer();
    return { app, config, database, dataSource, http: () => request(server$), close: cleanUp };
  } catch (error) {
    await cleanUp();
    throw error;
  }
}

async function bootApp(config: AppConfig): Promise<NestExpressApplication> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(APP_CONFIG)
    .useValue(config)
    .compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({ logger: false });
  configureApp(app);
  await app.init();
  return app;
}

/**
 * A second API instance on the first one's database (same JWT secret, so tokens work on both), as
 * behind a load balancer. Closing it stops only this instance; the first one drops the database.
 */
async function startAnotherInstance(first: TestApp, env: Record<string, string> = {}): Promise<TestApp> {
  const config: AppConfig = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    DB_HOST: first.database.host,
    DB_PORT: String(first.database.port),
    DB_NAME: first.database.name,
    DB_USER: first.database.user,
    DB_PASSWORD: first.database.password,
    JWT_SECRET: first.config.jwt.secret,
    SITEBAND_DATA_DIR: first.config.dataDir,
    SITEBAND_DEMO_PASSWORD: DEMO_PASSWORD,
    PWA_DIST: first.config.pwaDist,
    LOG_LEVEL: 'silent',
    PORT: '3000',
    CORS_ORIGIN: '',
    ...env,
  });
  const app = await bootApp(config);
  const server$ = app.getHttpServer();
  return { app, config, database: first.database, dataSource: first.dataSource, http: () => request(server$), close: () => app.close() };
}

/** Signs in and returns the tokens (fails the test on anything but 200). */
export async function signIn(
  testApp: TestApp,
  email: string,
  password: string = DEMO_PASSWORD,
): Promise<{ accessToken: string; refreshToken: string; user: { id: string; role: string } }> {
  const response = await testApp.http().post('/api/auth/login').send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in as ${email} gave ${response.status}: ${JSON.stringify(response.body)}`);
  return response.body;
}

/** Adds a user through the admin route (password `<role>-password-2026`) and signs them in. */
export async function addUser(testApp: TestApp, adminToken: string, email: string, role: string) {
  const password = `${role}-password-2026`;
  await testApp
    .http()
    .post('/api/users')
    .set('Authorization', `Bearer ${adminToken}`)
    .send({ email, displayName: `${role} ${email.split('@')[0]}`, role, password })
    .expect(201);
  return signIn(testApp, email, password);
}

/** Checks the one error shape (`path` may be a string or an asymmetric matcher). */
export function expectErrorShape(body: Record<string, unknown>, statusCode: number, path: unknown): void {
  expect(body).toEqual(
    expect.objectContaining({
      statusCode,
      error: expect.any(String),
      message: expect.any(String),
      requestId: expect.any(String),
      path,
      timestamp: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/),
    }),
  );
  expect((body.requestId as string).length).toBeGreaterThan(0);
  expect(JSON.stringify(body)).not.toMatch(/\bat .+\.(js|ts):\d+/);
}
