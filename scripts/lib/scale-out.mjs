// Pondwright scaled out on one machine, for `npm run scale:demo` and its test
// (client/e2e/scale-out.e2e.test.ts): two app instances behind nginx, PgBouncer in transaction pooling
// mode in front of a private PostgreSQL primary, the local fakes, and later a streaming replica that
// serves the reports. Every piece is private to the run and stopped by `ScaleOut.stop()`.
import { readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import {
  ADMIN_APP_NAME,
  database,
  ensureScaleTools,
  freePort,
  makeRunDirectory,
  mustRun,
  pgbouncerConnections,
  psql,
  reapStaleRuns,
  RUN_MARKER,
  setRoleTimeouts,
  startNginx,
  startPgbouncer,
  startPrimary,
  startReplica,
  stopCluster,
  waitForReplicaToCatchUp,
} from './scale-infra.mjs';
import {
  call,
  check,
  OWNER,
  outboxBurst,
  pipelineCount,
  quoteJourney,
  readReports,
  signIn,
  sleep,
  waitFor,
} from './scale-journey.mjs';
import { appWebhookUrl, repoRoot, startFakes, startServer, stopProcess } from './setup.mjs';

const HTTP_PORTS = [4700, 4799];
const POSTGRES_PORTS = [54500, 54599];
/** Server connections PgBouncer keeps per database and user, shared by both instances' pools. */
const PGBOUNCER_POOL_SIZE = 6;
/** Each instance's own pool, towards PgBouncer. */
const APP_POOL_SIZE = 10;
/** Both outbox workers poll often, so they really do compete for the same rows. */
const OUTBOX_POLL_MS = 200;

const color = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code, text) => (color ? `\x1b[${code}m${text}\x1b[0m` : text);

/**
 * A step reporter: `await step(title, async (note) => …)` prints PASS with the notes or FAIL with the
 * error (then rethrows), and keeps the tally.
 */
export function createSteps(say = (line) => console.log(line)) {
  const results = [];
  const step = async (title, run) => {
    const started = Date.now();
    const notes = [];
    const took = () => paint('2', `(${((Date.now() - started) / 1000).toFixed(1)} s)`);
    try {
      const value = await run((text) => notes.push(text));
      results.push({ title, ok: true });
      say(
        `${paint('32', 'PASS')}  ${title}${notes.length ? ` — ${notes.join('; ')}` : ''} ${took()}`,
      );
      return value;
    } catch (error) {
      results.push({ title, ok: false, error: error.message });
      say(`${paint('31', 'FAIL')}  ${title} — ${error.message} ${took()}`);
      throw error;
    }
  };
  step.say = say;
  step.section = (title) => say(`\n${paint('1', `── ${title}`)}`);
  step.results = results;
  return step;
}

/** What one run started, and how to stop it all (in reverse order), politely or at once. */
export class ScaleOut {
  dir = null;
  instances = [];
  outboxPollMs = OUTBOX_POLL_MS;
  replica = null;
  #stops = [];

  /** `stop` is awaited on a normal stop; `kill` must be synchronous (for the process's exit). */
  onStop(stop, kill = () => {}) {
    this.#stops.push({ stop, kill });
  }

  async stop() {
    for (const { stop } of this.#stops.splice(0).reverse()) {
      try {
        await stop();
      } catch {
        // keep stopping the rest
      }
    }
    if (this.dir) rmSync(this.dir, { recursive: true, force: true });
  }

  /** The last resort, from a synchronous 'exit' handler. */
  killNow() {
    for (const { kill } of this.#stops.splice(0).reverse()) {
      try {
        kill();
      } catch {
        // keep going
      }
    }
    if (this.dir) rmSync(this.dir, { recursive: true, force: true });
  }
}

/**
 * Patterns of session state that PgBouncer's transaction pooling would lose or leak to another client:
 * session advisory locks, session `SET`, LISTEN, named prepared statements, cursors and temporary
 * tables. Transaction-scoped forms (pg_advisory_xact_lock, SET LOCAL) are fine.
 */
