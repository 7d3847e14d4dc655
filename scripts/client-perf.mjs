// npm run bench:client — the homeowner's quote page in the browser, each figure beside its goal:
//  1. Core Web Vitals in headless Chromium on loopback with the CPU slowed down 4× (CDP
//     Emulation.setCPUThrottlingRate): largest contentful paint and cumulative layout shift, read with
//     PerformanceObservers, median of 5 cold loads (a fresh browser context each, after one warm-up).
//  2. Lighthouse 12 (its default mobile run: simulated slow 4G and 4× CPU) on the same page:
//     performance and accessibility scores, median of 3 runs; reports in client/test-results/lighthouse.
// It sets up what `npm run e2e` does (builds, the test database, the app and its fakes on E2E_PORT) and
// sends a demo quote through the API. `--no-build` reuses the current builds; `--runs N` and
// `--lighthouse-runs N` change the counts, `--cpu N` the slowdown of the web-vitals loads. Exits 1
// when a goal is missed. Timings follow the machine's load: other work on it inflates them.
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { chromium } from 'playwright-core';
import {
  buildClient,
  buildServer,
  buildShared,
  ensureChromium,
  ensureDependencies,
  log,
  repoRoot,
  startDatabase,
  withEndToEndServer,
} from './lib/setup.mjs';
import { sentQuoteLink } from './lib/sent-quote.mjs';

const GOALS = { lcpMs: 1200, cls: 0.05, performance: 90, accessibility: 95 };
const CHROMIUM = '/usr/bin/chromium';
const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];
const reportDir = join(repoRoot, 'client/test-results/lighthouse');

function option(name, fallback) {
  const at = process.argv.indexOf(name);
  return at >= 0 ? Number(process.argv[at + 1]) : fallback;
}
const loads = option('--runs', 5);
const lighthouseRuns = option('--lighthouse-runs', 3);
const CPU_SLOWDOWN = option('--cpu', 4);

const median = (values) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};
const verdict = (pass) => (pass ? 'PASS' : 'FAIL');

/**
 * Runs in the page before its own scripts: records every LCP candidate and every layout shift not
 * caused by input, as the web-vitals library does.
 */
function observeVitals() {
  const describe = (node) => {
    if (!node) return '(removed)';
    const text = node.textContent?.trim().slice(0, 40) ?? '';
    return `<${node.tagName.toLowerCase()}${node.id ? `#${node.id}` : ''}> ${text}`;
  };
  const vitals = { lcp: [], shifts: [] };
  globalThis.__vitals = vitals;
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries())
      vitals.lcp.push({
        startTime: entry.startTime,
        size: entry.size,
        element: describe(entry.element),
      });
  }).observe({ type: 'largest-contentful-paint', buffered: true });
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries()) {
      if (entry.hadRecentInput) continue;
      vitals.shifts.push({
        startTime: entry.startTime,
        value: entry.value,
        sources: (entry.sources ?? []).map((source) => describe(source.node)),
      });
    }
  }).observe({ type: 'layout-shift', buffered: true });
}

/** CLS as Chrome defines it: the largest session window (gaps under 1 s, at most 5 s long). */
function cumulativeLayoutShift(shifts) {
  let largest = 0;
  let session = null;
  for (const shift of shifts) {
    if (
      session &&
      shift.startTime - session.last < 1000 &&
      shift.startTime - session.first < 5000
    ) {
      session.value += shift.value;
      session.last = shift.startTime;
    } else {
      session = { first: shift.startTime, last: shift.startTime, value: shift.value };
    }
    largest = Math.max(largest, session.value);
  }
  return largest;
}

/** One cold load of `url` on a phone-sized page with the CPU slowed down: its LCP and CLS. */
async function measureLoad(browser, url) {
  const context = await browser.newContext({
    viewport: { width: 390, height: 844 },
    deviceScaleFactor: 2,
    isMobile: true,
    hasTouch: true,
  });
  try {
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN });
    await page.addInitScript(observeVitals);
    await page.goto(url, { waitUntil: 'networkidle' });
    await page.locator('main h1').first().waitFor();
    // Late shifts (fonts, images) and the last LCP candidate; nothing on the page is touched.
    await page.waitForTimeout(1500);
    const vitals = await page.evaluate(() => globalThis.__vitals);
    const last = vitals.lcp.at(-1);
    return {
      lcpMs: last?.startTime ?? Number.NaN,
      lcpElement: last?.element ?? '(none)',
      cls: cumulativeLayoutShift(vitals.shifts),
      shifts: vitals.shifts,
    };
  } finally {
    await context.close();
  }
}

async function webVitals(url) {
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_FLAGS,
  });
  try {
    await measureLoad(browser, url); // warm-up: the server's first answers are slower
    const results = [];
    for (let run = 1; run <= loads; run += 1) {
      const result = await measureLoad(browser, url);
      results.push(result);
      console.log(
        `  load ${run}: LCP ${result.lcpMs.toFixed(0)} ms (${result.lcpElement}), CLS ${result.cls.toFixed(3)}`,
      );
      for (const shift of result.shifts)
        console.log(
          `      shift ${shift.value.toFixed(4)} at ${shift.startTime.toFixed(0)} ms: ${shift.sources.join('; ')}`,
        );
    }
    return {
      lcpMs: median(results.map((r) => r.lcpMs)),
      cls: median(results.map((r) => r.cls)),
    };
  } finally {
    await browser.close();
  }
}

