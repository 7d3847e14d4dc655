// npm run dev: the API (rebuilt and restarted on change) and Vite with hot reload, proxying /api, with
// the local fake SMTP server and fake payment provider beside them.
import { spawn } from 'node:child_process';
import {
  appWebhookUrl,
  buildServer,
  buildShared,
  databaseEnv,
  ensureDependencies,
  fakePorts,
  localJwtSecret,
  log,
  migrateAndSeed,
  repoRoot,
  startDatabase,
  startFakes,
} from './lib/setup.mjs';

ensureDependencies();
startDatabase();
buildShared();
buildServer();
migrateAndSeed(databaseEnv().DB_NAME);

const apiPort = process.env.PORT ?? '3000';
let fakes;
try {
  fakes = await startFakes({
    ...fakePorts({ smtpPort: 2525, mailboxPort: 2580, paymentsPort: 12111, s3Port: 4569 }),
    webhookUrl: appWebhookUrl(apiPort),
  });
} catch (error) {
  console.error(`[pondwright] dev failed: ${error.message}`);
  process.exit(1);
}
const env = {
  ...process.env,
  ...databaseEnv(),
  JWT_SECRET: localJwtSecret(),
  PORT: apiPort,
  PUBLIC_APP_URL: 'http://127.0.0.1:5173',
  ...fakes.serverEnv,
};
const children = [
  fakes.child,
  spawn('npx', ['tsc', '-p', 'shared/tsconfig.build.json', '--watch', '--preserveWatchOutput'], {
    cwd: repoRoot,
    stdio: 'inherit',
    env,
  }),
  spawn('npx', ['tsc', '-p', 'server/tsconfig.build.json', '--watch', '--preserveWatchOutput'], {
    cwd: repoRoot,
    stdio: 'inherit',
    env,
  }),
  spawn(
    process.execPath,
    ['--watch-path=server/dist', '--watch-path=shared/dist', 'server/dist/main.js'],
    { cwd: repoRoot, stdio: 'inherit', env },
  ),
  spawn('npx', ['vite', '--host', '127.0.0.1', '--port', '5173'], {
    cwd: `${repoRoot}/client`,
    stdio: 'inherit',
    env,
  }),
];
log(`API on http://127.0.0.1:${apiPort}/api, app with hot reload on http://127.0.0.1:5173`);
log(`mailbox on ${fakes.mailboxUrl}/messages, fake checkout on ${fakes.paymentsUrl}/checkout/…`);

const stopAll = () => {
  for (const child of children) child.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);
