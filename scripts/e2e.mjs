// `npm run e2e -- [file filters]`: only the browser tests, against freshly built code, with the same
// set-up as `npm test` (handy while working on one journey).
import {
  buildClient,
  buildServer,
  buildShared,
  ensureChromium,
  ensureDependencies,
  repoRoot,
  startDatabase,
  tryRun,
  withEndToEndServer,
} from './lib/setup.mjs';

ensureDependencies();
startDatabase();
buildShared();
buildServer();
buildClient();
if (!ensureChromium()) process.exit(1);
const ok = await withEndToEndServer((env) =>
  tryRun('npx', ['vitest', 'run', '--config', 'vitest.e2e.config.ts', ...process.argv.slice(2)], {
    cwd: `${repoRoot}/client`,
    env: { ...process.env, ...env },
  }),
);
process.exit(ok ? 0 : 1);
