// The infrastructure of a scaled-out Pondwright on one machine, private to one run and kept in one
// temporary folder: a PostgreSQL primary and its streaming replica (clusters made by scripts/db.sh and
// pg_basebackup), PgBouncer in transaction pooling mode, and nginx balancing the app instances.
import { spawn, spawnSync } from 'node:child_process';
import {
  appendFileSync,
  chmodSync,
  chownSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { connect, createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { repoRoot } from './setup.mjs';

export const isRoot = process.getuid?.() === 0;

/** Marks every process a run starts (in its environment), so a later run can tell them apart. */
export const RUN_MARKER = 'PONDWRIGHT_SCALE_RUN';
/** The application name of the scripts' own psql sessions, told apart from the app's in the logs. */
export const ADMIN_APP_NAME = 'pondwright-scale-admin';
const RUN_PREFIX = 'pondwright-scale-';

/** Runs a command to completion, capturing its output; throws with the tail of stderr on failure. */
export function mustRun(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: repoRoot, encoding: 'utf8', ...options });
  if (result.status !== 0) {
    const output = `${result.stderr ?? ''}${result.stdout ?? ''}`.trim().split('\n').slice(-15);
    throw new Error(
      `${command} ${args.join(' ')} failed (${result.error?.message ?? `exit ${result.status ?? result.signal}`})${output.length ? `:\n  ${output.join('\n  ')}` : ''}`,
    );
  }
  return (result.stdout ?? '').trim();
}

/** As root, PostgreSQL's programs run as the postgres system user (initdb and postgres refuse root). */
function asOwner(command, args) {
  return isRoot ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
}

function chownToPostgres(...paths) {
  if (!isRoot) return;
  const uid = Number(mustRun('id', ['-u', 'postgres']));
  const gid = Number(mustRun('id', ['-g', 'postgres']));
  for (const path of paths) chownSync(path, uid, gid);
}

function findProgram(name) {
  for (const dir of ['/usr/sbin', '/usr/bin', '/usr/local/sbin', '/usr/local/bin']) {
    if (existsSync(join(dir, name))) return join(dir, name);
  }
  return null;
}

/**
 * nginx and PgBouncer, installed from Debian with apt-get when missing (as root; otherwise it says what
 * to install), the way scripts/db.sh installs PostgreSQL. The packages' own services are kept from
 * starting on install: this run starts its own copies, on ports of its own.
 */
export function ensureScaleTools(say) {
  let nginx = findProgram('nginx');
  let pgbouncer = findProgram('pgbouncer');
  if (!nginx || !pgbouncer) {
    if (!isRoot) {
      throw new Error(
        'nginx and PgBouncer are missing. Install them with: sudo apt-get install -y nginx pgbouncer',
      );
    }
    say("nginx or PgBouncer is missing: installing Debian's nginx and pgbouncer (apt-get)...");
    const policy = '/usr/sbin/policy-rc.d';
    const guard = !existsSync(policy);
    // Debian starts a package's service on install unless policy-rc.d says no (containers usually do).
    if (guard) writeFileSync(policy, '#!/bin/sh\nexit 101\n', { mode: 0o755 });
    try {
      const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
      const wait = ['-o', 'DPkg::Lock::Timeout=300'];
      mustRun('apt-get', [...wait, 'update', '-qq'], { env });
      mustRun('apt-get', [...wait, 'install', '-y', '-qq', 'nginx', 'pgbouncer'], { env });
    } finally {
      if (guard) rmSync(policy, { force: true });
    }
    nginx = findProgram('nginx');
    pgbouncer = findProgram('pgbouncer');
    if (!nginx || !pgbouncer)
      throw new Error('apt-get installed nothing runnable for nginx/pgbouncer');
  }
  const nginxVersion = spawnSync(nginx, ['-v'], { encoding: 'utf8' }).stderr.trim();
  const pgbouncerVersion = mustRun(pgbouncer, ['--version']).split('\n')[0];
  return {
    nginx,
    pgbouncer,
    versions: `${nginxVersion.replace('nginx version: ', '')}, ${pgbouncerVersion}`,
  };
}