const SESSION_STATE = [
  /pg_(try_)?advisory_lock(_shared)?\s*\(/,
  /pg_advisory_unlock/,
  /['"`]\s*(SET|RESET)\s+(SESSION\s+)?[a-z_.]+\s*(=|TO\b|;|['"`])/,
  /['"`]\s*(LISTEN|UNLISTEN|PREPARE|DEALLOCATE|DECLARE)\s/,
  /CREATE\s+(TEMP|TEMPORARY)\s+TABLE/i,
  /set_config\([^)]*,\s*false\s*\)/i,
];

/** Server source lines that would break behind PgBouncer in transaction pooling mode. */
export function sessionStateInServer() {
  const found = [];
  const visit = (dir) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) visit(path);
      else if (entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts')) {
        readFileSync(path, 'utf8')
          .split('\n')
          .forEach((line, index) => {
            if (SESSION_STATE.some((pattern) => pattern.test(line))) {
              found.push(`${relative(repoRoot, path)}:${index + 1}: ${line.trim()}`);
            }
          });
      }
    }
  };
  visit(join(repoRoot, 'server/src'));
  return found;
}

function instanceEnv(scale, replica) {
  return {
    DB_HOST: '127.0.0.1',
    DB_PORT: String(scale.pgbouncer.port),
    DB_USER: database.user,
    DB_PASSWORD: database.password,
    DB_POOL_SIZE: String(APP_POOL_SIZE),
    ...(replica ? { DB_REPLICA_HOST: '127.0.0.1', DB_REPLICA_PORT: String(replica.port) } : {}),
    PUBLIC_APP_URL: scale.publicUrl,
    TRUST_PROXY: 'true',
    // All of the run's load comes from one address; the per-address flood guard would refuse it.
    RATE_LIMIT_PER_MINUTE: '1000000',
    OUTBOX_WORKER: 'on',
    OUTBOX_POLL_MS: String(OUTBOX_POLL_MS),
    LOG_LEVEL: 'warn',
    // Keeps the run's output to its steps (the servers' errors still show); `npm start` shows warnings.
    NODE_NO_WARNINGS: '1',
    [RUN_MARKER]: scale.dir,
    ...scale.fakes.serverEnv,
  };
}

async function startInstance(scale, instance, replica = null) {
  const { child } = await startServer({
    port: instance.port,
    databaseName: database.name,
    quiet: true,
    extraEnv: instanceEnv(scale, replica),
  });
  instance.child = child;
}

/**
 * Starts everything of the first phase: tools (installed if missing), the primary (migrated and
 * seeded directly, as migrations bypass the pooler), PgBouncer, the fakes, two instances through
 * PgBouncer, and nginx before them. Needs the built server (server/dist).
 */
