// npm start: everything from a fresh clone to a running Pondwright on http://127.0.0.1:3000.
import { createRequire } from 'node:module';
import {
  buildClient,
  buildServer,
  buildShared,
  databaseEnv,
  databaseIsRunning,
  ensureDependencies,
  log,
  migrateAndSeed,
  run,
  startDatabase,
  startServer,
  stopProcess,
} from './lib/setup.mjs';

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';

async function main() {
  ensureDependencies();
  const databaseWasRunning = databaseIsRunning();
  startDatabase();
  buildShared();
  buildServer();
  migrateAndSeed(databaseEnv().DB_NAME);
  buildClient();

  const { DEMO_COMPANY_NAME, DEMO_USERS } = createRequire(import.meta.url)(
    '../server/dist/seed/demo-data.js',
  );
  const { child, url } = await startServer({ port, host, databaseName: databaseEnv().DB_NAME });
  console.log(`
  Pondwright is running at ${url}
    API        ${url}/api   (OpenAPI docs at ${url}/api/docs)
    PostgreSQL 127.0.0.1:${databaseEnv().DB_PORT} (private cluster in .data/postgres)

  Demo sign-ins (company "${DEMO_COMPANY_NAME}"):
${DEMO_USERS.map((person) => `    ${person.role.padEnd(10)} ${person.email.padEnd(30)} ${person.password}`).join('\n')}

  Press Ctrl-C to stop.
`);

  let stopping = false;
  const shutdown = async () => {
    if (stopping) return;
    stopping = true;
    log('stopping...');
    await stopProcess(child);
    if (!databaseWasRunning)
      run('bash', ['scripts/db.sh', 'stop'], { env: { ...process.env, ...databaseEnv() } });
    process.exit(0);
  };
  process.on('SIGINT', shutdown);
  process.on('SIGTERM', shutdown);
  child.on('exit', (code) => {
    if (!stopping) {
      log(`the server stopped (exit code ${code})`);
      process.exit(code ?? 1);
    }
  });
}

main().catch((error) => {
  console.error(`[pondwright] start failed: ${error.message}`);
  process.exit(1);
});
