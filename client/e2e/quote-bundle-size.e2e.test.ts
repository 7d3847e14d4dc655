import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  bundledSources,
  entryFiles,
  entryReport,
  kb,
  QUOTE_PAGE_BUDGET_BYTES,
  readManifest,
} from '../../scripts/lib/bundle-size.mjs';

// The built client (`npm test` builds it before this suite); the same figures as `npm run size:quote`.
const distDir = fileURLToPath(new URL('../dist', import.meta.url));

describe('the homeowner’s quote page bundle', () => {
  it('loads less than 150 KB of gzipped JavaScript up front', () => {
    const report = entryReport(distDir, 'quote.html');
    expect(report.js.rows.length).toBeGreaterThan(0);
    expect(
      report.js.gzip,
      `quote page JavaScript is ${kb(report.js.gzip)} gzipped: ${report.js.rows
        .map((row) => `${row.file} ${kb(row.gzip)}`)
        .join(', ')}`,
    ).toBeLessThan(QUOTE_PAGE_BUDGET_BYTES);
  });

  it('leaves out the takeoff engine, zod and the staff app', () => {
    const files = entryFiles(readManifest(distDir), 'quote.html');
    const sources = bundledSources(distDir, [...files.js, ...files.dynamicJs]);
    expect(sources.some((source) => source.includes('src/quote-page/'))).toBe(true);
    // The drawings arrive as data: only the small projection helper of shared/drawings may come along.
    const unwanted = sources.filter((source) =>
      /shared\/src\/(engine\/|drawings\/(?!projection\.ts))|node_modules\/zod\/|src\/(features|lib)\/|react-router/.test(
        source,
      ),
    );
    expect(unwanted).toEqual([]);
  });
});