export async function setUp(scale, step) {
  step.section('Set-up: two instances, PgBouncer, nginx, the local fakes');
  reapStaleRuns(step.say);
  const tools = await step('nginx and PgBouncer are installed (apt-get when missing)', (note) => {
    const found = ensureScaleTools(step.say);
    note(found.versions);
    return found;
  });
  await step('the server keeps no session state that transaction pooling would lose', (note) => {
    const found = sessionStateInServer();
    check(found.length === 0, `session state in the server:\n  ${found.join('\n  ')}`);
    note(
      'advisory locks are pg_advisory_xact_lock; no session SET, LISTEN, cursors or temp tables',
    );
  });

  scale.dir = makeRunDirectory();
  const ports = [];
  for (let index = 0; index < 8; index++) ports.push(await freePort(...HTTP_PORTS));
  const [lbPort, instance1Port, instance2Port, bouncerPort, smtp, mailbox, payments, s3] = ports;
  scale.publicUrl = `http://127.0.0.1:${lbPort}`;
  scale.instances = [instance1Port, instance2Port].map((port, index) => ({
    name: `instance ${index + 1} (:${port})`,
    port,
    url: `http://127.0.0.1:${port}`,
    child: null,
  }));

  const primaryPort = await freePort(...POSTGRES_PORTS);
  scale.onStop(
    () => stopCluster(join(scale.dir, 'pg', 'primary')),
    () => stopCluster(join(scale.dir, 'pg', 'primary'), 'immediate'),
  );
  scale.primary = await step('a private PostgreSQL primary, migrated and seeded', (note) => {
    const primary = startPrimary(scale.dir, primaryPort);
    const env = {
      ...process.env,
      DB_HOST: '127.0.0.1',
      DB_PORT: String(primary.port),
      DB_USER: database.user,
      DB_PASSWORD: database.password,
      DB_NAME: database.name,
    };
    mustRun(process.execPath, ['server/dist/database/run-migrations.js'], { env });
    mustRun(process.execPath, ['server/dist/seed/run-seed.js'], { env });
    setRoleTimeouts(primary.port);
    note(`127.0.0.1:${primary.port}, data in ${primary.dataDir}`);
    return primary;
  });

  scale.pgbouncer = await step(
    'PgBouncer in transaction pooling mode before the primary',
    async (note) => {
      const pgbouncer = await startPgbouncer({
        dir: scale.dir,
        port: bouncerPort,
        primary: scale.primary,
        program: tools.pgbouncer,
        poolSize: PGBOUNCER_POOL_SIZE,
      });
      scale.onStop(
        () => stopProcess(pgbouncer.child),
        () => pgbouncer.child.kill('SIGKILL'),
      );
      check(psql(pgbouncer.port, 'SELECT 1') === '1', 'no answer through PgBouncer');
      note(
        `127.0.0.1:${pgbouncer.port}, SCRAM userlist, ${PGBOUNCER_POOL_SIZE} server connections`,
      );
      return pgbouncer;
    },
  );

  scale.webhookUrl = appWebhookUrl(instance1Port);
  scale.fakes = await step('the local fakes: SMTP and its mailbox, payments, S3', async (note) => {
    const fakes = await startFakes({
      smtpPort: smtp,
      mailboxPort: mailbox,
      paymentsPort: payments,
      s3Port: s3,
      s3Directory: join(scale.dir, 's3'),
      webhookUrl: scale.webhookUrl,
      quiet: true,
    });
    scale.onStop(
      () => fakes.stop(),
      () => fakes.child.kill('SIGKILL'),
    );
    note(`payment webhooks to ${scale.instances[0].name} directly`);
    return fakes;
  });

  for (const instance of scale.instances) {
    scale.onStop(
      () => stopProcess(instance.child),
      () => instance.child?.kill('SIGKILL'),
    );
  }
  await step('two app instances, both pointed at PgBouncer, outbox workers on', async (note) => {
    await Promise.all(scale.instances.map((instance) => startInstance(scale, instance)));
    note(scale.instances.map((instance) => instance.url).join(' and '));
  });

  scale.nginx = await step('nginx balancing round robin over both', async (note) => {
    const nginx = await startNginx({
      dir: scale.dir,
      port: lbPort,
      upstreams: [instance1Port, instance2Port],
      program: tools.nginx,
    });
    scale.onStop(
      () => stopProcess(nginx.child, 'SIGQUIT'),
      () => nginx.child.kill('SIGKILL'),
    );
    note(nginx.url);
    return nginx;
  });
}

/** Requests through nginx reach both instances in turn. */
export async function checkRoundRobin(scale, step) {
  await step('requests through nginx alternate between the instances', async (note) => {
    const seen = new Map();
    for (let index = 0; index < 6; index++) {
      const { upstream } = await call(scale.nginx.url, '/api/health/ready');
      seen.set(upstream, (seen.get(upstream) ?? 0) + 1);
    }
    for (const instance of scale.instances) {
      check(
        seen.has(`127.0.0.1:${instance.port}`),
        `nginx never sent a request to ${instance.name}`,
      );
    }
    note(`6 requests: ${[...seen].map(([upstream, count]) => `${upstream} ×${count}`).join(', ')}`);
  });
}

