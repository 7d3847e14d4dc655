import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import { Client } from 'pg';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../config/env.schema';
import {
  databaseSettingsFromEnv,
  dataSourceOptions,
  type DatabaseSettings,
} from '../database/data-source-options';
import { alternateRounds } from './alternate-rounds';
import { includes, parseOptions, type BenchOptions } from './bench-options';
import { freePort, startServer, stopServers, type BenchServer } from './bench-processes';
import {
  describeStatuses,
  goalLines,
  percent,
  rate,
  readGoals,
  routeTable,
  type Goal,
  type RouteRow,
} from './bench-report';
import {
  benchUser,
  estimateRequest,
  listRequest,
  quoteRequest,
  saveRequest,
  takeoffRequest,
  type BenchUser,
  type Session,
} from './bench-routes';
import { ensureBenchData, ESTIMATE_COUNT, type BenchFixture } from './bench-seed';
import { LINES_PER_ESTIMATE } from './bench-estimate';
import { failedRequests } from './load-runner';
import { mixedLoad, MIXED_USERS, type MixedFigures } from './mixed-load';
import { compareAnswers } from './same-answers';
import { nothingLost, SaveLedger, type SaveCount } from './save-ledger';

const READ_CONNECTIONS = 50;
const SAVE_CONNECTIONS = 10;
/** Raised for the bench only: each simulated user sends far more a minute than a person does. */
const RAISED_LIMITS = { RATE_LIMIT_PER_MINUTE: '1000000000', LOGIN_MAX_FAILURES: '1000000' };

/**
 * `npm run bench`: the real server (the built Nest app) against a bare `node:http` + `pg` baseline on
 * 10,000 seeded estimates, printing each figure beside its goal. It reports and never fails on a
 * missed goal; it exits non-zero only when the set-up itself fails.
 */
async function main(): Promise<void> {
  const options = parseOptions(process.argv.slice(2));
  const env = validateDatabaseEnv({
    ...process.env,
    DB_PASSWORD: process.env.DB_PASSWORD ?? 'pondwright',
    DB_NAME: process.env.BENCH_DB_NAME ?? 'pondwright_bench',
  });
  const settings = databaseSettingsFromEnv(env);
  await ensureDatabase(settings);
  const dataSource = new DataSource(dataSourceOptions({ ...settings, poolSize: 2 }));
  await dataSource.initialize();
  try {
    log(`database ${settings.database}: checking the seeded estimates…`);
    const { fixture, seededSeconds } = await ensureBenchData(dataSource, options.reseed);
    const seeded =
      seededSeconds === null
        ? 'reused (the marker matched; --reseed rebuilds)'
        : `seeded now in ${seededSeconds.toFixed(0)} s`;

    log('starting the real server and the baseline…');
    const { real, baseline } = await startServers(settings);
    const signIn = () => signInAs(real, fixture.estimator);
    const session: Session = { token: await signIn() };
    const answers = await compareAnswers(baseline, real, fixture, session.token);
    for (const line of setupLines(settings, options, seeded, answers)) console.log(line);

    const rows: RouteRow[] = [];
    const goals: Goal[] = [];
    const notes: string[] = [];
    const reads = [
      {
        part: 'get' as const,
        label: 'GET /api/estimates/:id',
        request: (user: BenchUser) => estimateRequest(fixture, user),
      },
      {
        part: 'list' as const,
        label: 'GET /api/estimates?page=1..20',
        request: (user: BenchUser) => listRequest(user),
      },
      {
        part: 'takeoff' as const,
        label: 'POST /api/takeoff',
        request: (user: BenchUser) => takeoffRequest(user),
      },
      {
        part: 'quote' as const,
        label: 'GET /api/quotes/:token',
        request: (user: BenchUser) => quoteRequest(fixture, user),
      },
    ];
    for (const read of reads) {
      if (!includes(options, read.part)) continue;
      log(`${read.label}: ${READ_CONNECTIONS} connections…`);
      session.token = await signIn();
      const figures = await alternateRounds({
        baseline,
        real,
        connections: READ_CONNECTIONS,
        requestsFor: (connection) => [read.request(benchUser(session, connection))],
        options,
      });
      const row = { label: read.label, connections: READ_CONNECTIONS, ...figures };
      rows.push(row);
      goals.push(...readGoals(row));
      if (failedRequests(figures.real) > 0) {
        notes.push(`${read.label}: real server answered ${describeStatuses(figures.real)}`);
      }
    }

    if (includes(options, 'save')) {
      log(`PUT /api/estimates/:id/draft: ${SAVE_CONNECTIONS} connections…`);
      session.token = await signIn();
      const save = await saveBench(dataSource, fixture, session, baseline, real, options);
      rows.push(save.row);
      goals.push(...save.goals);
    }

    let mixed: MixedFigures | null = null;
    if (includes(options, 'mixed')) {
      log(`mixed load: ${MIXED_USERS} users for ${options.mixedMinutes} min…`);
      session.token = await signIn();
      mixed = await mixedLoad({
        real,
        fixture,
        session,
        signIn,
        dataSource,
        minutes: options.mixedMinutes,
        warmupSeconds: options.warmupSeconds * 3,
      });
      goals.push(...mixedGoals(mixed));
    }

    console.log('');
    for (const line of routeTable(rows)) console.log(line);
    if (mixed) {
      console.log('');
      for (const line of mixedLines(mixed)) console.log(line);
    }
    console.log('');
    console.log('Goals (real server)');
    for (const line of goalLines(goals)) console.log(`  ${line}`);
    const missed = goals.filter((goal) => !goal.pass).length;
    console.log(`  ${goals.length - missed} of ${goals.length} goals met`);
    for (const note of notes) console.log(`note: ${note}`);
  } finally {
    stopServers();
    await dataSource.destroy();
  }
}

