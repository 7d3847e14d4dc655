import type { EstimateView } from '@pondwright/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addCustomer } from './support/quote-fixtures';
import { countByStatus, isSuccess, runChain, type BurstCall } from './support/estimate-burst';
import { LINES_PER_SAVE, readWholeEstimate } from './support/estimate-integrity';
import {
  buildServerForTests,
  db,
  startServerProcess,
  stopServerProcess,
  type ServerProcess,
} from './support/server-process';
import { bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

/**
 * What a crash or a database outage in the middle of many saves leaves behind. The real built server
 * runs as its own process (so it can be killed), fed by a burst of estimators saving 30-line drafts
 * and finalising them into versions; the in-process app signs up and reads PostgreSQL afterwards.
 *
 * The second test stops the run's PostgreSQL with scripts/db.sh, as health.e2e-spec.ts does; run alone,
 * point DB_PORT and PONDWRIGHT_PG_DATA at a cluster of your own.
 */
const CHAINS = 8;

let testApp: TestApp;
let main: string;
const servers: ServerProcess[] = [];
/** The server process the next test uses: the first test's replacement for the one it killed. */
let running: ServerProcess | undefined;

beforeAll(async () => {
  main = buildServerForTests();
  testApp = await createTestApp();
}, 120_000);
afterAll(async () => {
  await db('start');
  await Promise.all(servers.map((server) => stopServerProcess(server)));
  await testApp.close();
});

async function startServer(name: string): Promise<ServerProcess> {
  // Its own application_name, so its sessions can be told apart in pg_stat_activity.
  const server = await startServerProcess(main, { PGAPPNAME: name });
  servers.push(server);
  return server;
}

/** A company with `CHAINS` estimates, each on the typical pond. */
async function estimatesToEdit(): Promise<{ token: string; estimates: EstimateView[] }> {
  const owner = await signupCompany(testApp);
  const customerId = await addCustomer(testApp, owner.companyId, 'Durable Customer');
  const estimates: EstimateView[] = [];
  for (let index = 0; index < CHAINS; index += 1) {
    const created = await testApp
      .http()
      .post('/api/estimates')
      .set(...bearer(owner))
      .send({ title: `Burst pond ${index + 1}`, customerId })
      .expect(201);
    estimates.push(created.body as EstimateView);
  }
  return { token: owner.accessToken, estimates };
}

/** Sessions of the server named `name` that are inside a transaction just now. */
async function openTransactions(name: string): Promise<number> {
  const [row] = (await testApp.dataSource.query(
    `SELECT count(*)::int AS n FROM pg_stat_activity WHERE application_name = $1 AND xact_start IS NOT NULL`,
    [name],
  )) as [{ n: number }];
  return row.n;
}

async function waitFor(condition: () => Promise<boolean>, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await condition()) return true;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  return false;
}

/**
 * Checks every estimate against what its estimator was told: each answered save and finalise is in
 * the database whole (readWholeEstimate checks lines, totals, hashes and the audit log), and beyond
 * them at most what was in flight or answered with an error. Answers how many unanswered (or failed)
 * writes committed anyway.
 */
