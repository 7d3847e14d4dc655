import autocannon, { type AutocannonClient, type AutocannonRequest } from 'autocannon';
import { performance } from 'node:perf_hooks';

/** One timed run against one server: its throughput, its latency percentiles and what went wrong. */
export type LoadFigures = {
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  responses: number;
  /** Responses by status code, e.g. `{ 200: 5120 }`. */
  statuses: Record<string, number>;
  /** Connection errors and timeouts: requests that got no answer at all. */
  socketErrors: number;
};

export type LoadPlan = {
  url: string;
  connections: number;
  seconds: number;
  /** The request sequence of the n-th connection (a "user"); each connection loops over its own. */
  requestsFor: (connection: number) => AutocannonRequest[];
};

/**
 * Runs autocannon with no pipelining (one request in flight per connection, as a browser tab does). The
 * latencies are recorded here from every response rather than read from autocannon's histogram, which
 * has no p95 and counts only 2xx answers.
 */
export async function runLoad(plan: LoadPlan): Promise<LoadFigures> {
  let connection = 0;
  const latencies: number[] = [];
  const instance = autocannon({
    url: plan.url,
    connections: plan.connections,
    pipelining: 1,
    duration: plan.seconds,
    timeout: 30,
    requests: plan.requestsFor(0),
    setupClient: (client: AutocannonClient) => client.setRequests(plan.requestsFor(connection++)),
  });
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => {
    latencies.push(ms);
  });
  const started = performance.now();
  const result = await instance;
  const seconds = (performance.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const statuses = Object.fromEntries(
    Object.entries(result.statusCodeStats).map(([status, { count }]) => [status, count]),
  );
  return {
    requestsPerSecond: latencies.length / seconds,
    p50Ms: percentile(latencies, 0.5),
    p95Ms: percentile(latencies, 0.95),
    p99Ms: percentile(latencies, 0.99),
    responses: latencies.length,
    statuses,
    socketErrors: result.errors,
  };
}

/** The nearest-rank percentile of sorted values (0 when there are none). */
export function percentile(sorted: number[], fraction: number): number {
  if (sorted.length === 0) return 0;
  return sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)]!;
}

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}

/** Non-2xx answers plus requests that got none. */
export function failedRequests(figures: LoadFigures): number {
  const non2xx = Object.entries(figures.statuses)
    .filter(([status]) => !status.startsWith('2'))
    .reduce((sum, [, count]) => sum + count, 0);
  return non2xx + figures.socketErrors;
}
