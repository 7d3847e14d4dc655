// What one page of the built client loads, and its gzipped size: read from Vite's manifest
// (client/dist/.vite/manifest.json, `build.manifest: true`). Shared by `npm run size:quote`,
// `npm run size` and the e2e checks of the budgets.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

/** The quote page's budget: JavaScript loaded up front, gzipped at level 9. */
export const QUOTE_PAGE_BUDGET_BYTES = 150 * 1024;

/** The staff app's budget: the JavaScript index.html loads up front (entry and modulepreloads), gzipped. */
export const STAFF_APP_BUDGET_BYTES = 350 * 1024;

/** The quote page loads at most this share of what the staff app loads up front. */
export const QUOTE_TO_STAFF_MAX_RATIO = 0.5;

/**
 * Heavy screens of the staff app that must arrive with their lazy routes, never with index.html:
 * matched against the source files bundled into its up-front chunks.
 */
export const LAZY_ONLY = [
  {
    name: 'charts (recharts, @mantine/charts)',
    pattern: /node_modules\/(recharts|@mantine\/charts)\//,
  },
  { name: 'takeoff workspace', pattern: /src\/features\/takeoff\// },
  // The engine's calculations; the daily log shares only its labour task names and unit formatters.
  {
    name: 'takeoff engine',
    pattern:
      /shared\/src\/engine\/(takeoff|liner|excavation|hydraulics|rock|reservoir|basin|geometry|lighting|cautions)\/|node_modules\/clipper-lib\//,
  },
];

/** Gzipped size of a file's bytes, level 9 (what a well-configured server sends). */
export function gzipSize(bytes) {
  return gzipSync(bytes, { level: 9 }).length;
}

export function readManifest(distDir) {
  const path = join(distDir, '.vite', 'manifest.json');
  try {
    return JSON.parse(readFileSync(path, 'utf8'));
  } catch (cause) {
    throw new Error(`No build manifest at ${path}; run \`npm run build -w client\` first.`, {
      cause,
    });
  }
}

/**
 * The files an HTML entry (e.g. "quote.html") loads: its own chunk and its static imports, followed
 * transitively; the dynamic imports they name, and the static closure of those, listed apart (loaded
 * only when the page asks for them); and the CSS of each group.
 */
export function entryFiles(manifest, entryKey) {
  if (!manifest[entryKey]) throw new Error(`The manifest has no entry "${entryKey}"`);
  const staticKeys = new Set();
  const visitStatic = (key) => {
    if (staticKeys.has(key)) return;
    staticKeys.add(key);
    for (const next of manifest[key]?.imports ?? []) visitStatic(next);
  };
  visitStatic(entryKey);

  const dynamicKeys = new Set();
  const visitDynamic = (key) => {
    if (staticKeys.has(key) || dynamicKeys.has(key)) return;
    dynamicKeys.add(key);
    for (const next of manifest[key]?.imports ?? []) visitDynamic(next);
    for (const next of manifest[key]?.dynamicImports ?? []) visitDynamic(next);
  };
  for (const key of staticKeys)
    for (const next of manifest[key]?.dynamicImports ?? []) visitDynamic(next);

  const filesOf = (keys) =>
    [...keys].map((key) => manifest[key].file).filter((f) => f.endsWith('.js'));
  const cssOf = (keys) => [...new Set([...keys].flatMap((key) => manifest[key].css ?? []))];
  return {
    js: filesOf(staticKeys),
    css: cssOf(staticKeys),
    dynamicJs: filesOf(dynamicKeys),
    dynamicCss: cssOf(dynamicKeys).filter((file) => !cssOf(staticKeys).includes(file)),
  };
}

/** Sizes (raw and gzipped) of each file, largest gzipped first, and their totals. */
export function measure(distDir, files) {
  const rows = files
    .map((file) => {
      const bytes = readFileSync(join(distDir, file));
      return { file, bytes: bytes.length, gzip: gzipSize(bytes) };
    })
    .sort((a, b) => b.gzip - a.gzip);
  return {
    rows,
    bytes: rows.reduce((sum, row) => sum + row.bytes, 0),
    gzip: rows.reduce((sum, row) => sum + row.gzip, 0),
  };
}

/** Everything about one entry: its up-front JavaScript and CSS, and what it may load later. */
export function entryReport(distDir, entryKey) {
  const manifest = readManifest(distDir);
  const files = entryFiles(manifest, entryKey);
  return {
    entry: entryKey,
    js: measure(distDir, files.js),
    css: measure(distDir, files.css),
    dynamicJs: measure(distDir, files.dynamicJs),
    dynamicCss: measure(distDir, files.dynamicCss),
  };
}

/**
 * The source modules bundled into `files`, read from their source maps (the build writes them), so a
 * check can say which modules a page pulls in. Files without a map contribute nothing.
 */
export function bundledSources(distDir, files) {
  const sources = new Set();
  for (const file of files) {
    let map;
    try {
      map = JSON.parse(readFileSync(join(distDir, `${file}.map`), 'utf8'));
    } catch {
      continue;
    }
    for (const source of map.sources ?? []) sources.add(source);
  }
  return [...sources];
}

/**
 * The client's size goals, measured on a build: each with its figure, its goal and whether it is met.
 * Sizes in bytes, gzipped; `lazy` checks list the up-front sources that should not be there.
 */
export function clientBudgets(distDir) {
  const staff = entryReport(distDir, 'index.html');
  const quote = entryReport(distDir, 'quote.html');
  const staffSources = bundledSources(
    distDir,
    staff.js.rows.map((row) => row.file),
  );
  const halfOfStaff = Math.floor(staff.js.gzip * QUOTE_TO_STAFF_MAX_RATIO);
  return {
    staff,
    quote,
    checks: [
      {
        name: 'staff app (index.html), up front',
        bytes: staff.js.gzip,
        goalBytes: STAFF_APP_BUDGET_BYTES,
        goal: `≤ ${kb(STAFF_APP_BUDGET_BYTES)}`,
        pass: staff.js.gzip <= STAFF_APP_BUDGET_BYTES,
      },
      {
        name: 'quote page (quote.html), up front',
        bytes: quote.js.gzip,
        goalBytes: QUOTE_PAGE_BUDGET_BYTES,
        goal: `≤ ${kb(QUOTE_PAGE_BUDGET_BYTES)}`,
        pass: quote.js.gzip <= QUOTE_PAGE_BUDGET_BYTES,
      },
      {
        name: 'quote page against the staff app',
        bytes: quote.js.gzip,
        goalBytes: halfOfStaff,
        goal: `≤ ${kb(halfOfStaff)} (half the staff app's)`,
        pass: quote.js.gzip <= halfOfStaff,
      },
    ],
    lazy: LAZY_ONLY.map(({ name, pattern }) => {
      const upFront = staffSources.filter((source) => pattern.test(source));
      return { name, upFront, pass: upFront.length === 0 };
    }),
  };
}

/** Prints measured files as a table (file, raw, gzipped) with their total. */
export function printSizeTable(title, measured) {
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

export const kb = (bytes) => `${(bytes / 1024).toFixed(2)} KB`;
