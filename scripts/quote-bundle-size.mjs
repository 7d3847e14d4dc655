// npm run size:quote — after `npm run build -w client`: what the homeowner's quote page (quote.html)
// loads, gzipped (level 9), per file and in total. Exits 1 when its JavaScript is over the budget.
import { fileURLToPath } from 'node:url';
import {
  entryReport,
  kb,
  printSizeTable as table,
  QUOTE_PAGE_BUDGET_BYTES,
} from './lib/bundle-size.mjs';

const distDir = fileURLToPath(new URL('../client/dist', import.meta.url));

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