async function expectAnsweredWritesWhole(
  estimates: EstimateView[],
  calls: BurstCall[],
): Promise<{ versions: number; committedUnanswered: number }> {
  let versions = 0;
  let committedUnanswered = 0;
  for (const [chain, estimate] of estimates.entries()) {
    const stored = await readWholeEstimate(testApp.dataSource, estimate.id);
    const mine = calls.filter((call) => call.chain === chain);
    const saves = mine.filter((call) => call.op === 'save');
    const finalises = mine.filter((call) => call.op === 'finalise');
    for (const save of saves.filter(isSuccess)) {
      expect(stored.savedRevisions.get(save.revision!), save.marker).toBe(save.total);
    }
    for (const finalise of finalises.filter(isSuccess)) {
      expect(stored.versions[finalise.versionNumber! - 1], finalise.marker).toMatchObject({
        sha256: finalise.sha256,
        marker: finalise.marker,
      });
    }
    // Nothing appears that nobody asked for: every extra row belongs to a write left without a 2xx.
    const extraSaves = stored.draft.revision - 1 - saves.filter(isSuccess).length;
    const extraVersions = stored.versions.length - finalises.filter(isSuccess).length;
    expect(extraSaves).toBeGreaterThanOrEqual(0);
    expect(extraSaves).toBeLessThanOrEqual(saves.filter((call) => !isSuccess(call)).length);
    expect(extraVersions).toBeGreaterThanOrEqual(0);
    expect(extraVersions).toBeLessThanOrEqual(finalises.filter((call) => !isSuccess(call)).length);
    // And each version is the finalise of a save that happened, with its own 30 lines.
    const markers = new Set(saves.map((call) => call.marker));
    for (const version of stored.versions) expect(markers.has(version.marker)).toBe(true);
    versions += stored.versions.length;
    committedUnanswered += extraSaves + extraVersions;
  }
  return { versions, committedUnanswered };
}

