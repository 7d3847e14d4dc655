// `node server/dist/dev-fakes/main.js`: the fake SMTP server, the fake payment provider and the fake
// S3-compatible photo store, for `npm start`, `npm run dev` and `npm test`. One process beside the
// app server, loopback only.
import { envSchema } from '../config/env.schema';
import { startFakePayments } from './fake-payments';
import { startFakeS3 } from './fake-s3';
import { startFakeSmtp } from './fake-smtp';

function portFromEnv(name: string, fallback: number): number {
  const text = process.env[name];
  if (text === undefined || text === '') return fallback;
  const port = Number(text);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`${name} must be a port number (0-65535), not "${text}"`);
  }
  return port;
}

async function main(): Promise<void> {
  const smtpPort = portFromEnv('FAKE_SMTP_PORT', 2525);
  const mailboxPort = portFromEnv('FAKE_MAILBOX_HTTP_PORT', 2580);
  const paymentsPort = portFromEnv('FAKE_PAYMENTS_PORT', 12111);
  const s3Port = portFromEnv('FAKE_S3_PORT', 4569);
  const s3Directory = process.env.FAKE_S3_DIR || '.data/s3-4569';
  const bucket = envSchema.shape.S3_BUCKET.parse(process.env.S3_BUCKET);
  // The server's own schema supplies the defaults, so both sides agree on the local test keys.
  const secretKey = envSchema.shape.STRIPE_SECRET_KEY.parse(process.env.STRIPE_SECRET_KEY);
  const webhookSecret = envSchema.shape.STRIPE_WEBHOOK_SECRET.parse(
    process.env.STRIPE_WEBHOOK_SECRET,
  );
  const webhookUrl =
    process.env.FAKE_PAYMENTS_WEBHOOK_URL || 'http://127.0.0.1:3000/api/payments/webhook';

  const smtp = await startFakeSmtp({ smtpPort, httpPort: mailboxPort });
  const payments = await startFakePayments({
    port: paymentsPort,
    secretKey,
    webhookSecret,
    webhookUrl,
    log: (line) => console.warn(`[fake-payments] ${line}`),
  }).catch(async (error: unknown) => {
    await smtp.stop();
    throw error;
  });
  const s3 = await startFakeS3({ port: s3Port, directory: s3Directory, bucket }).catch(
    async (error: unknown) => {
      await Promise.all([smtp.stop(), payments.stop()]);
      throw error;
    },
  );
  console.log(
    `[fake-smtp] SMTP on 127.0.0.1:${smtp.smtpPort}, mailbox at http://127.0.0.1:${smtp.httpPort}/messages`,
  );
  console.log(
    `[fake-payments] API and test checkout on ${payments.url}, webhooks to ${webhookUrl}`,
  );
  // Printed last: the repo scripts wait for this line before starting the app.
  console.log(
    `[fake-s3] S3-compatible store on ${s3.url}, bucket ${bucket}, files in ${s3Directory}`,
  );

  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    Promise.all([smtp.stop(), payments.stop(), s3.stop()]).then(
      () => process.exit(0),
      () => process.exit(1),
    );
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
  // Started by the repo scripts with an IPC channel: its closing means the script is gone, even when
  // it was killed outright, so the fakes do not linger holding their ports.
  if (process.channel) {
    process.channel.unref();
    process.on('disconnect', stop);
  }
}

main().catch((error: unknown) => {
  const message = error instanceof Error ? error.message : String(error);
  const inUse = (error as NodeJS.ErrnoException).code === 'EADDRINUSE';
  console.error(
    `[dev-fakes] failed to start: ${message}${inUse ? ' (another checkout running? set FAKE_SMTP_PORT, FAKE_MAILBOX_HTTP_PORT, FAKE_PAYMENTS_PORT or FAKE_S3_PORT)' : ''}`,
  );
  process.exit(1);
});
