// A throwaway server side for the sync fault suite and the sync bench: a database of its own on the
// private MariaDB, the S3 fake and the built API as a child process that can be killed and restarted.
import { spawn, spawnSync } from 'node:child_process';
import { createWriteStream, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { once } from 'node:events';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import mysql from 'mysql2/promise';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const dataDir = process.env.SITEBAND_DATA_DIR ?? join(root, '.data');
export const DEMO_INSPECTOR = { email: 'inspector@demo.test', password: process.env.SITEBAND_DEMO_PASSWORD ?? 'siteband-demo-2026' };

function run(command, args, env = {}) {
  const result = spawnSync(command, args, { cwd: root, env: { ...process.env, ...env }, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed (${result.status}): ${result.stderr || result.stdout}`);
  return result.stdout;
}

const sql = (statement) => run('bash', ['scripts/db.sh', 'sql', statement]);

async function waitFor(check, what, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    if (await check()) return;
    if (Date.now() > until) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Clock ticks per second of /proc/<pid>/stat's times (`getconf CLK_TCK`, 100 on Linux; from memory). */
const CLOCK_TICKS = 100;

/** User + system CPU seconds of a process (fields 14 and 15 of /proc/<pid>/stat, see proc(5); from memory). */
function processCpuSeconds(pid) {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  // The command name (field 2) is in parentheses and may hold spaces: count fields after its end.
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return (Number(fields[11]) + Number(fields[12])) / CLOCK_TICKS;
}

/** One API process (api/dist/main.js) on `port`, that can be signalled mid-request, stopped and started again. */
function apiProcess(port, env, name) {
  const baseUrl = `http://127.0.0.1:${port}`;
  const log = createWriteStream(join(dataDir, `${name}-api-${port}.log`), { flags: 'a' });
  let child;
  let starts = 0;

  async function healthy() {
    try {
      return (await fetch(`${baseUrl}/api/health`)).ok;
    } catch {
      return false;
    }
  }

  return {
    baseUrl,
    starts: () => starts,
    running: () => child !== undefined && child.exitCode === null && child.signalCode === null,
    /** CPU seconds (user + system) the running process has used so far, from Linux's /proc/<pid>/stat. */
    cpuSeconds: () => processCpuSeconds(child.pid),
    /** Starts the process and waits until it answers its health route. */
    async start() {
      starts += 1;
      child = spawn('node', ['api/dist/main.js'], { cwd: root, env: { ...process.env, ...env, PORT: String(port) }, stdio: ['ignore', 'pipe', 'pipe'] });
      child.stdout.pipe(log, { end: false });
      child.stderr.pipe(log, { end: false });
      const started = child;
      // Generous: on a busy machine a Nest boot has taken over a minute.
      await waitFor(async () => started.exitCode !== null || (await healthy()), `the API on port ${port}`, 240_000);
      if (started.exitCode !== null) throw new Error(`the API on port ${port} exited with ${started.exitCode}; see ${log.path}`);
    },
    /** Sends the signal without waiting: for a kill in the middle of a request. */
    signal: (signal) => child.kill(signal),
    /** Stops the process with `signal` and waits until it is gone. */
    async stop(signal = 'SIGTERM') {
      const stopping = child;
      if (!stopping || stopping.exitCode !== null || stopping.signalCode !== null) return;
      const exited = once(stopping, 'exit');
      stopping.kill(signal);
      await exited;
    },
    /** Waits until the process has exited (after a signal). */
    async exited() {
      if (child.exitCode === null && child.signalCode === null) await once(child, 'exit');
    },
  };
}

/**
 * Starts everything on ports `PORT + offset` (API; `count` API processes on that port and the next
 * ones, all on the same database and bucket) and `S3_PORT + offset` (S3 fake). `name` tags the
 * database (`siteband_<name>_<pid>`) and the logs in .data/.
 */
export async function startStack({ name, offset, count = 1 }) {
  const apiPort = Number(process.env.PORT ?? 3000) + offset;
  const s3Port = Number(process.env.S3_PORT ?? 4569) + offset;
  const dbName = `siteband_${name}_${process.pid}`;
  const bucket = `siteband-${name}`;
  mkdirSync(dataDir, { recursive: true });

  const startedDb = spawnSync('bash', ['scripts/db.sh', 'status'], { cwd: root }).status !== 0;
  if (startedDb) run('bash', ['scripts/db.sh', 'start']);
  sql(`DROP DATABASE IF EXISTS \`${dbName}\``);
  sql(`CREATE DATABASE \`${dbName}\` CHARACTER SET utf8mb4`);
  const env = { DB_NAME: dbName, S3_PORT: String(s3Port), S3_BUCKET: bucket, LOG_LEVEL: 'warn' };
  // The seed writes its demo cases through the upload service too, so the S3 fake comes first.
  const s3 = spawn('node', ['scripts/fakes/s3.mjs', '--port', String(s3Port), '--bucket', bucket], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
  let s3Ready = false;
  s3.stdout.on('data', (chunk) => void (s3Ready ||= String(chunk).includes('ready')));
  await waitFor(() => s3Ready || s3.exitCode !== null, 'the S3 fake');
  if (!s3Ready) throw new Error(`the S3 fake did not start on port ${s3Port}`);

  run('node', ['api/dist/database/run-migrations.js'], env);
  run('node', ['api/dist/database/seed.js'], env);

  const connection = await mysql.createConnection({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3307),
    user: process.env.DB_USER ?? 'siteband',
    password: process.env.DB_PASSWORD ?? 'siteband-local',
    database: dbName,
    rowsAsArray: true,
  });

  const apis = [];
  for (let k = 0; k < count; k += 1) apis.push(apiProcess(apiPort + k, env, name));
  await Promise.all(apis.map((api) => api.start()));

  return {
    baseUrl: apis[0].baseUrl,
    apis,
    dbName,
    /** Rows of a query on this stack's database (`?` placeholders for `values`), each an array of its columns. */
    query: async (statement, values = []) => (await connection.query(statement, values))[0],
    async close() {
      await connection.end();
      await Promise.all(apis.map((api) => api.stop('SIGTERM')));
      s3.kill('SIGTERM');
      if (s3.exitCode === null) await once(s3, 'exit');
      sql(`DROP DATABASE IF EXISTS \`${dbName}\``);
      rmSync(join(dataDir, `s3-${s3Port}`), { recursive: true, force: true });
      if (startedDb) run('bash', ['scripts/db.sh', 'stop']);
    },
  };
}

/**
 * Adds an inspector of its own through the admin's users route, so the tablet under test sees only
 * what it records (the demo inspector owns the seeded demo cases). Returns the sign-in.
 */
export async function newInspector(baseUrl, name) {
  const admin = await signIn(baseUrl, { email: 'admin@demo.test', password: DEMO_INSPECTOR.password });
  const user = { email: `${name}-${process.pid}@example.test`, password: `${name}-password-${process.pid}` };
  const response = await fetch(`${baseUrl}/api/users`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${admin.tokens.current().accessToken}` },
    body: JSON.stringify({ ...user, displayName: `Invented inspector (${name})`, role: 'inspector' }),
  });
  if (!response.ok) throw new Error(`adding the inspector failed: ${response.status} ${await response.text()}`);
  return user;
}

/** Signs a user in; returns the user's id and a token source the API client can refresh through. */
export async function signIn(baseUrl, user = DEMO_INSPECTOR) {
  const response = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(user) });
  if (!response.ok) throw new Error(`sign-in failed: ${response.status} ${await response.text()}`);
  let auth = await response.json();
  return {
    userId: auth.user.id,
    tokens: {
      current: () => ({ accessToken: auth.accessToken, refreshToken: auth.refreshToken }),
      save: async (next) => void (auth = next),
      clear: async () => undefined,
    },
  };
}