/** The first phase: the journey, an outbox burst and the reports, all on the primary. */
export async function primaryPhase(scale, step) {
  step.section('The quote journey across both instances (PostgreSQL primary only)');
  await checkRoundRobin(scale, step);
  const journey = await quoteJourney(scale, step, { label: 'primary' });
  await outboxBurst(scale, step);
  await step('the reports answer through nginx (no replica: from the primary)', async (note) => {
    const owner = await signIn(scale.nginx.url, OWNER);
    const reports = await readReports(scale, { jobId: journey.jobId, ownerToken: owner.token });
    note(`${reports.estimates} estimates in the pipeline, ${reports.rates.length} learned rates`);
  });
  await step(
    'under load, PgBouncer shares a few PostgreSQL connections among both instances’ pools',
    async (note) => {
      const peak = { clients: 0, servers: 0 };
      let running = true;
      // Enough concurrent requests per instance to fill its pool (each readiness check is a query).
      const load = Promise.all(
        scale.instances.flatMap((instance) =>
          Array.from({ length: APP_POOL_SIZE + 5 }, async () => {
            while (running) await call(instance.url, '/api/health/ready');
          }),
        ),
      );
      try {
        for (let sample = 0; sample < 6; sample++) {
          await sleep(150);
          const now = pgbouncerConnections(scale.pgbouncer.port);
          peak.clients = Math.max(peak.clients, now.clients);
          peak.servers = Math.max(peak.servers, now.servers);
        }
      } finally {
        running = false;
        await load;
      }
      check(
        peak.servers <= PGBOUNCER_POOL_SIZE,
        `${peak.servers} server connections, the pool is ${PGBOUNCER_POOL_SIZE}`,
      );
      check(
        peak.clients > peak.servers,
        `${peak.clients} app connections never outnumbered ${peak.servers}`,
      );
      note(`at peak ${peak.clients} app connections over ${peak.servers} PostgreSQL connections`);
    },
  );
  return journey;
}

/** Statements the app ran on the replica after byte `from` of its log (the run's own psql excluded). */
function replicaStatements(replica, from) {
  const text = readFileSync(replica.logFile, 'utf8').slice(from);
  return text
    .split(/\n(?=\d{4}-\d\d-\d\d )/)
    .filter((entry) => /LOG: {2}(statement|execute [^:]*):/.test(entry))
    .filter((entry) => !entry.includes(`app=${ADMIN_APP_NAME} `));
}

/**
 * The second phase: a streaming replica from `pg_basebackup -R`, a rolling restart of both instances
 * onto it (nginx keeps serving), then the same journey with the replica's replay paused, so any read
 * that went to the replica would miss what the journey just wrote, and the reports checked to come
 * from the replica.
 */
