// npm run size:quote — after `npm run build -w client`: what the homeowner's quote page (quote.html)
// loads, gzipped (level 9), per file and in total. Exits 1 when its JavaScript is over the budget.
import { fileURLToPath } from 'node:url';
import { entryReport, kb, QUOTE_PAGE_BUDGET_BYTES } from './lib/bundle-size.mjs';

const distDir = fileURLToPath(new URL('../client/dist', import.meta.url));

function table(title, measured) {
  console.log(`\n${title}`);
  if (measured.rows.length === 0) {
    console.log('  (none)');
    return;
  }
  const width = Math.max(...measured.rows.map((row) => row.file.length), 5);
  console.log(`  ${'file'.padEnd(width)}  ${'raw'.padStart(11)}  ${'gzip'.padStart(11)}`);
  for (const row of measured.rows) {
    console.log(
      `  ${row.file.padEnd(width)}  ${kb(row.bytes).padStart(11)}  ${kb(row.gzip).padStart(11)}`,
    );
  }
  console.log(
    `  ${'total'.padEnd(width)}  ${kb(measured.bytes).padStart(11)}  ${kb(measured.gzip).padStart(11)}`,
  );
}

let report;
try {
  report = entryReport(distDir, 'quote.html');
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}

table('JavaScript the quote page loads (entry + static imports):', report.js);
table('Loaded only on demand (dynamic imports):', report.dynamicJs);
table('CSS (for information):', report.css);

const over = report.js.gzip > QUOTE_PAGE_BUDGET_BYTES;
console.log(
  `\nQuote page JavaScript: ${kb(report.js.gzip)} gzipped of a ${kb(QUOTE_PAGE_BUDGET_BYTES)} budget` +
    ` (CSS ${kb(report.css.gzip)} gzipped) — ${over ? 'OVER BUDGET' : 'within budget'}.`,
);
process.exit(over ? 1 : 0);
