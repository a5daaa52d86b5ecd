import { isAbsolute, join, resolve } from 'node:path';
import { parseDurationSeconds } from './duration';
import { jwtSecretWeakness, readOrCreateDevJwtSecret } from './jwt-secret';
import { REPO_ROOT } from './paths';
import { readMailConfig, type EscalationTimerConfig, type InviteConfig, type MailConfig } from './mail-config';
import { readS3Config, type S3Config } from './s3-config';

/** Where the API's database lives. */
export interface DatabaseConfig {
  host: string;
  port: number;
  name: string;
  user: string;
  password: string;
}

/** Signing and lifetimes of the tokens handed out at sign-in. */
export interface JwtConfig {
  secret: string;
  /** Where the secret came from: the environment, or the development file under the data folder. */
  secretSource: 'env' | 'file';
  accessTtlSeconds: number;
  refreshTtlSeconds: number;
  issuer: string;
}

/** The API's whole configuration, read once from the environment and validated at start. */
export interface AppConfig {
  env: NodeEnv;
  port: number;
  database: DatabaseConfig;
  jwt: JwtConfig;
  corsOrigins: string[];
  demoPassword: string;
  pwaDist: string;
  dataDir: string;
  logLevel: LogLevel;
  /** Sign-in throttling: more than `maxFailures` failed attempts per IP and email within the window → 429. */
  signIn: { maxFailures: number; windowSeconds: number };
  /** Object storage for attachments (photos, raw scan files). */
  s3: S3Config;
  /** Outgoing mail through the outbox. */
  mail: MailConfig;
  /** Re-notifying unacknowledged escalations and the second contact. */
  escalationTimers: EscalationTimerConfig;
  /** Invitations by e-mail. */
  invite: InviteConfig;
}

export const NODE_ENVS = ['development', 'test', 'production'] as const;
export type NodeEnv = (typeof NODE_ENVS)[number];
export const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'] as const;
export type LogLevel = (typeof LOG_LEVELS)[number];