/**
 * The real server (production settings; the provider keys are placeholders no benched route uses) and
 * the baseline, each on a free port with the same database, pool size and signing key.
 */
async function startServers(
  settings: DatabaseSettings,
): Promise<{ real: BenchServer; baseline: BenchServer }> {
  const jwtSecret = randomBytes(32).toString('base64url');
  const databaseEnv = {
    DB_HOST: settings.host,
    DB_PORT: String(settings.port),
    DB_USER: settings.username,
    DB_PASSWORD: settings.password,
    DB_NAME: settings.database,
    DB_POOL_SIZE: String(settings.poolSize),
  };
  const [realPort, baselinePort] = [await freePort(), await freePort()];
  const [real, baseline] = await Promise.all([
    startServer('real server', 'main.js', realPort, {
      ...databaseEnv,
      ...RAISED_LIMITS,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(realPort),
      PUBLIC_APP_URL: `http://127.0.0.1:${realPort}`,
      JWT_SECRET: jwtSecret,
      OUTBOX_WORKER: 'off',
      // Behind one proxy, as deployed: each simulated user sends its own X-Forwarded-For address.
      TRUST_PROXY: 'true',
      LOG_LEVEL: 'info',
      STRIPE_SECRET_KEY: 'sk_test_bench_not_used',
      STRIPE_WEBHOOK_SECRET: 'whsec_bench_not_used',
      S3_ACCESS_KEY_ID: 'bench-not-used',
      S3_SECRET_ACCESS_KEY: 'bench-not-used',
      // The outbox worker is off: no mail is sent.
      SMTP_HOST: '127.0.0.1',
      MAIL_FROM: 'Bench <bench@bench.example>',
    }),
    startServer('baseline', 'bench/baseline-server.js', baselinePort, {
      ...databaseEnv,
      BASELINE_PORT: String(baselinePort),
      JWT_SECRET: jwtSecret,
    }),
  ]);
  return { real, baseline };
}

