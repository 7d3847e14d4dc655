// npm test: the same set-up as npm start (against the test database), then typecheck, lint and every
// test of every workspace, ending with one line "N passed, N failed" that totals them.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import {
  buildClient,
  buildServer,
  buildShared,
  databaseEnv,
  ensureChromium,
  ensureDependencies,
  log,
  repoRoot,
  startDatabase,
  tryRun,
  withEndToEndServer,
} from './lib/setup.mjs';

const reportDir = join(repoRoot, '.data/test-reports');
const totals = { passed: 0, failed: 0 };
const outcomes = [];

function record(name, passed, failed) {
  totals.passed += passed;
  totals.failed += failed;
  outcomes.push(`${name}: ${passed} passed, ${failed} failed`);
}

/** A check without a test count (typecheck, lint) counts as one test. */
function check(name, command, args) {
  log(`${name}...`);
  const ok = tryRun(command, args);
  record(name, ok ? 1 : 0, ok ? 0 : 1);
}

/** Runs one workspace's Vitest suite and reads its counts from the JSON report. */
function vitestSuite(name, workspace, extraArgs = [], env = {}) {
  log(`${name}...`);
  const reportFile = join(reportDir, `${name.replace(/\W+/g, '-')}.json`);
  rmSync(reportFile, { force: true });
  const ok = tryRun(
    'npx',
    [
      'vitest',
      'run',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${reportFile}`,
      ...extraArgs,
    ],
    { cwd: join(repoRoot, workspace), env: { ...process.env, ...env } },
  );
  if (!existsSync(reportFile)) {
    record(name, 0, 1);
    return;
  }
  const report = JSON.parse(readFileSync(reportFile, 'utf8'));
  const failed = report.numFailedTests + (ok || report.numFailedTests > 0 ? 0 : 1);
  record(name, report.numPassedTests, failed);
}

async function endToEnd() {
  if (!ensureChromium()) {
    record('end-to-end', 0, 1);
    return;
  }
  try {
    await withEndToEndServer((env) =>
      vitestSuite('end-to-end', 'client', ['--config', 'vitest.e2e.config.ts'], env),
    );
  } catch (error) {
    log(`end-to-end set-up failed: ${error.message}`);
    record('end-to-end', 0, 1);
  }
}

async function main() {
  mkdirSync(reportDir, { recursive: true });
  ensureDependencies();
  startDatabase();
  buildShared();

  check('typecheck', 'npm', ['run', 'typecheck']);
  check('lint', 'npm', ['run', 'lint']);
  vitestSuite('shared', 'shared');
  // Built before its tests: one of them starts the built server to see a weak JWT_SECRET refused.
  buildServer();
  vitestSuite('server', 'server', [], { DB_TEST_NAME: databaseEnv().DB_TEST_NAME });
  vitestSuite('client', 'client');

  buildClient();
  await endToEnd();

  console.log('\n' + outcomes.map((line) => `  ${line}`).join('\n'));
  console.log(`${totals.passed} passed, ${totals.failed} failed`);
  process.exit(totals.failed === 0 && totals.passed > 0 ? 0 : 1);
}

main().catch((error) => {
  console.error(`[pondwright] test set-up failed: ${error.message}`);
  console.log(`${totals.passed} passed, ${totals.failed + 1} failed`);
  process.exit(1);
});
