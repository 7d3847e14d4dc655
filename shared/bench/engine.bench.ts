// Times the takeoff engine: median milliseconds per takeoff for a typical pond and for a large
// feature (three freeform basins of 200 points, 20 lighting runs). Run with `npm run bench:engine`.
import { computeFullTakeoff as computeTakeoff } from '../src/engine/testing/full-engine';
import { largeFeature, typicalPond } from '../src/engine/fixtures/sample-inputs';

type Case = { name: string; input: unknown; warmup: number; runs: number; goalMs: number };

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

export function runEngineBench(): Array<{ name: string; medianMs: number; goalMs: number }> {
  const cases: Case[] = [
    { name: 'typical pond', input: typicalPond(), warmup: 200, runs: 2000, goalMs: 1 },
    {
      name: 'three 200-point basins, 20 lighting runs',
      input: largeFeature(200),
      warmup: 10,
      runs: 100,
      goalMs: 20,
    },
  ];
  const results = [];
  for (const c of cases) {
    const first = computeTakeoff(c.input);
    if (!first.ok) throw new Error(`${c.name}: invalid input ${JSON.stringify(first.errors)}`);
    for (let i = 0; i < c.warmup; i++) computeTakeoff(c.input);
    const times: number[] = [];
    for (let i = 0; i < c.runs; i++) {
      const start = performance.now();
      computeTakeoff(c.input);
      times.push(performance.now() - start);
    }
    results.push({ name: c.name, medianMs: median(times), goalMs: c.goalMs });
  }
  return results;
}
