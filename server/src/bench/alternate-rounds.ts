import type { AutocannonRequest } from 'autocannon';
import type { BenchOptions } from './bench-options';
import { cpuMs, type BenchServer } from './bench-processes';
import { median, runLoad, type LoadFigures } from './load-runner';

/** One round, with the CPU time the server process spent per response (null when not measurable). */
export type RoundFigures = LoadFigures & { cpuMsPerRequest: number | null };

/** The median of each figure over the rounds, with every round's answers added up. */
export type RoundsFigures = RoundFigures & { rounds: number };

export type RunHooks = {
  /** Before every run, warm-ups included (e.g. read the revisions a save starts from). */
  before?: (server: BenchServer) => Promise<void>;
  /** After every measured round, with its figures (e.g. count what the saves stored). */
  after?: (server: BenchServer, figures: LoadFigures) => Promise<void>;
};

/**
 * A warm-up on each server, then rounds that alternate baseline, real, baseline, real…, so a burst of
 * load from elsewhere on this shared machine lands on both rather than on one. Each figure is the
 * median of its rounds.
 */
export async function alternateRounds(args: {
  baseline: BenchServer;
  real: BenchServer;
  connections: number;
  requestsFor: (connection: number) => AutocannonRequest[];
  options: BenchOptions;
  hooks?: RunHooks;
}): Promise<{ baseline: RoundsFigures; real: RoundsFigures }> {
  const { baseline, real, connections, requestsFor, options, hooks = {} } = args;
  const run = async (server: BenchServer, seconds: number): Promise<RoundFigures> => {
    await hooks.before?.(server);
    const cpuBefore = cpuMs(server.child);
    const figures = await runLoad({ url: server.url, connections, seconds, requestsFor });
    const cpuAfter = cpuMs(server.child);
    const cpuMsPerRequest =
      cpuBefore === null || cpuAfter === null || figures.responses === 0
        ? null
        : (cpuAfter - cpuBefore) / figures.responses;
    return { ...figures, cpuMsPerRequest };
  };
  if (options.warmupSeconds > 0) {
    await run(baseline, options.warmupSeconds);
    await run(real, options.warmupSeconds);
  }
  const rounds = new Map<BenchServer, RoundFigures[]>([
    [baseline, []],
    [real, []],
  ]);
  for (let round = 0; round < options.rounds; round++) {
    for (const server of [baseline, real]) {
      const figures = await run(server, options.roundSeconds);
      await hooks.after?.(server, figures);
      rounds.get(server)!.push(figures);
    }
  }
  return { baseline: medianOf(rounds.get(baseline)!), real: medianOf(rounds.get(real)!) };
}

function medianOf(rounds: RoundFigures[]): RoundsFigures {
  const statuses: Record<string, number> = {};
  for (const round of rounds) {
    for (const [status, count] of Object.entries(round.statuses)) {
      statuses[status] = (statuses[status] ?? 0) + count;
    }
  }
  return {
    requestsPerSecond: median(rounds.map((round) => round.requestsPerSecond)),
    p50Ms: median(rounds.map((round) => round.p50Ms)),
    p95Ms: median(rounds.map((round) => round.p95Ms)),
    p99Ms: median(rounds.map((round) => round.p99Ms)),
    responses: rounds.reduce((sum, round) => sum + round.responses, 0),
    statuses,
    socketErrors: rounds.reduce((sum, round) => sum + round.socketErrors, 0),
    cpuMsPerRequest: rounds.every((round) => round.cpuMsPerRequest !== null)
      ? median(rounds.map((round) => round.cpuMsPerRequest!))
      : null,
    rounds: rounds.length,
  };
}
