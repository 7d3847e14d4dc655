// The set-up both `npm start` and `npm test` do on any machine with Node.js 20 and npm: dependencies,
// a private PostgreSQL, a local signing secret, builds, migrations and the demo data.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { connect } from 'node:net';
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

/**
 * The ports of the local fakes (fake SMTP, its mailbox API, fake payments): the given defaults, each
 * overridable from the environment so two checkouts can run side by side.
 */
export function fakePorts({ smtpPort, mailboxPort, paymentsPort, s3Port }) {
  return {
    smtpPort: Number(process.env.FAKE_SMTP_PORT ?? smtpPort),
    mailboxPort: Number(process.env.FAKE_MAILBOX_HTTP_PORT ?? mailboxPort),
    paymentsPort: Number(process.env.FAKE_PAYMENTS_PORT ?? paymentsPort),
    s3Port: Number(process.env.FAKE_S3_PORT ?? s3Port),
  };
}

/** Where the fake provider posts its webhooks: the app on this machine. */
export function appWebhookUrl(appPort, appHost = '127.0.0.1') {
  const listensEverywhere = appHost === '0.0.0.0' || appHost === '::';
  const host = listensEverywhere ? '127.0.0.1' : appHost.includes(':') ? `[${appHost}]` : appHost;
  return `http://${host}:${appPort}/api/payments/webhook`;
}

/**
 * Starts the fake SMTP server, the fake payment provider and the fake S3 store
 * (server/dist/dev-fakes/main.js, so the server must be built) and resolves once all answer. `serverEnv` points the app server at them.
 */
export async function startFakes({
  smtpPort,
  mailboxPort,
  paymentsPort,
  s3Port,
  // Photos stored by the fake survive restarts of `npm start`, one folder per port.
  s3Directory = join(repoRoot, '.data', `s3-${s3Port}`),
  webhookUrl,
  quiet = false,
}) {
  const child = spawn(process.execPath, ['server/dist/dev-fakes/main.js'], {
    cwd: repoRoot,
    env: {
      ...process.env,
      FAKE_SMTP_PORT: String(smtpPort),
      FAKE_MAILBOX_HTTP_PORT: String(mailboxPort),
      FAKE_PAYMENTS_PORT: String(paymentsPort),
      FAKE_PAYMENTS_WEBHOOK_URL: webhookUrl,
      FAKE_S3_PORT: String(s3Port),
      FAKE_S3_DIR: s3Directory,
    },
    // The IPC channel is only a lifeline: the fakes exit when it closes, even if this script is killed.
    stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
  });
  child.channel?.unref();
  // Announced once both listen; waiting for it (not just an open port) avoids mistaking another
  // checkout's fakes on the same ports for ours.
  const announced = new Promise((resolveAnnounced, rejectAnnounced) => {
    let output = '';
    child.stdout.on('data', (chunk) => {
      if (!quiet) process.stdout.write(chunk);
      if (output === null) return;
      output += chunk;
      if (output.includes('[fake-s3]')) {
        output = null;
        resolveAnnounced();
      }
    });
    child.once('exit', (code) =>
      rejectAnnounced(new Error(`the local fakes exited (code ${code})`)),
    );
  });
  const stop = () => stopProcess(child);
  try {
    await withTimeout(announced, 15_000, 'the local fakes did not start within 15 s');
    await Promise.all(
      [smtpPort, mailboxPort, paymentsPort, s3Port].map((port) => waitForPort(port)),
    );
  } catch (error) {
    await stop();
    throw error;
  }
  const mailboxUrl = `http://127.0.0.1:${mailboxPort}`;
  const paymentsUrl = `http://127.0.0.1:${paymentsPort}`;
  return {
    child,
    stop,
    mailboxUrl,
    paymentsUrl,
    serverEnv: {
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      MAILBOX_URL: mailboxUrl,
      STRIPE_API_URL: paymentsUrl,
      S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    },
  };
}

/** Resolves once 127.0.0.1:port accepts a TCP connection. */
async function waitForPort(port, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const open = await new Promise((resolveProbe) => {
      const socket = connect(port, '127.0.0.1');
      socket.once('connect', () => {
        socket.destroy();
        resolveProbe(true);
      });
      socket.once('error', () => resolveProbe(false));
    });
    if (open) return;
    await new Promise((resolveWait) => setTimeout(resolveWait, 100));
  }
  throw new Error(`nothing listens on 127.0.0.1:${port} after ${timeoutMs / 1000} s`);
}

function withTimeout(promise, ms, message) {
  let timer;
  const timeout = new Promise((_, rejectTimeout) => {
    timer = setTimeout(() => rejectTimeout(new Error(message)), ms);
  });
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}

/** Stops a child process and waits for it to exit. */
export function stopProcess(child, signal = 'SIGTERM') {
  // A child ended by a signal keeps exitCode null; signalCode tells it is gone too.
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
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

/**
 * The built app against the migrated and seeded test database, with its local fakes, on ports apart
 * from `npm start`'s (E2E_PORT, 3100 by default); `run` gets the environment the browser tests read.
 * Everything is stopped afterwards, and on Ctrl-C.
 */
export async function withEndToEndServer(run) {
  const testDatabase = databaseEnv().DB_TEST_NAME;
  migrateAndSeed(testDatabase);
  const port = Number(process.env.E2E_PORT ?? 3100);
  let server;
  let fakes;
  const stopAll = async () => {
    await stopProcess(server?.child);
    await fakes?.stop();
  };
  const onSignal = () => stopAll().then(() => process.exit(130));
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  try {
    fakes = await startFakes({
      ...fakePorts({ smtpPort: 2526, mailboxPort: 2581, paymentsPort: 12112, s3Port: 4570 }),
      webhookUrl: appWebhookUrl(port),
      quiet: true,
    });
    server = await startServer({
      port,
      databaseName: testDatabase,
      quiet: true,
      extraEnv: {
        LOG_LEVEL: 'warn',
        PUBLIC_APP_URL: `http://127.0.0.1:${port}`,
        ...fakes.serverEnv,
      },
    });
    return await run({
      E2E_BASE_URL: server.url,
      MAILBOX_URL: fakes.mailboxUrl,
      FAKE_PAYMENTS_URL: fakes.paymentsUrl,
    });
  } finally {
    await stopAll();
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
  }
}
