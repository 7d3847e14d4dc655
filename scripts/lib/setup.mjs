// The set-up both `npm start` and `npm test` do on any machine with Node.js 20 and npm: dependencies,
// a private PostgreSQL, a local signing secret, builds, migrations and the demo data.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export function log(message) {
  console.log(`\x1b[36m[pondwright]\x1b[0m ${message}`);
}

/** Runs a command in the repo, streaming its output; throws when it fails. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: repoRoot, stdio: 'inherit', ...options });
  if (result.status !== 0) {
    throw new Error(
      `${command} ${args.join(' ')} failed with exit code ${result.status ?? result.signal}`,
    );
  }
}

/** Like run, but reports success instead of throwing. */
export function tryRun(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: repoRoot, stdio: 'inherit', ...options });
  return result.status === 0;
}

/** Installs dependencies on a fresh clone, or when the lock file changed since the last install. */
export function ensureDependencies() {
  const marker = join(repoRoot, 'node_modules/.package-lock.json');
  const lock = join(repoRoot, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  log('installing dependencies (npm ci)...');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}

/** The database settings shared by every process; each can be overridden from the environment. */
export function databaseEnv() {
  return {
    DB_HOST: '127.0.0.1',
    DB_PORT: process.env.DB_PORT ?? '54329',
    DB_USER: process.env.DB_USER ?? 'pondwright',
    DB_PASSWORD: process.env.DB_PASSWORD ?? 'pondwright',
    DB_NAME: process.env.DB_NAME ?? 'pondwright',
    DB_TEST_NAME: process.env.DB_TEST_NAME ?? 'pondwright_test',
  };
}

export function startDatabase() {
  run('bash', ['scripts/db.sh', 'start'], { env: { ...process.env, ...databaseEnv() } });
}

export function databaseIsRunning() {
  const result = spawnSync('bash', ['scripts/db.sh', 'status'], {
    cwd: repoRoot,
    env: { ...process.env, ...databaseEnv() },
    stdio: 'ignore',
  });
  return result.status === 0;
}

/**
 * A random 256-bit signing key for this checkout, made once and kept in the git-ignored .data folder, so
 * sessions survive a restart. Production supplies JWT_SECRET itself.
 */
export function localJwtSecret() {
  if (process.env.JWT_SECRET) return process.env.JWT_SECRET;
  const file = join(repoRoot, '.data/jwt-secret');
  if (!existsSync(file)) {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

export function buildShared() {
  run('npm', ['run', 'build', '-w', 'shared']);
}

export function buildServer() {
  run('npm', ['run', 'build', '-w', 'server']);
}

export function buildClient() {
  run('npm', ['run', 'build', '-w', 'client']);
}

/** Applies migrations and adds the demo company when missing, in the given database. */
export function migrateAndSeed(databaseName) {
  const env = { ...process.env, ...databaseEnv(), DB_NAME: databaseName };
  run('npm', ['run', 'migrate', '-w', 'server'], { env });
  run('npm', ['run', 'seed', '-w', 'server'], { env });
}

/** Starts the built server as a child process; resolves once /api/health answers. */
export async function startServer({
  port,
  host = '127.0.0.1',
  databaseName,
  extraEnv = {},
  quiet = false,
}) {
  const env = {
    ...process.env,
    ...databaseEnv(),
    DB_NAME: databaseName,
    JWT_SECRET: localJwtSecret(),
    HOST: host,
    PORT: String(port),
    ...extraEnv,
  };
  const child = spawn(process.execPath, ['server/dist/main.js'], {
    cwd: repoRoot,
    env,
    stdio: quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  });
  const url = `http://${host}:${port}`;
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) return { child, url };
    } catch {
      // not listening yet
    }
    await new Promise((resolveWait) => setTimeout(resolveWait, 250));
  }
  child.kill('SIGTERM');
  throw new Error(`the server did not answer on ${url} within 60 s`);
}

/** Stops a child process and waits for it to exit. */
export function stopProcess(child, signal = 'SIGTERM') {
  if (!child || child.exitCode !== null) return Promise.resolve();
  return new Promise((resolveStop) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.once('exit', () => {
      clearTimeout(timer);
      resolveStop();
    });
    child.kill(signal);
  });
}

/** Debian's Chromium for the browser tests; installed with apt-get when missing and running as root. */
export function ensureChromium() {
  const candidates = ['/usr/bin/chromium', '/usr/lib/chromium/chromium'];
  if (candidates.some((path) => existsSync(path))) return true;
  if (process.getuid?.() !== 0) {
    log('Chromium is missing. Install it with: sudo apt-get install -y chromium');
    return false;
  }
  log("installing Debian's chromium for the browser tests (apt-get)...");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  return (
    tryRun('apt-get', ['update', '-qq'], { env }) &&
    tryRun('apt-get', ['install', '-y', '-qq', 'chromium'], { env }) &&
    candidates.some((path) => existsSync(path))
  );
}
