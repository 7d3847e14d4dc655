import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, resolve } from 'node:path';

const serverRoot = resolve(__dirname, '../..');
const repoRoot = resolve(serverRoot, '..');

/**
 * Compiles the server as `npm run build -w server` does, into a private folder under the git-ignored
 * `.data` (one per database port, so two runs side by side do not share it), and answers its
 * `main.js`. `npm test` runs the server tests before it builds the server, so `server/dist` may be
 * missing or stale. Types are not checked here (`--noCheck`): the typecheck step does that, and this
 * only needs the JavaScript, the same as the full build emits. Skipped when nothing it is built from
 * changed since the last time.
 */
export function buildServerForTests(): string {
  const outDir = join(repoRoot, '.data', `test-server-${process.env.DB_PORT ?? '54329'}`);
  const main = join(outDir, 'dist', 'main.js');
  const stamp = join(outDir, 'built-from.sha256');
  const sources = sourcesFingerprint();
  if (existsSync(main) && existsSync(stamp) && readFileSync(stamp, 'utf8') === sources) return main;
  const result = spawnSync(
    process.execPath,
    [
      createRequire(__filename).resolve('typescript/bin/tsc'),
      '-p',
      join(serverRoot, 'tsconfig.build.json'),
      '--outDir',
      join(outDir, 'dist'),
      '--noCheck',
      '--declaration',
      'false',
      '--sourceMap',
      'false',
    ],
    { cwd: serverRoot, encoding: 'utf8' },
  );
  if (result.status !== 0) {
    throw new Error(`the server did not compile:\n${result.stdout}${result.stderr}`);
  }
  if (!existsSync(main)) throw new Error(`no ${main} after the build`);
  writeFileSync(stamp, sources);
  return main;
}

/** A digest of the path, size and modification time of every file the server's build reads. */
function sourcesFingerprint(): string {
  const hash = createHash('sha256');
  const visit = (path: string) => {
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path).sort()) visit(join(path, entry));
    } else {
      hash.update(`${path}\t${stat.size}\t${stat.mtimeMs}\n`);
    }
  };
  for (const path of [
    join(serverRoot, 'src'),
    join(serverRoot, 'tsconfig.json'),
    join(serverRoot, 'tsconfig.build.json'),
    join(repoRoot, 'tsconfig.base.json'),
    join(repoRoot, 'shared', 'dist'),
  ]) {
    if (existsSync(path)) visit(path);
  }
  return hash.digest('hex');
}

/** A port nothing listens on just now, on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() =>
        typeof address === 'object' && address ? resolvePort(address.port) : reject(new Error()),
      );
    });
  });
}

export type ServerProcess = {
  child: ChildProcess;
  url: string;
  /** What the server wrote: its log (errors only) and anything on stderr, for a failing test to show. */
  output: () => string;
  /** Resolves once the process is gone. */
  exited: Promise<void>;
};

/**
 * Starts the built server as its own process, as `npm start` does, with this test run's settings
 * (database, signing key) plus `env`; resolves once `/api/health/live` answers.
 */
export async function startServerProcess(
  main: string,
  env: Record<string, string> = {},
): Promise<ServerProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, [main], {
    cwd: repoRoot,
    env: {
      ...process.env,
      HOST: '127.0.0.1',
      PORT: String(port),
      LOG_LEVEL: 'error',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const keep = (chunk: Buffer) => {
    output += chunk.toString('utf8');
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  const exited = new Promise<void>((resolveExit) => child.once('exit', () => resolveExit()));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new Error(`the server process ended at start-up:\n${output}`);
    }
    try {
      if ((await fetch(`${url}/api/health/live`)).ok)
        return { child, url, output: () => output, exited };
    } catch {
      // not listening yet
    }
    await new Promise((resolveWait) => setTimeout(resolveWait, 100));
  }
  child.kill('SIGKILL');
  throw new Error(`the server process did not answer on ${url} within 30 s:\n${output}`);
}

/** Ends the process (SIGTERM, then SIGKILL after 10 s) unless it is gone already. */
export async function stopServerProcess(server: ServerProcess | undefined): Promise<void> {
  if (!server || server.child.exitCode !== null || server.child.signalCode !== null) return;
  const timer = setTimeout(() => server.child.kill('SIGKILL'), 10_000);
  server.child.kill('SIGTERM');
  await server.exited;
  clearTimeout(timer);
}

/**
 * `scripts/db.sh start|stop` for the cluster this run uses: the script reads DB_PORT and
 * PONDWRIGHT_PG_DATA from the environment it inherits, as `npm test` and the health test rely on.
 */
export function db(command: 'start' | 'stop'): Promise<void> {
  // Asynchronous, so the burst's requests keep being timed while PostgreSQL stops and starts.
  return new Promise((resolveRun, reject) => {
    const child = spawn('bash', [join(repoRoot, 'scripts/db.sh'), command], {
      env: process.env,
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    let stderr = '';
    child.stderr.on('data', (chunk: Buffer) => {
      stderr += chunk.toString('utf8');
    });
    child.once('error', reject);
    child.once('exit', (code) =>
      code === 0 ? resolveRun() : reject(new Error(`db.sh ${command} failed:\n${stderr}`)),
    );
  });
}
