import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { randomBytes, randomInt } from 'node:crypto';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { PARAMS_PROVIDER_TOKEN } from 'nestjs-pino';
import type { DestinationStream } from 'pino';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp, NEST_APP_OPTIONS } from '../../src/app.setup';
import { loggerParams } from '../../src/common/logging/logger-params';
import { AppConfig } from '../../src/config/app-config';
import { validateEnv } from '../../src/config/env.schema';

export type TestApp = {
  app: NestExpressApplication;
  dataSource: DataSource;
  http: () => TestAgent;
  close: () => Promise<void>;
};

/**
 * The real application, wired exactly as in production, against the test database. `env` overrides
 * settings for this app only (the environment itself is read once, when the config module loads), e.g.
 * the port of a fake SMTP server the test started. `logDestination` receives the app's JSON log lines
 * (with the production logger settings) instead of standard output.
 */
export async function createTestApp(
  env: Record<string, string> = {},
  options: { logDestination?: DestinationStream } = {},
): Promise<TestApp> {
  const settings = validateEnv({ ...process.env, ...env });
  const config = new AppConfig({
    get: (key: keyof typeof settings) => settings[key],
  } as unknown as ConstructorParameters<typeof AppConfig>[0]);
  let builder = Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(AppConfig)
    .useValue(config);
  if (options.logDestination) {
    const params = loggerParams(config);
    builder = builder
      .overrideProvider(PARAMS_PROVIDER_TOKEN)
      .useValue({ ...params, pinoHttp: [params.pinoHttp, options.logDestination] });
  }
  const moduleRef = await builder.compile();
  const app = moduleRef.createNestApplication<NestExpressApplication>({
    ...NEST_APP_OPTIONS,
    logger: false,
  });
  configureApp(app);
  await app.init();
  return {
    app,
    dataSource: app.get(DataSource),
    http: () => request(app.getHttpServer()),
    close: () => app.close(),
  };
}

/** A made-up client address, so sign-in throttling per address does not leak between tests. */
export function randomIp(): string {
  return `10.${randomInt(256)}.${randomInt(256)}.${randomInt(1, 255)}`;
}

export function uniqueEmail(label = 'person'): string {
  return `${label}.${randomBytes(5).toString('hex')}@example.test`;
}

export const GOOD_PASSWORD = 'lily-pad-granite-42';

export type SignedIn = {
  accessToken: string;
  refreshCookie: string;
  email: string;
  password: string;
};

/** Signs up a new company and returns its owner's session. */
export async function signupCompany(
  testApp: TestApp,
  overrides: Partial<{ companyName: string; name: string; email: string; password: string }> = {},
): Promise<SignedIn & { companyId: string; userId: string }> {
  const body = {
    companyName: overrides.companyName ?? `Test Ponds ${randomBytes(3).toString('hex')}`,
    name: overrides.name ?? 'Owner Person',
    email: overrides.email ?? uniqueEmail('owner'),
    password: overrides.password ?? GOOD_PASSWORD,
  };
  const response = await testApp
    .http()
    .post('/api/auth/signup')
    .set('X-Forwarded-For', randomIp())
    .send(body)
    .expect(201);
  const me = await testApp
    .http()
    .get('/api/auth/me')
    .set('Authorization', `Bearer ${response.body.accessToken}`)
    .expect(200);
  return {
    accessToken: response.body.accessToken as string,
    refreshCookie: refreshCookieOf(response),
    email: body.email,
    password: body.password,
    companyId: me.body.companyId as string,
    userId: me.body.id as string,
  };
}

/** Invites someone with a role and has them accept; returns their session. */
export async function addMember(
  testApp: TestApp,
  owner: { accessToken: string },
  role: 'owner' | 'estimator' | 'crew_lead',
): Promise<SignedIn & { userId: string }> {
  const email = uniqueEmail(role);
  const invite = await testApp
    .http()
    .post('/api/invites')
    .set('Authorization', `Bearer ${owner.accessToken}`)
    .send({ email, role })
    .expect(201);
  const token = tokenFromInviteUrl(invite.body.inviteUrl as string);
  const accepted = await testApp
    .http()
    .post('/api/auth/accept-invite')
    .send({ token, name: `Member ${role}`, password: GOOD_PASSWORD })
    .expect(201);
  const me = await testApp
    .http()
    .get('/api/auth/me')
    .set('Authorization', `Bearer ${accepted.body.accessToken}`)
    .expect(200);
  return {
    accessToken: accepted.body.accessToken as string,
    refreshCookie: refreshCookieOf(accepted),
    email,
    password: GOOD_PASSWORD,
    userId: me.body.id as string,
  };
}

export function tokenFromInviteUrl(url: string): string {
  return url.split('/accept-invite/')[1]!;
}

export function refreshCookieOf(response: request.Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const refresh = cookies.find((cookie) => cookie.startsWith('pw_refresh='));
  if (!refresh) throw new Error('no refresh cookie in the response');
  return refresh.split(';')[0]!;
}

export function bearer(session: { accessToken: string }): [string, string] {
  return ['Authorization', `Bearer ${session.accessToken}`];
}
