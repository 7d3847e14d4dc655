import type { AutocannonRequest } from 'autocannon';
import type { DataSource } from 'typeorm';
import { cpuMs, rssMb, type BenchServer } from './bench-processes';
import {
  benchUser,
  counted,
  estimateRequest,
  headersOf,
  listRequest,
  quoteRequest,
  saveRequest,
  takeoffRequest,
  type BenchUser,
  type Session,
} from './bench-routes';
import type { BenchEstimateRef, BenchFixture } from './bench-seed';
import { median, runLoad, type LoadFigures } from './load-runner';
import { SaveLedger, type SaveCount } from './save-ledger';

export const MIXED_USERS = 50;
/** The mixed users save estimates of their own, apart from the ones the save bench uses. */
const FIRST_MIXED_ESTIMATE = 100;
const RSS_SAMPLE_MS = 5_000;
/** Access tokens live 15 minutes at most: a long run signs in again well before. */
const SIGN_IN_AGAIN_MS = 10 * 60_000;

export type MixedFigures = {
  load: LoadFigures;
  minutes: number;
  /** `kind status` → count, for the answers that were not 2xx. */
  failures: Array<[string, number]>;
  rssStartMb: number | null;
  rssEndMb: number | null;
  rssMaxMb: number | null;
  /**
   * The median of the samples in the first and in the last fifth of the run. A single sample swings by
   * a third as V8 grows and gives back its young generation, so these show a trend better.
   */
  rssFirstFifthMb: number | null;
  rssLastFifthMb: number | null;
  /** The server process's CPU over the run, in % of one core (Node.js runs JavaScript on one). */
  serverCpuPct: number | null;
  saves: SaveCount;
};

/**
 * Fifty estimators at once, each looping over a working session: the list, their own estimate, a takeoff,
 * a save of that estimate, another estimate, and the homeowner's quote. Each saves only its own
 * estimate, so a 409 would be a fault, not a race the load made. RSS is sampled after a warm-up and at
 * the end, and every five seconds between.
 */
export async function mixedLoad(args: {
  real: BenchServer;
  fixture: BenchFixture;
  session: Session;
  signIn: () => Promise<string>;
  dataSource: DataSource;
  minutes: number;
  warmupSeconds: number;
}): Promise<MixedFigures> {
  const { real, fixture, session } = args;
  const own = fixture.writeEstimates.slice(
    FIRST_MIXED_ESTIMATE,
    FIRST_MIXED_ESTIMATE + MIXED_USERS,
  );
  const ledger = new SaveLedger(args.dataSource, own);
  const tally = new Map<string, number>();
  const requestsFor = (index: number): AutocannonRequest[] => {
    const estimate = own[index % own.length]!;
    const user = benchUser(session, index);
    return [
      counted('list', listRequest(user), tally),
      counted('get', ownEstimate(estimate, user), tally),
      counted('takeoff', takeoffRequest(user), tally),
      counted('save', saveRequest(fixture, estimate, user, ledger.revisions), tally),
      counted('get', estimateRequest(fixture, user), tally),
      counted('quote', quoteRequest(fixture, user), tally),
    ];
  };

  if (args.warmupSeconds > 0) {
    await ledger.open();
    await runLoad({
      url: real.url,
      connections: MIXED_USERS,
      seconds: args.warmupSeconds,
      requestsFor,
    });
  }
  tally.clear();
  await ledger.open();
  const rssStartMb = rssMb(real.child);
  const samples: number[] = rssStartMb === null ? [] : [rssStartMb];
  const sampler = setInterval(() => {
    const now = rssMb(real.child);
    if (now !== null) samples.push(now);
  }, RSS_SAMPLE_MS);
  const renew = setInterval(() => {
    args.signIn().then(
      (token) => (session.token = token),
      (error: unknown) => console.error('[bench] signing in again failed:', error),
    );
  }, SIGN_IN_AGAIN_MS);
  const cpuBefore = cpuMs(real.child);
  const started = Date.now();
  try {
    const load = await runLoad({
      url: real.url,
      connections: MIXED_USERS,
      seconds: args.minutes * 60,
      requestsFor,
    });
    const rssEndMb = rssMb(real.child);
    if (rssEndMb !== null) samples.push(rssEndMb);
    const fifth = Math.max(1, Math.floor(samples.length / 5));
    const cpuAfter = cpuMs(real.child);
    const serverCpuPct =
      cpuBefore === null || cpuAfter === null
        ? null
        : ((cpuAfter - cpuBefore) / (Date.now() - started)) * 100;
    const failures = [...tally].filter(([key]) => !/ 2\d\d$/.test(key));
    const saved = [...tally]
      .filter(([key]) => key === 'save 200')
      .reduce((sum, [, n]) => sum + n, 0);
    return {
      load,
      minutes: args.minutes,
      failures,
      rssStartMb,
      rssEndMb,
      rssMaxMb: samples.length ? Math.max(...samples) : null,
      rssFirstFifthMb: samples.length ? median(samples.slice(0, fifth)) : null,
      rssLastFifthMb: samples.length ? median(samples.slice(-fifth)) : null,
      serverCpuPct,
      saves: await ledger.close(saved),
    };
  } finally {
    clearInterval(sampler);
    clearInterval(renew);
  }
}

function ownEstimate(estimate: BenchEstimateRef, user: BenchUser): AutocannonRequest {
  return {
    method: 'GET',
    path: `/api/estimates/${estimate.id}`,
    setupRequest: (request) => ({ ...request, headers: headersOf(user) }),
  };
}
