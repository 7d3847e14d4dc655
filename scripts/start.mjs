// npm start: everything from a fresh clone to a running Pondwright on http://127.0.0.1:3000, with the
// local fake SMTP server and fake payment provider beside it.
import { createRequire } from 'node:module';
import {
  appWebhookUrl,
  buildClient,
  buildServer,
  buildShared,
  databaseEnv,
  databaseIsRunning,
  ensureDependencies,
  fakePorts,
  log,
  migrateAndSeed,
  run,
  startDatabase,
  startFakes,
  startServer,
  stopProcess,
} from './lib/setup.mjs';

const port = Number(process.env.PORT ?? 3000);
const host = process.env.HOST ?? '127.0.0.1';
let fakes;

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
  const ports = fakePorts({ smtpPort: 2525, mailboxPort: 2580, paymentsPort: 12111, s3Port: 4569 });
  fakes = await startFakes({ ...ports, webhookUrl: appWebhookUrl(port, host) });
  const { child, url } = await startServer({
    port,
    host,
    databaseName: databaseEnv().DB_NAME,
    extraEnv: fakes.serverEnv,
  });
  console.log(`
  Pondwright is running at ${url}
    API        ${url}/api   (OpenAPI docs at ${url}/api/docs)
    PostgreSQL 127.0.0.1:${databaseEnv().DB_PORT} (private cluster in .data/postgres)
    Mailbox    ${fakes.mailboxUrl}/messages   (every e-mail sent, caught by the fake SMTP server on 127.0.0.1:${ports.smtpPort})
    Checkout   ${fakes.paymentsUrl}/checkout/…   (fake payment provider: test checkout, no real money)
    Photos     http://127.0.0.1:${ports.s3Port}   (fake S3-compatible store for job photos, files in .data/s3-${ports.s3Port})

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
    await fakes.stop();
    if (!databaseWasRunning)
      run('bash', ['scripts/db.sh', 'stop'], { env: { ...process.env, ...databaseEnv() } });
    process.exit(0);
  };
  process.on('SIGINT', shutdown);
  process.on('SIGTERM', shutdown);
  child.on('exit', async (code) => {
    if (!stopping) {
      log(`the server stopped (exit code ${code})`);
      await fakes.stop();
      process.exit(code ?? 1);
    }
  });
  fakes.child.on('exit', (code) => {
    if (!stopping)
      log(`the local fakes stopped (exit code ${code}): e-mail and payments will fail`);
  });
}

main().catch(async (error) => {
  console.error(`[pondwright] start failed: ${error.message}`);
  await fakes?.stop();
  process.exit(1);
});