/** A PostgreSQL program from Debian's newest installed major version (as scripts/db.sh picks). */
export function pgProgram(name) {
  const versions = existsSync('/usr/lib/postgresql')
    ? readdirSync('/usr/lib/postgresql').sort((a, b) => Number(a) - Number(b))
    : [];
  const path = join('/usr/lib/postgresql', versions.at(-1) ?? '', 'bin', name);
  if (!existsSync(path)) throw new Error(`PostgreSQL's ${name} is not installed (${path})`);
  return path;
}

const handedOut = new Set();

/** A port in [from, to] that nothing listens on, never the same twice in this process. */
export async function freePort(from, to) {
  const span = to - from + 1;
  const offset = Math.floor(Math.random() * span);
  for (let index = 0; index < span; index++) {
    const port = from + ((offset + index) % span);
    if (handedOut.has(port) || !(await canListen(port))) continue;
    handedOut.add(port);
    return port;
  }
  throw new Error(`no free port between ${from} and ${to}`);
}

function canListen(port) {
  return new Promise((resolveProbe) => {
    const server = createServer();
    server.once('error', () => resolveProbe(false));
    server.listen(port, '127.0.0.1', () => server.close(() => resolveProbe(true)));
  });
}

/** Resolves once 127.0.0.1:port accepts connections; fails early if `child` exits. */
export async function waitForPort(port, { child, name, timeoutMs = 20_000 } = {}) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child && (child.exitCode !== null || child.signalCode !== null)) {
      throw new Error(`${name ?? 'the process'} exited (${child.exitCode ?? child.signalCode})`);
    }
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
  throw new Error(`${name ?? 'nothing'} is not listening on 127.0.0.1:${port}`);
}

/**
 * A fresh folder for one run under the system's temporary folder. Readable by all so the postgres
 * user (as root) and nginx's workers reach their parts.
 */
export function makeRunDirectory() {
  const dir = mkdtempSync(join(tmpdir(), RUN_PREFIX));
  chmodSync(dir, 0o755);
  writeFileSync(join(dir, 'owner.pid'), String(process.pid));
  return dir;
}

/**
 * Cleans up after runs whose script was killed outright (no chance to stop its children): stops their
 * clusters and the processes they marked, then removes their folders. Runs still alive are left alone.
 */
export function reapStaleRuns(say) {
  for (const name of readdirSync(tmpdir()).filter((entry) => entry.startsWith(RUN_PREFIX))) {
    const dir = join(tmpdir(), name);
    const owner = Number(readFileIfAny(join(dir, 'owner.pid')));
    if (owner ? processIsAlive(owner) : Date.now() - statSync(dir).mtimeMs < 60_000) continue;
    for (const cluster of ['primary', 'replica'])
      stopCluster(join(dir, 'pg', cluster), 'immediate');
    const marked = readdirSync('/proc')
      .filter((entry) => /^\d+$/.test(entry))
      .map(Number)
      .filter((pid) => {
        const environ = readFileIfAny(`/proc/${pid}/environ`);
        return (
          environ.includes(`${RUN_MARKER}=${dir}\0`) ||
          readFileIfAny(`/proc/${pid}/cmdline`).includes(dir)
        );
      });
    // Politely first, so nginx's master takes its workers along; then for certain.
    for (const signal of ['SIGTERM', 'SIGKILL']) {
      for (const pid of marked.filter(processIsAlive)) {
        try {
          process.kill(pid, signal);
        } catch {
          // gone already
        }
      }
      const deadline = Date.now() + 5000;
      while (marked.some(processIsAlive) && Date.now() < deadline) {
        Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 100);
      }
    }
    rmSync(dir, { recursive: true, force: true });
    say(`removed the leftovers of an interrupted run (${dir})`);
  }
}

function readFileIfAny(path) {
  try {
    return readFileSync(path, 'utf8');
  } catch {
    return '';
  }
}

function processIsAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return error.code === 'EPERM';
  }
}

