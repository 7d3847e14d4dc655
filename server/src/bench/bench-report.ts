import type { RoundsFigures } from './alternate-rounds';
import { failedRequests, type LoadFigures } from './load-runner';

export type RouteRow = {
  label: string;
  connections: number;
  baseline: RoundsFigures;
  real: RoundsFigures;
};

/** One goal of the issue, with the figure measured against it. */
export type Goal = { subject: string; goal: string; actual: string; pass: boolean };

/**
 * The figures table: each route's baseline and real server side by side, medians of the rounds.
 * Latencies in ms; CPU is the server process's CPU time per response in ms (PostgreSQL's not counted).
 */
export function routeTable(rows: RouteRow[]): string[] {
  const header = [
    'route'.padEnd(32),
    'conns',
    ' | baseline req/s',
    '   p50',
    '   p99',
    '  CPU',
    ' | real req/s',
    '   p50',
    '   p95',
    '   p99',
    '  CPU',
    ' | real/base',
    ' | failed',
  ].join('');
  const lines = [header, '-'.repeat(header.length)];
  for (const row of rows) {
    lines.push(
      [
        row.label.padEnd(32),
        String(row.connections).padStart(5),
        ` | ${rate(row.baseline.requestsPerSecond).padStart(14)}`,
        ms(row.baseline.p50Ms),
        ms(row.baseline.p99Ms),
        cpu(row.baseline.cpuMsPerRequest),
        ` | ${rate(row.real.requestsPerSecond).padStart(10)}`,
        ms(row.real.p50Ms),
        ms(row.real.p95Ms),
        ms(row.real.p99Ms),
        cpu(row.real.cpuMsPerRequest),
        ` | ${percent(row.real.requestsPerSecond / row.baseline.requestsPerSecond).padStart(9)}`,
        ` | ${failedRequests(row.real)}/${row.real.responses}`,
      ].join(''),
    );
  }
  return lines;
}

export function goalLines(goals: Goal[]): string[] {
  const width = Math.max(...goals.map((goal) => goal.subject.length));
  return goals.map(
    (goal) =>
      `${goal.subject.padEnd(width)}  ${goal.goal.padEnd(34)} ${goal.actual.padEnd(26)} ${goal.pass ? 'PASS' : 'FAIL'}`,
  );
}

/** The read goals: at least half the baseline's throughput, and p99 within 100 ms. */
export function readGoals(row: RouteRow): Goal[] {
  const ratio = row.real.requestsPerSecond / row.baseline.requestsPerSecond;
  return [
    {
      subject: row.label,
      goal: 'req/s ≥ 50 % of baseline',
      actual: `${percent(ratio)} (${rate(row.real.requestsPerSecond)}/s)`,
      pass: ratio >= 0.5,
    },
    {
      subject: row.label,
      goal: 'p99 ≤ 100 ms',
      actual: `${row.real.p99Ms.toFixed(1)} ms`,
      pass: row.real.p99Ms <= 100,
    },
  ];
}

export function describeStatuses(figures: LoadFigures): string {
  const statuses = Object.entries(figures.statuses)
    .map(([status, count]) => `${status}×${count}`)
    .join(', ');
  return figures.socketErrors ? `${statuses}, no answer×${figures.socketErrors}` : statuses;
}

export function rate(value: number): string {
  return value.toFixed(value >= 100 ? 0 : 1);
}

export function percent(fraction: number): string {
  return `${(fraction * 100).toFixed(0)} %`;
}

function cpu(value: number | null): string {
  return (value === null ? '?' : value.toFixed(2)).padStart(6);
}

function ms(value: number): string {
  return value.toFixed(value >= 100 ? 0 : 1).padStart(6);
}