/** What was measured, where and how: printed before the figures, so a pasted table keeps its context. */
function setupLines(
  settings: DatabaseSettings,
  options: BenchOptions,
  seeded: string,
  answers: string[],
): string[] {
  const load = loadavg()
    .map((value) => value.toFixed(2))
    .join(' ');
  const cpu = `${cpus().length} CPUs (${cpus()[0]?.model ?? 'unknown'})`;
  return [
    `Pondwright API bench, ${new Date().toISOString().slice(0, 16)}Z`,
    `machine   ${cpu}, load average ${load} at start; Node ${process.version}`,
    `          server, baseline, PostgreSQL (${settings.host}:${settings.port}) and the load generator share these CPUs`,
    `data      ${ESTIMATE_COUNT.toLocaleString('en-US')} estimates × ${LINES_PER_ESTIMATE} lines in one company, database ${settings.database}: ${seeded}`,
    `real      server/dist/main.js, NODE_ENV=production, DB_POOL_SIZE=${settings.poolSize}, request log at info (discarded), OUTBOX_WORKER=off`,
    `          rate limits raised for the bench: RATE_LIMIT_PER_MINUTE=${RAISED_LIMITS.RATE_LIMIT_PER_MINUTE} (default 600 a minute per address)`,
    `          and LOGIN_MAX_FAILURES=${RAISED_LIMITS.LOGIN_MAX_FAILURES} (default 10); the wrong-quote-token limit is untouched (no wrong tokens are sent)`,
    `          TRUST_PROXY=true: each connection is a user with its own X-Forwarded-For address (10.77.x.y)`,
    `baseline  node:http + pg, pool ${settings.poolSize}, same routes by plain SQL, no framework or request log`,
    ...answers.map((line) => `          ${line}`),
    `load      autocannon, no pipelining, ${options.warmupSeconds} s warm-up per server, then ${options.rounds} rounds × ${options.roundSeconds} s alternating baseline/real; medians`,
  ];
}

/** Saving a 30-line draft at 10 at once, each connection on its own estimate; then counts what stuck. */
async function saveBench(
  dataSource: DataSource,
  fixture: BenchFixture,
  session: Session,
  baseline: BenchServer,
  real: BenchServer,
  options: BenchOptions,
): Promise<{ row: RouteRow; goals: Goal[] }> {
  const estimates = fixture.writeEstimates.slice(0, SAVE_CONNECTIONS);
  const ledger = new SaveLedger(dataSource, estimates);
  const counts: SaveCount[] = [];
  const figures = await alternateRounds({
    baseline,
    real,
    connections: SAVE_CONNECTIONS,
    requestsFor: (connection) => [
      saveRequest(
        fixture,
        estimates[connection % estimates.length]!,
        benchUser(session, connection),
        ledger.revisions,
      ),
    ],
    options,
    hooks: {
      before: () => ledger.open(),
      after: async (server, round) => {
        const count = await ledger.close(round.statuses['200'] ?? 0);
        if (server === real) counts.push(count);
      },
    },
  });
  const row = { label: 'PUT /api/estimates/:id/draft', connections: SAVE_CONNECTIONS, ...figures };
  const total = counts.reduce(
    (sum, count) => ({
      acknowledged: sum.acknowledged + count.acknowledged,
      stored: sum.stored + count.stored,
      events: sum.events + count.events,
    }),
    { acknowledged: 0, stored: 0, events: 0 },
  );
  const subject = 'PUT draft (30 lines, 10 at once)';
  return {
    row,
    goals: [
      {
        subject,
        goal: '≥ 250 saves/s',
        actual: `${rate(figures.real.requestsPerSecond)}/s`,
        pass: figures.real.requestsPerSecond >= 250,
      },
      {
        subject,
        goal: 'p95 ≤ 60 ms',
        actual: `${figures.real.p95Ms.toFixed(1)} ms`,
        pass: figures.real.p95Ms <= 60,
      },
      {
        subject,
        goal: 'nothing lost (rows after the rounds)',
        actual: `${total.acknowledged} ok → ${total.stored} rev, ${total.events} events`,
        pass: counts.every(nothingLost) && failedRequests(figures.real) === 0,
      },
    ],
  };
}

