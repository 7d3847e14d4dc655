import { examplePondInput } from '@pondwright/shared/engine';
import { isDeepStrictEqual } from 'node:util';
import { draftBodyFor } from './bench-estimate';
import type { BenchServer } from './bench-processes';
import type { BenchFixture } from './bench-seed';

/**
 * Before timing anything, asks both servers the same questions and compares the JSON: a baseline that
 * answered less would make every ratio flatter than the truth. A save is compared by what it stored
 * (content and computed figures), since the two saves necessarily have different revisions.
 */
export async function compareAnswers(
  baseline: BenchServer,
  real: BenchServer,
  fixture: BenchFixture,
  token: string,
): Promise<string[]> {
  const headers = { authorization: `Bearer ${token}`, 'content-type': 'application/json' };
  const ask = async (server: BenchServer, path: string, init: RequestInit = {}) => {
    const response = await fetch(`${server.url}${path}`, { ...init, headers });
    return { status: response.status, body: (await response.json()) as unknown };
  };
  const both = async (path: string, init?: RequestInit) => [
    await ask(baseline, path, init),
    await ask(real, path, init),
  ];
  const lines: string[] = [];
  const check = (label: string, a: { status: number; body: unknown }, b: typeof a) => {
    const difference =
      a.status !== b.status
        ? `status ${a.status} vs ${b.status}`
        : firstDifference(a.body, b.body, '');
    lines.push(`${label}: ${difference === null ? 'same JSON' : `DIFFERS at ${difference}`}`);
  };

  const [getA, getB] = await both(`/api/estimates/${fixture.readEstimateIds[2]}`);
  check('GET /api/estimates/:id', getA!, getB!);
  const [listA, listB] = await both('/api/estimates?page=1&pageSize=25');
  check('GET /api/estimates', listA!, listB!);
  const takeoff = { method: 'POST', body: JSON.stringify(examplePondInput()) };
  const [takeoffA, takeoffB] = await both('/api/takeoff', takeoff);
  check('POST /api/takeoff', takeoffA!, takeoffB!);
  const [quoteA, quoteB] = await both(`/api/quotes/${fixture.quoteToken}`);
  check('GET /api/quotes/:token', quoteA!, quoteB!);

  const estimate = fixture.writeEstimates[fixture.writeEstimates.length - 1]!;
  const body = draftBodyFor(fixture.content, estimate);
  const path = `/api/estimates/${estimate.id}`;
  const revision = ((await ask(real, path)).body as { draft: { revision: number } }).draft.revision;
  const savedA = await ask(baseline, `${path}/draft`, { method: 'PUT', body: body(revision) });
  const savedB = await ask(real, `${path}/draft`, { method: 'PUT', body: body(revision + 1) });
  const stored = (answer: { status: number; body: unknown }) => {
    const draft = (answer.body as { draft?: { content: unknown; computed: unknown } }).draft;
    return { status: answer.status, body: { content: draft?.content, computed: draft?.computed } };
  };
  check('PUT /api/estimates/:id/draft (stored draft)', stored(savedA), stored(savedB));
  return lines;
}

/** The dotted path of the first place two JSON values differ, or null when they are equal. */
function firstDifference(a: unknown, b: unknown, path: string): string | null {
  if (isDeepStrictEqual(a, b)) return null;
  if (typeof a === 'object' && a !== null && typeof b === 'object' && b !== null) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const key of keys) {
      const inner = firstDifference(
        (a as Record<string, unknown>)[key],
        (b as Record<string, unknown>)[key],
        path ? `${path}.${key}` : key,
      );
      if (inner !== null) return inner;
    }
  }
  return `${path || '(top)'}: ${JSON.stringify(a)?.slice(0, 80)} vs ${JSON.stringify(b)?.slice(0, 80)}`;
}
