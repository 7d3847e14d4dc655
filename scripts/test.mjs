// npm test: the same set-up as npm start (against the test database), then typecheck, lint and every
// test of every workspace, ending with one line "N passed, N failed" that totals them.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import {
  appWebhookUrl,
  buildClient,
  buildServer,
  buildShared,
  databaseEnv,
  ensureChromium,
  ensureDependencies,
  fakePorts,
  log,
  migrateAndSeed,
  repoRoot,
  startDatabase,
  startFakes,
  startServer,
  stopProcess,
  tryRun,
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
  const testDatabase = databaseEnv().DB_TEST_NAME;
  migrateAndSeed(testDatabase);
  const port = Number(process.env.E2E_PORT ?? 3100);
  let server;
  let fakes;
  const stopAll = async () => {
    await stopProcess(server?.child);
    await fakes?.stop();
  };
  // Stopped with the run: the fakes and the server must not outlive an interrupted test.
  const onSignal = () => stopAll().then(() => process.exit(130));
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);
  try {
    // Ports apart from `npm start`'s, so the tests can run while the app is up.
    fakes = await startFakes({
      ...fakePorts({ smtpPort: 2526, mailboxPort: 2581, paymentsPort: 12112, s3Port: 4570 }),
      webhookUrl: appWebhookUrl(port),
      quiet: true,
    });
    server = await startServer({
      port,
      databaseName: testDatabase,
      quiet: true,
      extraEnv: {
        LOG_LEVEL: 'warn',
        PUBLIC_APP_URL: `http://127.0.0.1:${port}`,
        ...fakes.serverEnv,
      },
    });
    vitestSuite('end-to-end', 'client', ['--config', 'vitest.e2e.config.ts'], {
      E2E_BASE_URL: server.url,
      MAILBOX_URL: fakes.mailboxUrl,
      FAKE_PAYMENTS_URL: fakes.paymentsUrl,
    });
  } catch (error) {
    log(`end-to-end set-up failed: ${error.message}`);
    record('end-to-end', 0, 1);
  } finally {
    await stopAll();
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
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
  vitestSuite('server', 'server', [], { DB_TEST_NAME: databaseEnv().DB_TEST_NAME });
  vitestSuite('client', 'client');

  buildServer();
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