function mixedGoals(mixed: MixedFigures): Goal[] {
  const subject = `mixed, ${MIXED_USERS} users, ${mixed.minutes} min`;
  const unexpected = failedRequests(mixed.load);
  const drift =
    mixed.rssStartMb && mixed.rssEndMb
      ? (mixed.rssEndMb - mixed.rssStartMb) / mixed.rssStartMb
      : null;
  return [
    { subject, goal: '0 unexpected errors', actual: String(unexpected), pass: unexpected === 0 },
    {
      subject,
      goal: 'p95 < 200 ms',
      actual: `${mixed.load.p95Ms.toFixed(1)} ms`,
      pass: mixed.load.p95Ms < 200,
    },
    {
      subject,
      goal: 'p99 < 500 ms',
      actual: `${mixed.load.p99Ms.toFixed(1)} ms`,
      pass: mixed.load.p99Ms < 500,
    },
    {
      subject,
      goal: 'RSS drift ≤ 10 %',
      actual: drift === null ? 'not measurable here' : `${drift >= 0 ? '+' : ''}${percent(drift)}`,
      pass: drift !== null && drift <= 0.1,
    },
    {
      subject,
      goal: 'saves not lost',
      actual: `${mixed.saves.acknowledged} ok → ${mixed.saves.stored} rev`,
      pass: nothingLost(mixed.saves),
    },
  ];
}

function mixedLines(mixed: MixedFigures): string[] {
  const mb = (value: number | null) => (value === null ? '?' : `${value.toFixed(0)} MB`);
  return [
    `mixed load on the real server: ${MIXED_USERS} users × (list, own estimate, takeoff, save own, another estimate, quote) for ${mixed.minutes} min`,
    `  ${mixed.load.responses} responses, ${rate(mixed.load.requestsPerSecond)} req/s, p50 ${mixed.load.p50Ms.toFixed(1)} ms, p95 ${mixed.load.p95Ms.toFixed(1)} ms, p99 ${mixed.load.p99Ms.toFixed(1)} ms`,
    `  statuses: ${describeStatuses(mixed.load)}${mixed.failures.length ? `; failed: ${mixed.failures.map(([key, n]) => `${key}×${n}`).join(', ')}` : ''}`,
    `  RSS after warm-up ${mb(mixed.rssStartMb)}, at the end ${mb(mixed.rssEndMb)}, highest sample ${mb(mixed.rssMaxMb)}`,
    `  RSS median of the first fifth of the run ${mb(mixed.rssFirstFifthMb)}, of the last fifth ${mb(mixed.rssLastFifthMb)} (samples every 5 s)`,
    `  server process CPU ${mixed.serverCpuPct === null ? '?' : `${mixed.serverCpuPct.toFixed(0)} %`} of one core over the run`,
  ];
}

/**
 * Signs in for a fresh access token. A server still working off the last load's requests may answer
 * 503 (no pooled connection within two seconds): it is given up to half a minute to catch up.
 */
async function signInAs(
  server: BenchServer,
  person: { email: string; password: string },
): Promise<string> {
  let status = 0;
  for (let attempt = 0; attempt < 15; attempt++) {
    if (attempt > 0) await new Promise((resolve) => setTimeout(resolve, 2_000));
    const response = await fetch(`${server.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(person),
    });
    if (response.ok) return ((await response.json()) as { accessToken: string }).accessToken;
    status = response.status;
    if (status < 500) break;
  }
  throw new Error(`Signing in as ${person.email} answered ${status}`);
}

/** The bench database is the bench's own; it is created on first use. */
async function ensureDatabase(settings: DatabaseSettings): Promise<void> {
  if (!/^pondwright_bench\w*$/.test(settings.database)) {
    throw new Error(
      `The bench rebuilds its database: name it pondwright_bench…, not ${settings.database}`,
    );
  }
  const client = new Client({
    host: settings.host,
    port: settings.port,
    user: settings.username,
    password: settings.password,
    database: 'postgres',
  });
  await client.connect();
  try {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [
      settings.database,
    ]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${settings.database}"`);
  } finally {
    await client.end();
  }
}

function log(message: string): void {
  console.log(`[bench] ${message}`);
}

// Ctrl-C must not leave the two servers running.
process.once('SIGINT', () => {
  stopServers();
  process.exit(130);
});

main().then(
  () => process.exit(0),
  (error: unknown) => {
    stopServers();
    console.error('[bench] set-up failed:', error instanceof Error ? error.message : error);
    process.exit(1);
  },
);
