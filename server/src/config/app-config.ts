import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { DatabaseSettings } from '../database/data-source-options';
import { LOCAL_FAKE_SMTP_HOST, type Env } from './env.schema';

/** Typed, read-only access to the validated settings. Nothing else reads process.env. */
@Injectable()
export class AppConfig {
  constructor(private readonly config: ConfigService<Env, true>) {}

  private get<K extends keyof Env>(key: K): Env[K] {
    return this.config.get(key, { infer: true });
  }

  get isProduction(): boolean {
    return this.get('NODE_ENV') === 'production';
  }
  get nodeEnv(): Env['NODE_ENV'] {
    return this.get('NODE_ENV');
  }
  get host(): string {
    return this.get('HOST');
  }
  get port(): number {
    return this.get('PORT');
  }
  /** Where the app is reached by people, used in links such as invites. */
  get publicAppUrl(): string {
    return (this.get('PUBLIC_APP_URL') ?? `http://${this.host}:${this.port}`).replace(/\/$/, '');
  }
  get trustProxy(): boolean {
    return this.get('TRUST_PROXY');
  }
  get database(): DatabaseSettings {
    const replicaHost = this.get('DB_REPLICA_HOST');
    return {
      host: this.get('DB_HOST'),
      port: this.get('DB_PORT'),
      username: this.get('DB_USER'),
      password: this.get('DB_PASSWORD'),
      database: this.get('DB_NAME'),
      poolSize: this.get('DB_POOL_SIZE'),
      replica: replicaHost
        ? { host: replicaHost, port: this.get('DB_REPLICA_PORT') ?? this.get('DB_PORT') }
        : null,
    };
  }
  get jwt() {
    return { secret: this.get('JWT_SECRET'), accessTtlSeconds: this.get('JWT_ACCESS_TTL_SECONDS') };
  }
  get refreshTtlDays(): number {
    return this.get('REFRESH_TTL_DAYS');
  }
  get inviteTtlHours(): number {
    return this.get('INVITE_TTL_HOURS');
  }
  get loginThrottle() {
    return {
      maxFailures: this.get('LOGIN_MAX_FAILURES'),
      windowMinutes: this.get('LOGIN_FAILURE_WINDOW_MINUTES'),
    };
  }
  get rateLimitPerMinute(): number {
    return this.get('RATE_LIMIT_PER_MINUTE');
  }
  get clientDistDir(): string | undefined {
    return this.get('CLIENT_DIST_DIR');
  }
  get smtp() {
    return {
      host: this.get('SMTP_HOST') ?? LOCAL_FAKE_SMTP_HOST,
      port: this.get('SMTP_PORT'),
      secure: this.get('SMTP_SECURE'),
      user: this.get('SMTP_USER'),
      password: this.get('SMTP_PASSWORD'),
      from: this.get('MAIL_FROM'),
    };
  }
  /** The developer mailbox's source; never used in production. */
  get mailboxUrl(): string | undefined {
    return this.isProduction ? undefined : this.get('MAILBOX_URL')?.replace(/\/$/, '');
  }
  get outbox() {
    return { workerEnabled: this.get('OUTBOX_WORKER'), pollMs: this.get('OUTBOX_POLL_MS') };
  }
  get stripe() {
    return {
      secretKey: this.get('STRIPE_SECRET_KEY'),
      webhookSecret: this.get('STRIPE_WEBHOOK_SECRET'),
      apiUrl: this.get('STRIPE_API_URL'),
    };
  }
  get s3() {
    return {
      endpoint: this.get('S3_ENDPOINT'),
      region: this.get('S3_REGION'),
      bucket: this.get('S3_BUCKET'),
      accessKeyId: this.get('S3_ACCESS_KEY_ID'),
      secretAccessKey: this.get('S3_SECRET_ACCESS_KEY'),
    };
  }
  get photoMaxBytes(): number {
    return this.get('PHOTO_MAX_BYTES');
  }
  get logLevel(): Env['LOG_LEVEL'] {
    return this.get('LOG_LEVEL');
  }
}
