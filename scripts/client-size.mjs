// npm run size — after `npm run build -w client`: the JavaScript each page of the client loads up front,
// gzipped (level 9), read from Vite's manifest, each figure beside its goal: the staff app (index.html,
// its entry and modulepreloads), the homeowner's quote page (quote.html), and the heavy staff screens
// that must stay behind lazy routes. `--files` lists every file. Exits 1 when a goal is missed.
// `CLIENT_DIST` measures another build folder (default client/dist).
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { clientBudgets, kb, printSizeTable } from './lib/bundle-size.mjs';

const distDir = process.env.CLIENT_DIST
  ? resolve(process.env.CLIENT_DIST)
  : fileURLToPath(new URL('../client/dist', import.meta.url));

let budgets;
try {
  budgets = clientBudgets(distDir);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}

if (process.argv.includes('--files')) {
  printSizeTable('Staff app (index.html), loaded up front:', budgets.staff.js);
  printSizeTable('Quote page (quote.html), loaded up front:', budgets.quote.js);
}

const verdict = (pass) => (pass ? 'PASS' : 'FAIL');
console.log('\nClient JavaScript, gzipped');
for (const check of budgets.checks) {
  console.log(
    `  ${check.name.padEnd(36)} ${kb(check.bytes).padStart(10)}  goal ${check.goal.padEnd(38)} ${verdict(check.pass)}`,
  );
}
console.log(
  `  ${'staff app, lazy chunks'.padEnd(36)} ${kb(budgets.staff.dynamicJs.gzip).padStart(10)}  (for information)`,
);
console.log('\nHeavy staff screens, loaded only with their lazy routes');
for (const check of budgets.lazy) {
  console.log(
    `  ${check.name.padEnd(36)} ${(check.pass ? 'lazy' : 'UP FRONT').padStart(10)}  goal lazy${' '.repeat(34)} ${verdict(check.pass)}`,
  );
  for (const source of check.upFront.slice(0, 5)) console.log(`      ${source}`);
}

const failed = [...budgets.checks, ...budgets.lazy].filter((check) => !check.pass);
console.log(
  failed.length === 0
    ? '\nEvery size goal is met.'
    : `\n${failed.length} size goal${failed.length === 1 ? '' : 's'} missed.`,
);
process.exit(failed.length === 0 ? 0 : 1);