const DB_USER = 'pondwright';
const DB_PASSWORD = 'pondwright';
const DB_NAME = 'pondwright';
const REPLICATION_USER = 'replicator';
const REPLICATION_PASSWORD = 'pondwright-replication';

/** The connection settings of the app's database in these clusters. */
export const database = { user: DB_USER, password: DB_PASSWORD, name: DB_NAME };

/**
 * SQL through psql as the app's role (a superuser in these clusters), tuples only and unaligned:
 * one row per line, columns split by `|`.
 */
export function psql(port, sql, { database: name = DB_NAME } = {}) {
  return mustRun(
    pgProgram('psql'),
    ['-X', '-tAq', '-v', 'ON_ERROR_STOP=1', '-h', '127.0.0.1', '-p', String(port)],
    { env: { ...adminEnv(), PGDATABASE: name }, input: sql },
  );
}

function adminEnv() {
  return {
    ...process.env,
    PGUSER: DB_USER,
    PGPASSWORD: DB_PASSWORD,
    PGAPPNAME: ADMIN_APP_NAME,
    PGCONNECT_TIMEOUT: '5',
  };
}

/**
 * The primary: a private cluster made and started by scripts/db.sh on its own port and folder, with
 * a role for streaming replication and a pg_hba line that lets it in from 127.0.0.1.
 */
export function startPrimary(dir, port) {
  const dataDir = join(dir, 'pg', 'primary');
  mkdirSync(join(dir, 'pg'), { recursive: true });
  mustRun('bash', ['scripts/db.sh', 'start'], {
    env: {
      ...process.env,
      PONDWRIGHT_PG_DATA: dataDir,
      DB_PORT: String(port),
      DB_USER,
      DB_PASSWORD,
      DB_NAME,
      DB_TEST_NAME: DB_NAME,
    },
  });
  const hba = join(dataDir, 'pg_hba.conf');
  writeFileSync(
    hba,
    `# Streaming replication for the scale-out run's replica (pg_basebackup -R), loopback only.\n` +
      `host replication ${REPLICATION_USER} 127.0.0.1/32 scram-sha-256\n` +
      readFileSync(hba, 'utf8'),
  );
  psql(
    port,
    `CREATE ROLE ${REPLICATION_USER} WITH REPLICATION LOGIN PASSWORD '${REPLICATION_PASSWORD}';
     SELECT pg_reload_conf();`,
  );
  return { dataDir, port, logFile: join(dir, 'pg', `postgres-${port}.log`) };
}

/**
 * The session timeouts the app asks for at connect time are lost behind PgBouncer (it ignores those
 * startup parameters), so the role carries them for every connection the pooler opens.
 */
export function setRoleTimeouts(port) {
  psql(
    port,
    `ALTER ROLE ${DB_USER} IN DATABASE ${DB_NAME} SET statement_timeout = '10s';
     ALTER ROLE ${DB_USER} IN DATABASE ${DB_NAME} SET idle_in_transaction_session_timeout = '30s';`,
  );
}

/**
 * A streaming replica of `primary`: a base backup with `pg_basebackup -R` (which writes
 * standby.signal and primary_conninfo), its own port and socket folder, every statement logged so a
 * run can see which reads it served, started and left streaming.
 */