export async function replicaPhase(scale, step) {
  step.section('The same journey with a streaming replica serving the reports');
  const replicaPort = await freePort(...POSTGRES_PORTS);
  scale.onStop(
    () => stopCluster(join(scale.dir, 'pg', 'replica')),
    () => stopCluster(join(scale.dir, 'pg', 'replica'), 'immediate'),
  );
  scale.replica = await step('a streaming replica made by pg_basebackup -R', async (note) => {
    const replica = await startReplica(scale.dir, scale.primary, replicaPort);
    note(`127.0.0.1:${replica.port}, hot standby, streaming from :${scale.primary.port}`);
    return replica;
  });

  const before = await signIn(scale.instances[0].url, OWNER);
  await step(
    'rolling restart onto the replica (DB_REPLICA_HOST) while nginx keeps answering',
    async (note) => {
      let ok = 0;
      const failures = [];
      let running = true;
      const traffic = (async () => {
        while (running) {
          try {
            await call(scale.nginx.url, '/api/health/ready');
            ok += 1;
          } catch (error) {
            failures.push(error.message);
          }
          await sleep(20);
        }
      })();
      try {
        for (const instance of scale.instances) {
          await stopProcess(instance.child);
          await startInstance(scale, instance, scale.replica);
          await waitFor(`nginx to send requests to ${instance.name} again`, async () => {
            const { upstream } = await call(scale.nginx.url, '/api/health/live');
            return upstream === `127.0.0.1:${instance.port}`;
          });
        }
      } finally {
        running = false;
        await traffic;
      }
      check(failures.length === 0, `${failures.length} requests failed: ${failures[0]}`);
      note(`${ok} requests through nginx during the restart, none failed`);
    },
  );
  await step('a session from before the restart still works on both instances', async (note) => {
    for (const instance of scale.instances) {
      await call(instance.url, '/api/auth/me', { token: before.token });
    }
    await call(scale.instances[1].url, '/api/auth/refresh', {
      method: 'POST',
      headers: { Cookie: before.cookie },
      expect: [200],
    });
    note('access token and refresh cookie issued before the restart');
  });

  const owner = before.token;
  const pipelineBefore = await step(
    'the estimate stats read the replica, caught up',
    async (note) => {
      await waitForReplicaToCatchUp(scale.primary, scale.replica);
      const count = await pipelineCount(scale.nginx.url, owner);
      note(`${count} estimates in the pipeline`);
      return count;
    },
  );
  await step('WAL replay paused on the replica: from now on it lags on purpose', async (note) => {
    psql(scale.replica.port, 'SELECT pg_wal_replay_pause()');
    await waitFor('the replay to pause', () =>
      Promise.resolve(
        psql(scale.replica.port, 'SELECT pg_get_wal_replay_pause_state()') === 'paused',
      ),
    );
    note('pg_wal_replay_pause()');
  });

  const mark = statSync(scale.replica.logFile).size;
  const journey = await quoteJourney(scale, step, { label: 'replica' });
  await step(
    'the journey read its own writes: none of its statements reached the replica',
    (note) => {
      const statements = replicaStatements(scale.replica, mark);
      check(
        statements.length === 0,
        `the replica served ${statements.length} statements of the journey:\n${statements.slice(0, 3).join('\n')}`,
      );
      note('0 statements on the replica during the journey');
    },
  );
  await step(
    'the paused replica’s stats do not show the new estimate yet (reports may lag)',
    async (note) => {
      const count = await pipelineCount(scale.nginx.url, owner);
      check(count === pipelineBefore, `${count} estimates, expected the stale ${pipelineBefore}`);
      note(`still ${count}`);
    },
  );
  await step('replay resumed: the replica catches up', async (note) => {
    psql(scale.replica.port, 'SELECT pg_wal_replay_resume()');
    const lsn = await waitForReplicaToCatchUp(scale.primary, scale.replica);
    note(`replayed up to ${lsn}`);
  });
  const mark2 = statSync(scale.replica.logFile).size;
  await step(
    'the three reports answer from the replica, with the new estimate and its job',
    async (note) => {
      const reports = await readReports(scale, { jobId: journey.jobId, ownerToken: owner });
      check(
        reports.estimates === pipelineBefore + 1,
        `${reports.estimates} estimates, expected ${pipelineBefore + 1}`,
      );
      const statements = replicaStatements(scale.replica, mark2);
      for (const [report, fragment] of [
        ['estimate stats', 'JOIN estimate_drafts'],
        ['job cost report', '"job_logs"'],
        ['learned rates', 'jsonb_array_elements(l.entries)'],
      ]) {
        check(
          statements.some((statement) => statement.includes(fragment)),
          `the ${report} did not read the replica`,
        );
      }
      note(`${reports.estimates} estimates; ${statements.length} report statements on the replica`);
    },
  );
}
