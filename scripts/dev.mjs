// npm run dev: the API (rebuilt and restarted on change) and Vite with hot reload, proxying /api.
import { spawn } from 'node:child_process';
import {
  buildServer,
  buildShared,
  databaseEnv,
  ensureDependencies,
  localJwtSecret,
  log,
  migrateAndSeed,
  repoRoot,
  startDatabase,
} from './lib/setup.mjs';

ensureDependencies();
startDatabase();
buildShared();
buildServer();
migrateAndSeed(databaseEnv().DB_NAME);

const apiPort = process.env.PORT ?? '3000';
const env = {
  ...process.env,
  ...databaseEnv(),
  JWT_SECRET: localJwtSecret(),
  PORT: apiPort,
  PUBLIC_APP_URL: 'http://127.0.0.1:5173',
};
const children = [
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

const stopAll = () => {
  for (const child of children) child.kill('SIGTERM');
  process.exit(0);
};
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);