export async function startReplica(dir, primary, port) {
  const dataDir = join(dir, 'pg', 'replica');
  const [command, args] = asOwner(
    pgProgram('pg_basebackup'),
    [
      ['-h', '127.0.0.1', '-p', String(primary.port)],
      ['-U', REPLICATION_USER, '-D', dataDir, '-R', '-X', 'stream', '-c', 'fast'],
    ].flat(),
  );
  mustRun(command, args, { env: { ...process.env, PGPASSWORD: REPLICATION_PASSWORD } });
  appendFileSync(
    join(dataDir, 'postgresql.conf'),
    `
# The scale-out run's streaming replica: its own port and socket folder, and every statement logged
# with the client's application name, so the run can tell which reads it served.
port = ${port}
unix_socket_directories = '${dataDir}'
hot_standby = on
log_statement = 'all'
log_line_prefix = '%m [%p] app=%a '
`,
  );
  const logFile = join(dir, 'pg', `replica-${port}.log`);
  const [pgCtl, ctlArgs] = asOwner(pgProgram('pg_ctl'), [
    ...['-D', dataDir, '-l', logFile, '-w', '-t', '60', 'start'],
  ]);
  mustRun(pgCtl, ctlArgs);
  const deadline = Date.now() + 30_000;
  while (
    psql(
      primary.port,
      `SELECT count(*) FROM pg_stat_replication WHERE state = 'streaming'`,
    ).trim() !== '1'
  ) {
    if (Date.now() > deadline) throw new Error('the replica did not start streaming within 30 s');
    await new Promise((resolveWait) => setTimeout(resolveWait, 200));
  }
  return { dataDir, port, logFile };
}

/** Stops a cluster of this run if it runs; `immediate` when cleaning up after a crash. */
export function stopCluster(dataDir, mode = 'fast') {
  if (!existsSync(join(dataDir, 'postmaster.pid'))) return;
  const [command, args] = asOwner(pgProgram('pg_ctl'), [
    '-D',
    dataDir,
    '-m',
    mode,
    '-w',
    '-t',
    '60',
    'stop',
  ]);
  spawnSync(command, args, { stdio: 'ignore' });
}

/** Waits until the replica has replayed everything the primary has written so far. */
export async function waitForReplicaToCatchUp(primary, replica, timeoutMs = 30_000) {
  const target = psql(primary.port, 'SELECT pg_current_wal_lsn()').trim();
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const caughtUp = psql(
      replica.port,
      `SELECT pg_wal_lsn_diff(pg_last_wal_replay_lsn(), '${target}') >= 0`,
    ).trim();
    if (caughtUp === 't') return target;
    if (Date.now() > deadline) throw new Error(`the replica did not replay up to ${target}`);
    await new Promise((resolveWait) => setTimeout(resolveWait, 100));
  }
}

/**
 * PgBouncer in front of the primary, in transaction pooling mode: a generated configuration and a
 * userlist holding the role's SCRAM secret (PgBouncer then logs in to PostgreSQL with the client's own
 * SCRAM keys). As root it switches to the postgres user itself (`-u`), as it refuses to run as root.
 */
