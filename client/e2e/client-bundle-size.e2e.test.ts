import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  bundledSources,
  clientBudgets,
  kb,
  LAZY_ONLY,
  STAFF_APP_BUDGET_BYTES,
} from '../../scripts/lib/bundle-size.mjs';

// The built client (`npm test` builds it before this suite); the same figures as `npm run size`.
const distDir = fileURLToPath(new URL('../dist', import.meta.url));

const listed = (rows: Array<{ file: string; gzip: number }>) =>
  rows.map((row) => `${row.file} ${kb(row.gzip)}`).join(', ');

describe('the staff app’s bundle', () => {
  it('loads at most 350 KB of gzipped JavaScript up front (entry and modulepreloads)', () => {
    const { staff } = clientBudgets(distDir);
    expect(staff.js.rows.length).toBeGreaterThan(0);
    expect(
      staff.js.gzip,
      `staff app JavaScript is ${kb(staff.js.gzip)} gzipped: ${listed(staff.js.rows)}`,
    ).toBeLessThanOrEqual(STAFF_APP_BUDGET_BYTES);
  });

  it('loads the charts, the takeoff workspace and the engine only with their lazy routes', () => {
    const { staff, lazy } = clientBudgets(distDir);
    expect(lazy.filter((check) => !check.pass)).toEqual([]);
    // Each pattern does find its screen in the lazy chunks, so a renamed folder cannot pass unseen.
    const lazySources = bundledSources(
      distDir,
      staff.dynamicJs.rows.map((row) => row.file),
    );
    for (const { name, pattern } of LAZY_ONLY) {
      expect(
        lazySources.some((source) => pattern.test(source)),
        name,
      ).toBe(true);
    }
  });
});

describe('the homeowner’s quote page bundle against the staff app’s', () => {
  // Met with a quote page built without Mantine (plain React and CSS) whose forms, payment step,
  // drawings and answered states load in chunks of their own (client/src/quote-page/ui/deferred.tsx).
  // React DOM, TanStack Query and decimal.js alone are about 90 KB gzipped, so the margin is small:
  // a few hundred bytes more up front on the quote page fail this.
  it('loads at most half the JavaScript the staff app loads up front', () => {
    const { checks, quote } = clientBudgets(distDir);
    const ratio = checks.find((check) => check.name === 'quote page against the staff app')!;
    expect(
      ratio.pass,
      `quote page ${kb(ratio.bytes)}, goal ${ratio.goal}: ${listed(quote.js.rows)}`,
    ).toBe(true);
  });
});