/** Thrown when the environment cannot make a valid configuration; lists every problem at once. */
export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n- ${problems.join('\n- ')}`);
    this.name = 'ConfigError';
  }
}

type Env = Record<string, string | undefined>;

/** The demo accounts' password unless SITEBAND_DEMO_PASSWORD says otherwise (published: never for production). */
export const DEFAULT_DEMO_PASSWORD = 'siteband-demo-2026';

/** Collects problems while reading variables, so one start-up reports all of them. */
export class EnvReader {
  readonly problems: string[] = [];
  constructor(private readonly env: Env) {}

  string(name: string, fallback: string): string {
    const value = this.env[name];
    return value === undefined || value === '' ? fallback : value;
  }

  optional(name: string): string | undefined {
    const value = this.env[name];
    return value === undefined || value === '' ? undefined : value;
  }

  integer(name: string, fallback: number, min: number, max: number): number {
    const raw = this.optional(name);
    if (raw === undefined) return fallback;
    const value = Number(raw);
    if (!/^\d+$/.test(raw.trim()) || value < min || value > max) {
      this.problems.push(`${name} must be a whole number from ${min} to ${max}, got "${raw}"`);
      return fallback;
    }
    return value;
  }

  duration(name: string, fallback: string): number {
    try {
      return parseDurationSeconds(this.string(name, fallback));
    } catch (error) {
      this.problems.push(`${name}: ${(error as Error).message}`);
      return parseDurationSeconds(fallback);
    }
  }

  oneOf<T extends string>(name: string, allowed: readonly T[], fallback: T): T {
    const raw = this.string(name, fallback);
    if ((allowed as readonly string[]).includes(raw)) return raw as T;
    this.problems.push(`${name} must be one of ${allowed.join(', ')}, got "${raw}"`);
    return fallback;
  }
}

function readDatabase(reader: EnvReader): DatabaseConfig {
  return {
    host: reader.string('DB_HOST', '127.0.0.1'),
    port: reader.integer('DB_PORT', 3307, 1, 65535),
    name: reader.string('DB_NAME', 'siteband'),
    user: reader.string('DB_USER', 'siteband'),
    password: reader.string('DB_PASSWORD', 'siteband-local'),
  };
}

/** Only the database settings (for migrations and the seed, which need no JWT secret). */
export function loadDatabaseConfig(env: Env = process.env): DatabaseConfig {
  const reader = new EnvReader(env);
  const database = readDatabase(reader);
  if (reader.problems.length) throw new ConfigError(reader.problems);
  return database;
}

function resolveFromRepo(path: string): string {
  return isAbsolute(path) ? path : resolve(REPO_ROOT, path);
}

/**
 * Reads and validates the whole configuration. In production a missing or weak `JWT_SECRET` refuses
 * to start; elsewhere an unset one is read from (or created in) `<SITEBAND_DATA_DIR>/jwt-secret`.
 */
export function loadConfig(env: Env = process.env): AppConfig {
  const reader = new EnvReader(env);
  const nodeEnv = reader.oneOf('NODE_ENV', NODE_ENVS, 'development');
  const port = reader.integer('PORT', 3000, 1, 65535);
  const database = readDatabase(reader);
  const dataDir = resolveFromRepo(reader.string('SITEBAND_DATA_DIR', join(REPO_ROOT, '.data')));

  const accessTtlSeconds = reader.duration('JWT_ACCESS_TTL', '15m');
  const refreshTtlSeconds = reader.duration('JWT_REFRESH_TTL', '30d');
  if (accessTtlSeconds >= refreshTtlSeconds) {
    reader.problems.push('JWT_ACCESS_TTL must be shorter than JWT_REFRESH_TTL');
  }

  let secret = reader.optional('JWT_SECRET');
  let secretSource: JwtConfig['secretSource'] = 'env';
  if (nodeEnv === 'production') {
    if (secret === undefined) {
      reader.problems.push('JWT_SECRET is required in production (at least 32 random characters, e.g. `openssl rand -base64 48`)');
    } else {
      const weakness = jwtSecretWeakness(secret);
      if (weakness) reader.problems.push(`JWT_SECRET is too weak for production: ${weakness}`);
    }
  } else if (secret === undefined) {
    secret = readOrCreateDevJwtSecret(dataDir);
    secretSource = 'file';
  } else if (secret.length < 16) {
    reader.problems.push('JWT_SECRET must have at least 16 characters even outside production');
  }

  const corsOrigins = (reader.optional('CORS_ORIGIN') ?? `http://127.0.0.1:${port},http://localhost:${port}`)
    .split(',')
    .map((origin) => origin.trim().replace(/\/+$/, ''))
    .filter(Boolean);
  for (const origin of corsOrigins) {
    if (!/^https?:\/\/[^/\s]+$/.test(origin)) reader.problems.push(`CORS_ORIGIN entry "${origin}" is not an origin like http://host:port`);
  }

  const demoPassword = reader.string('SITEBAND_DEMO_PASSWORD', DEFAULT_DEMO_PASSWORD);
  const logLevel = reader.oneOf('LOG_LEVEL', LOG_LEVELS, nodeEnv === 'test' ? 'warn' : 'info');
  const pwaDist = resolveFromRepo(reader.string('PWA_DIST', join(REPO_ROOT, 'pwa', 'dist')));
  const s3 = readS3Config(reader, nodeEnv);
  const { mail, escalationTimers, invite } = readMailConfig(reader, nodeEnv, port);

  if (reader.problems.length) throw new ConfigError(reader.problems);
  return {
    env: nodeEnv,
    port,
    database,
    jwt: { secret: secret as string, secretSource, accessTtlSeconds, refreshTtlSeconds, issuer: 'siteband' },
    corsOrigins,
    demoPassword,
    pwaDist,
    dataDir,
    logLevel,
    signIn: { maxFailures: 5, windowSeconds: 60 },
    s3,
    mail,
    escalationTimers,
    invite,
  };
}