/** One Lighthouse run against a Chromium it starts itself; retried when Chromium's trace comes back broken. */
async function lighthouseRun(url, attempts = 3) {
  for (let attempt = 1; ; attempt += 1) {
    const chrome = await chromeLauncher.launch({
      chromePath: CHROMIUM,
      chromeFlags: ['--headless=new', ...CHROMIUM_FLAGS],
    });
    try {
      const result = await lighthouse(url, {
        port: chrome.port,
        output: ['json', 'html'],
        logLevel: 'error',
        onlyCategories: ['performance', 'accessibility'],
      });
      if (!result) throw new Error('Lighthouse returned no result');
      if (!result.lhr.runtimeError) return result;
      if (attempt >= attempts) throw new Error(`Lighthouse: ${result.lhr.runtimeError.message}`);
      log(`Lighthouse: ${result.lhr.runtimeError.code}, running again`);
    } finally {
      await chrome.kill();
    }
  }
}

/** Lighthouse's default (mobile) run, `lighthouseRuns` times: the median scores. */
async function lighthouseScores(url) {
  mkdirSync(reportDir, { recursive: true });
  const runs = [];
  for (let run = 1; run <= lighthouseRuns; run += 1) {
    const { lhr, report } = await lighthouseRun(url);
    writeFileSync(join(reportDir, `quote-page-${run}.json`), report[0]);
    writeFileSync(join(reportDir, `quote-page-${run}.html`), report[1]);
    const score = (id) => Math.round((lhr.categories[id].score ?? 0) * 100);
    const metric = (id) => lhr.audits[id]?.displayValue ?? '?';
    runs.push({ performance: score('performance'), accessibility: score('accessibility'), lhr });
    console.log(
      `  run ${run}: performance ${score('performance')}, accessibility ${score('accessibility')}` +
        ` (FCP ${metric('first-contentful-paint')}, LCP ${metric('largest-contentful-paint')},` +
        ` TBT ${metric('total-blocking-time')}, CLS ${metric('cumulative-layout-shift')},` +
        ` SI ${metric('speed-index')})`,
    );
  }
  const performance = median(runs.map((r) => r.performance));
  const accessibility = median(runs.map((r) => r.accessibility));
  reportFindings(runs.find((r) => r.performance === performance)?.lhr ?? runs[0].lhr);
  return { performance, accessibility };
}

/** What Lighthouse would fix: failed accessibility audits and performance opportunities. */
function reportFindings(lhr) {
  const failing = (category) =>
    lhr.categories[category].auditRefs
      .map((ref) => lhr.audits[ref.id])
      .filter(
        (audit) =>
          audit.score !== null &&
          audit.score < 0.9 &&
          !['notApplicable', 'informative', 'manual'].includes(audit.scoreDisplayMode),
      );
  for (const category of ['performance', 'accessibility']) {
    const audits = failing(category);
    if (audits.length === 0) continue;
    console.log(`  Lighthouse ${category} findings:`);
    for (const audit of audits)
      console.log(
        `    - ${audit.id}: ${audit.title}${audit.displayValue ? ` (${audit.displayValue})` : ''}`,
      );
  }
}

ensureDependencies();
startDatabase();
if (!process.argv.includes('--no-build')) {
  buildShared();
  buildServer();
  buildClient();
}
if (!ensureChromium()) process.exit(1);

const ok = await withEndToEndServer(async (env) => {
  const url = await sentQuoteLink({
    baseUrl: env.E2E_BASE_URL,
    mailboxUrl: env.MAILBOX_URL,
    title: `Performance check ${Date.now().toString(36)}`,
  });
  log(`quote page: ${url}`);

  console.log(
    `\nQuote page, ${loads} cold loads on a phone-sized page, CPU ${CPU_SLOWDOWN === 1 ? 'at full speed' : `${CPU_SLOWDOWN}× slower`}`,
  );
  const vitals = await webVitals(url);
  console.log(`\nLighthouse ${lighthouseRuns}× (mobile: simulated slow 4G, 4× CPU)`);
  const scores = await lighthouseScores(url);

  const rows = [
    [
      'LCP, median',
      `${vitals.lcpMs.toFixed(0)} ms`,
      `≤ ${GOALS.lcpMs} ms`,
      vitals.lcpMs <= GOALS.lcpMs,
    ],
    ['CLS, median', vitals.cls.toFixed(3), `≤ ${GOALS.cls}`, vitals.cls <= GOALS.cls],
    [
      'Lighthouse performance',
      String(scores.performance),
      `≥ ${GOALS.performance}`,
      scores.performance >= GOALS.performance,
    ],
    [
      'Lighthouse accessibility',
      String(scores.accessibility),
      `≥ ${GOALS.accessibility}`,
      scores.accessibility >= GOALS.accessibility,
    ],
  ];
  console.log('\nQuote page performance');
  for (const [name, figure, goal, pass] of rows)
    console.log(
      `  ${name.padEnd(26)} ${figure.padStart(8)}  goal ${goal.padEnd(10)} ${verdict(pass)}`,
    );
  console.log(`  (Lighthouse reports: ${reportDir})`);
  return rows.every(([, , , pass]) => pass);
});
process.exit(ok ? 0 : 1);