export async function startPgbouncer({ dir, port, primary, program, poolSize }) {
  const home = join(dir, 'pg', 'pgbouncer');
  mkdirSync(home, { recursive: true });
  const secret = psql(
    primary.port,
    `SELECT rolpassword FROM pg_authid WHERE rolname = '${DB_USER}'`,
  );
  if (!secret.startsWith('SCRAM-SHA-256$'))
    throw new Error(`no SCRAM secret for ${DB_USER} in pg_authid`);
  const userlist = join(home, 'userlist.txt');
  const ini = join(home, 'pgbouncer.ini');
  writeFileSync(userlist, `"${DB_USER}" "${secret}"\n`, { mode: 0o600 });
  writeFileSync(
    ini,
    `;; Generated for one scale-out run (scripts/lib/scale-infra.mjs).
[databases]
${DB_NAME} = host=127.0.0.1 port=${primary.port} dbname=${DB_NAME}

[pgbouncer]
listen_addr = 127.0.0.1
listen_port = ${port}
unix_socket_dir =
auth_type = scram-sha-256
auth_file = ${userlist}
admin_users = ${DB_USER}
;; A server connection is lent to a client for one transaction only: many app connections share few.
pool_mode = transaction
max_client_conn = 200
default_pool_size = ${poolSize}
;; node-postgres sends the app's session timeouts as startup parameters, which PgBouncer refuses unless
;; ignored; the role carries them instead (ALTER ROLE ... SET, see setRoleTimeouts).
ignore_startup_parameters = extra_float_digits,statement_timeout,idle_in_transaction_session_timeout
logfile = ${join(home, 'pgbouncer.log')}
pidfile = ${join(home, 'pgbouncer.pid')}
`,
    { mode: 0o600 },
  );
  chownToPostgres(home, userlist, ini);
  const child = spawn(program, [...(isRoot ? ['-u', 'postgres'] : []), ini], {
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  let errors = '';
  child.stderr.on('data', (chunk) => (errors = (errors + chunk).slice(-2000)));
  await waitForPort(port, { child, name: 'PgBouncer' }).catch((error) => {
    child.kill('SIGKILL');
    throw new Error(`${error.message}\n${errors}`);
  });
  return { child, port, ini };
}

/** How many client and server connections PgBouncer holds for the app's database right now. */
export function pgbouncerConnections(port) {
  const count = (command) => {
    // The admin console takes simple queries only, which is what psql's -c sends.
    const lines = mustRun(
      pgProgram('psql'),
      ['-X', '-A', '-h', '127.0.0.1', '-p', String(port), '-d', 'pgbouncer', '-c', command],
      { env: adminEnv() },
    )
      .split('\n')
      .filter((line) => line.includes('|'));
    const database = lines[0].split('|').indexOf('database');
    return lines.slice(1).filter((line) => line.split('|')[database] === DB_NAME).length;
  };
  return { clients: count('SHOW CLIENTS'), servers: count('SHOW SERVERS') };
}

/**
 * nginx as a child process with its own prefix, configuration, pid and logs in the run's folder,
 * balancing round robin over the instances. `X-Upstream` tells which instance answered (for the demo;
 * a production load balancer would not reveal it).
 */
export async function startNginx({ dir, port, upstreams, program }) {
  const prefix = join(dir, 'nginx');
  mkdirSync(join(prefix, 'tmp'), { recursive: true });
  const conf = join(prefix, 'nginx.conf');
  writeFileSync(
    conf,
    `# Generated for one scale-out run (scripts/lib/scale-infra.mjs).
daemon off;
worker_processes 1;
pid ${prefix}/nginx.pid;
error_log ${prefix}/error.log warn;
events { worker_connections 512; }
http {
  log_format upstream '$remote_addr "$request" $status upstream=$upstream_addr $request_time s';
  access_log ${prefix}/access.log upstream;
  client_body_temp_path ${prefix}/tmp/body;
  proxy_temp_path ${prefix}/tmp/proxy;
  fastcgi_temp_path ${prefix}/tmp/fastcgi;
  uwsgi_temp_path ${prefix}/tmp/uwsgi;
  scgi_temp_path ${prefix}/tmp/scgi;
  # Photos are up to 15 MB (PHOTO_MAX_BYTES).
  client_max_body_size 16m;

  upstream pondwright {
${upstreams.map((upstream) => `    server 127.0.0.1:${upstream} max_fails=1 fail_timeout=1s;`).join('\n')}
    keepalive 16;
  }

  server {
    listen 127.0.0.1:${port};
    location / {
      proxy_pass http://pondwright;
      proxy_http_version 1.1;
      proxy_set_header Connection "";
      proxy_set_header Host $http_host;
      # The app trusts one proxy hop (TRUST_PROXY=true) and takes the caller's address from here.
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto $scheme;
      proxy_set_header X-Request-Id $request_id;
      # A refused connection or timeout moves the request to the next instance; nginx never resends
      # a POST that already reached one (non-idempotent).
      proxy_next_upstream error timeout;
      add_header X-Upstream $upstream_addr always;
    }
  }
}
`,
  );
  const child = spawn(program, ['-p', prefix, '-c', conf, '-e', join(prefix, 'error.log')], {
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  let errors = '';
  child.stderr.on('data', (chunk) => (errors = (errors + chunk).slice(-2000)));
  await waitForPort(port, { child, name: 'nginx' }).catch((error) => {
    child.kill('SIGKILL');
    throw new Error(`${error.message}\n${errors}${readFileIfAny(join(prefix, 'error.log'))}`);
  });
  return { child, port, url: `http://127.0.0.1:${port}`, accessLog: join(prefix, 'access.log') };
}