describe('durability of estimate saves', () => {
  it('keeps every answered save whole and nothing half when the server is killed (SIGKILL) mid-burst', async () => {
    const { token, estimates } = await estimatesToEdit();
    const name = 'durability-kill';
    const server = await startServer(name);
    const calls: BurstCall[] = [];
    let killed = false;
    let answered = 0;
    const killAfter = 40;
    let reachedTarget: () => void;
    const target = new Promise<void>((resolve) => (reachedTarget = resolve));
    const chains = estimates.map((estimate, chain) =>
      runChain({
        baseUrl: () => server.url,
        token,
        estimate,
        chain,
        calls,
        stopped: () => killed,
        onAnswer: (call) => {
          if (isSuccess(call) && (answered += 1) === killAfter) reachedTarget();
        },
      }),
    );
    await target;
    // Kill it while PostgreSQL holds at least one of its transactions open.
    const midTransaction = await waitFor(async () => (await openTransactions(name)) > 0, 5_000);
    server.child.kill('SIGKILL');
    killed = true;
    await server.exited;
    await Promise.all(chains);
    // PostgreSQL rolls back what the dead process left open once it notices the closed sockets.
    expect(await waitFor(async () => (await openTransactions(name)) === 0, 10_000)).toBe(true);

    const counts = countByStatus(calls);
    const inFlight = counts['no-answer'] ?? 0;
    console.info(
      `[durability] SIGKILL after ${answered} answered writes, ${inFlight} in flight, ` +
        `mid-transaction: ${midTransaction}; calls by status ${JSON.stringify(counts)}`,
    );
    expect(midTransaction).toBe(true);
    expect(inFlight).toBeGreaterThan(0);
    // Before the kill every call succeeded; after it none was answered at all.
    expect(Object.keys(counts).sort()).toEqual(['200', '201', 'no-answer']);

    const { versions, committedUnanswered } = await expectAnsweredWritesWhole(estimates, calls);
    console.info(
      `[durability] ${versions} versions of ${LINES_PER_SAVE} manual lines, all whole; ` +
        `${committedUnanswered} in-flight writes had committed before the kill`,
    );
    expect(versions).toBeGreaterThan(0);

    // A new process carries on where the dead one stopped (and serves the next test).
    const restarted = await startServer(`${name}-restarted`);
    running = restarted;
    const stored = await readWholeEstimate(testApp.dataSource, estimates[0]!.id);
    const draft = { ...estimates[0]!.draft.content, notes: 'after the crash' };
    const saved = await fetch(`${restarted.url}/api/estimates/${estimates[0]!.id}/draft`, {
      method: 'PUT',
      headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
      body: JSON.stringify({ ...draft, revision: stored.draft.revision }),
    });
    expect(saved.status).toBe(200);
    const finalised = await fetch(`${restarted.url}/api/estimates/${estimates[0]!.id}/finalise`, {
      method: 'POST',
      headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
      body: JSON.stringify({ revision: stored.draft.revision + 1 }),
    });
    expect(finalised.status).toBe(201);
    const after = (await finalised.json()) as EstimateView;
    expect(after.versions.at(-1)!.versionNumber).toBe(stored.versions.length + 1);
  }, 60_000);

  it('answers 503 quickly while PostgreSQL is stopped mid-burst, loses no answered save and recovers', async () => {
    const { token, estimates } = await estimatesToEdit();
    const server = running ?? (await startServer('durability-db-stop'));
    const calls: BurstCall[] = [];
    let done = false;
    let answered = 0;
    const stopAfter = 40;
    let reachedTarget: () => void;
    const target = new Promise<void>((resolve) => (reachedTarget = resolve));
    const chains = estimates.map((estimate, chain) =>
      runChain({
        baseUrl: () => server.url,
        token,
        estimate,
        chain,
        calls,
        stopped: () => done,
        onAnswer: (call) => {
          if (isSuccess(call) && (answered += 1) === stopAfter) reachedTarget();
        },
      }),
    );
    let upAt = Number.POSITIVE_INFINITY;
    try {
      await target;
      const stoppingAt = Date.now();
      await db('stop');
      const stoppedAt = Date.now();
      await new Promise((resolve) => setTimeout(resolve, 2_000));
      const downCalls = calls.filter(
        (call) => call.startedAt >= stoppedAt && call.status !== 'no-answer',
      );
      expect(downCalls.length).toBeGreaterThan(0);
      expect(downCalls.every((call) => call.status === 503)).toBe(true);
      console.info(
        `[durability] PostgreSQL stopped after ${answered} answered writes (stop took ${stoppedAt - stoppingAt} ms); ` +
          `${downCalls.length} calls while down, all 503`,
      );
      await db('start');
      upAt = Date.now();
      // Every estimator gets on with their work, on the same server process: nothing restarted it.
      const recovered = await waitFor(
        async () =>
          estimates.every((_, chain) =>
            calls.some((call) => call.chain === chain && call.startedAt > upAt && isSuccess(call)),
          ),
        15_000,
      );
      expect(recovered).toBe(true);
    } finally {
      done = true;
      await db('start');
      await Promise.all(chains);
    }
    expect(server.child.exitCode).toBeNull();

    const counts = countByStatus(calls);
    const unavailable = calls.filter((call) => call.status === 503);
    const slowest = Math.max(...unavailable.map((call) => call.ms));
    console.info(
      `[durability] calls by status ${JSON.stringify(counts)}; slowest 503 took ${slowest} ms`,
    );
    // 503 for the outage and 409 only for a save whose 503 had in fact committed; never a 500 or a hang.
    expect(
      Object.keys(counts).every((status) => ['200', '201', '409', '503'].includes(status)),
      `the end of the server's log:\n${server.output().slice(-4000)}`,
    ).toBe(true);
    expect(unavailable.length).toBeGreaterThan(0);
    expect(slowest).toBeLessThan(5_000);
    for (const [index, call] of calls.entries()) {
      if (call.status !== 409) continue;
      expect(call.code).toBe('STALE_DRAFT');
      const before = calls.slice(0, index).filter((earlier) => earlier.chain === call.chain);
      expect(before.at(-1)?.status).toBe(503);
    }
    expect(calls.filter((call) => call.startedAt > upAt && call.status === 503)).toEqual([]);

    const { versions, committedUnanswered } = await expectAnsweredWritesWhole(estimates, calls);
    console.info(
      `[durability] ${versions} versions, all whole; ${committedUnanswered} writes answered 503 had committed`,
    );
    const ready = await fetch(`${server.url}/api/health/ready`);
    expect(ready.status).toBe(200);
  }, 60_000);
});
