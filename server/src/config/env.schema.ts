import { z } from 'zod';

/** Every setting the server reads, validated once at start-up; all problems are reported together. */
/** The settings needed to reach PostgreSQL (enough for migrations and the seed). */
export const databaseEnvSchema = z.object({
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(54329),
  DB_USER: z.string().min(1).default('pondwright'),
  DB_PASSWORD: z.string({ error: 'DB_PASSWORD is required' }).min(1),
  DB_NAME: z.string().min(1).default('pondwright'),
  DB_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(10),
});

const LOCAL_FAKE_STRIPE_KEY = 'sk_test_pondwright_local_fake';
const LOCAL_FAKE_WEBHOOK_SECRET = 'whsec_pondwright_local_fake';
/** The fixed key pair the local fake S3 store (s3rver) accepts. */
const LOCAL_FAKE_S3_KEY = 'S3RVER';
/** A sender on a reserved domain: fine for the local fake, undeliverable from a real mail server. */
const LOCAL_MAIL_FROM = 'Pondwright <no-reply@pondwright.example>';
/** Where the local fake SMTP server listens when SMTP_HOST is unset. */
export const LOCAL_FAKE_SMTP_HOST = '127.0.0.1';

export const envSchema = databaseEnvSchema
  .extend({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().min(1).default('127.0.0.1'),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    PUBLIC_APP_URL: z.url().optional(),
    TRUST_PROXY: z
      .enum(['true', 'false'])
      .default('false')
      .transform((value) => value === 'true'),
    // HS256 needs a key at least as long as its output: 256 bits (RFC 7518 §3.2).
    JWT_SECRET: z
      .string({ error: 'JWT_SECRET is required (at least 32 bytes of random data)' })
      .refine(
        (secret) => Buffer.byteLength(secret, 'utf8') >= 32,
        'JWT_SECRET must be at least 32 bytes (256 bits)',
      )
      .refine((secret) => new Set(secret).size >= 10, 'JWT_SECRET looks weak: use random data'),
    JWT_ACCESS_TTL_SECONDS: z.coerce.number().int().min(30).max(900).default(900),
    REFRESH_TTL_DAYS: z.coerce.number().int().min(1).max(90).default(14),
    INVITE_TTL_HOURS: z.coerce
      .number()
      .int()
      .min(1)
      .max(24 * 30)
      .default(72),
    LOGIN_MAX_FAILURES: z.coerce.number().int().min(1).default(10),
    LOGIN_FAILURE_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
    RATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(600),
    // A streaming read replica for the reports only (docs/scaling.md); unset, they read the primary.
    DB_REPLICA_HOST: z.string().min(1).optional(),
    DB_REPLICA_PORT: z.coerce.number().int().min(1).max(65535).optional(),
    CLIENT_DIST_DIR: z.string().optional(),
    // E-mail: nodemailer over SMTP. `npm start` and `npm test` point these at the local fake SMTP server.
    // Unset means the local fake on 127.0.0.1 (refused in production below).
    SMTP_HOST: z.string().min(1).optional(),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
    SMTP_SECURE: z
      .enum(['true', 'false'])
      .default('false')
      .transform((value) => value === 'true'),
    SMTP_USER: z.string().min(1).optional(),
    SMTP_PASSWORD: z.string().min(1).optional(),
    MAIL_FROM: z.string().min(3).default(LOCAL_MAIL_FROM),
    /** The fake SMTP server's HTTP API, read by the developer mailbox page; ignored in production. */
    MAILBOX_URL: z.url().optional(),
    OUTBOX_WORKER: z
      .enum(['on', 'off'])
      .default('on')
      .transform((value) => value === 'on'),
    OUTBOX_POLL_MS: z.coerce.number().int().min(50).max(60_000).default(1000),
    // Payments: the stripe SDK. STRIPE_API_URL points it at the local fake; unset, it talks to the provider.
    STRIPE_SECRET_KEY: z.string().min(8).default(LOCAL_FAKE_STRIPE_KEY),
    STRIPE_WEBHOOK_SECRET: z.string().min(8).default(LOCAL_FAKE_WEBHOOK_SECRET),
    STRIPE_API_URL: z.url().optional(),
    // Photos: any S3-compatible store through the S3 SDK; S3_ENDPOINT points it at the local fake.
    S3_ENDPOINT: z.url().optional(),
    S3_REGION: z.string().min(1).default('us-east-1'),
    S3_BUCKET: z.string().min(3).default('pondwright-photos'),
    S3_ACCESS_KEY_ID: z.string().min(1).default(LOCAL_FAKE_S3_KEY),
    S3_SECRET_ACCESS_KEY: z.string().min(1).default(LOCAL_FAKE_S3_KEY),
    PHOTO_MAX_BYTES: z.coerce
      .number()
      .int()
      .min(100_000)
      .max(50 * 1024 * 1024)
      .default(15 * 1024 * 1024),
    LOG_LEVEL: z
      .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
      .default('info'),
  })
  .superRefine((env, context) => {
    if (env.DB_REPLICA_PORT !== undefined && env.DB_REPLICA_HOST === undefined) {
      context.addIssue({
        code: 'custom',
        path: ['DB_REPLICA_HOST'],
        message: 'Set DB_REPLICA_HOST with DB_REPLICA_PORT (or leave both unset)',
      });
    }
    // Production talks to the real provider and a real mail server: the local fakes' settings are refused.
    if (env.NODE_ENV !== 'production') return;
    const refuse = (path: string, message: string) =>
      context.addIssue({ code: 'custom', path: [path], message });
    if (env.STRIPE_SECRET_KEY === LOCAL_FAKE_STRIPE_KEY)
      refuse('STRIPE_SECRET_KEY', 'Set the provider’s secret key');
    if (env.STRIPE_WEBHOOK_SECRET === LOCAL_FAKE_WEBHOOK_SECRET)
      refuse('STRIPE_WEBHOOK_SECRET', 'Set the webhook signing secret from the provider');
    if (env.STRIPE_API_URL)
      refuse('STRIPE_API_URL', 'Leave unset in production (it points at the local fake)');
    if (env.S3_ACCESS_KEY_ID === LOCAL_FAKE_S3_KEY)
      refuse('S3_ACCESS_KEY_ID', 'Set the photo store’s access key');
    if (env.S3_SECRET_ACCESS_KEY === LOCAL_FAKE_S3_KEY)
      refuse('S3_SECRET_ACCESS_KEY', 'Set the photo store’s secret key');
    if (!env.SMTP_HOST)
      refuse('SMTP_HOST', 'Set the mail server quotes and invitations are sent through');
    if (env.MAIL_FROM === LOCAL_MAIL_FROM)
      refuse('MAIL_FROM', 'Set a sender address on a domain the mail server may send for');
    if (!env.PUBLIC_APP_URL)
      refuse('PUBLIC_APP_URL', 'Set the address people reach the app at (quote links use it)');
  });

export type Env = z.infer<typeof envSchema>;

export type DatabaseEnv = z.infer<typeof databaseEnvSchema>;

/** Parses the environment; throws one error listing every missing or invalid variable. */
export function validateEnv(raw: Record<string, unknown>): Env {
  return parseOrThrow(envSchema, raw);
}

export function validateDatabaseEnv(raw: Record<string, unknown>): DatabaseEnv {
  return parseOrThrow(databaseEnvSchema, raw);
}

function parseOrThrow<T extends z.ZodType>(schema: T, raw: Record<string, unknown>): z.infer<T> {
  const result = schema.safeParse(raw);
  if (!result.success) {
    const lines = result.error.issues.map(
      (issue) => `  - ${issue.path.join('.') || '(env)'}: ${issue.message}`,
    );
    throw new Error(`Invalid server configuration:\n${lines.join('\n')}`);
  }
  return result.data;
}
