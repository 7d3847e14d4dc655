import { spawn } from 'node:child_process';
import { createHmac, randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { join } from 'node:path';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { JWT_AUDIENCE, JWT_ISSUER } from '../../src/auth/access-tokens';
import { createTestApp, randomIp, signupCompany, type TestApp } from '../support/test-app';

/**
 * Access tokens beyond what auth.e2e-spec.ts proves (alg none, another key, an edited payload), the
 * refusal to start with a weak signing key, and the headers every answer carries: helmet's, CORS and
 * the body limits. PUBLIC_APP_URL is http://app.test in tests (support/test-env.ts).
 */
const APP_ORIGIN = 'http://app.test';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

/** An HS256 token signed with the server's own key, so only the claims under test are wrong. */
function signedToken(claims: Record<string, unknown>): string {
  const head = `${encode({ alg: 'HS256', typ: 'JWT' })}.${encode(claims)}`;
  const signature = createHmac('sha256', process.env.JWT_SECRET!).update(head).digest('base64url');
  return `${head}.${signature}`;
}

describe('access tokens', () => {
  it('are refused when expired, for another audience or from another issuer, and accepted otherwise', async () => {
    const owner = await signupCompany(testApp);
    const now = Math.floor(Date.now() / 1000);
    const valid = {
      sub: owner.userId,
      cid: owner.companyId,
      role: 'owner',
      iss: JWT_ISSUER,
      aud: JWT_AUDIENCE,
      iat: now - 60,
      exp: now + 600,
    };
    const me = (token: string) =>
      testApp.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);

    // The control: the same signing with the right claims is a working session.
    await me(signedToken(valid)).expect(200);

    const refused: Array<[string, Record<string, unknown>]> = [
      ['expired a second ago', { ...valid, iat: now - 901, exp: now - 1 }],
      ['expired an hour ago', { ...valid, iat: now - 4500, exp: now - 3600 }],
      ['for another audience', { ...valid, aud: 'pondwright-admin' }],
      ['for audiences that leave ours out', { ...valid, aud: ['billing', 'reports'] }],
      ['with no audience', { ...valid, aud: undefined }],
      ['from another issuer', { ...valid, iss: 'https://issuer.attacker.example' }],
      ['with no issuer', { ...valid, iss: undefined }],
      ['not yet valid (nbf in an hour)', { ...valid, nbf: now + 3600 }],
    ];
    for (const [label, claims] of refused) {
      const response = await me(signedToken(claims));
      expect(response.status, label).toBe(401);
      expect(response.body, label).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
    }
  });
});

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

/** The built server (`npm test` builds it first), as `npm start` runs it. */
const SERVER_MAIN = join(__dirname, '../../dist/main.js');

/** Starts the built server with a JWT_SECRET; answers how it ended, or that it came up. */
async function startWith(jwtSecret: string | undefined) {
  const port = await freePort();
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    PORT: String(port),
    HOST: '127.0.0.1',
    NODE_ENV: 'development',
    LOG_LEVEL: 'silent',
    OUTBOX_WORKER: 'off',
  };
  delete env.JWT_SECRET;
  if (jwtSecret !== undefined) env.JWT_SECRET = jwtSecret;
  const child = spawn(process.execPath, [SERVER_MAIN], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', resolve));
  const deadline = Date.now() + 45_000;
  try {
    while (Date.now() < deadline) {
      if (child.exitCode !== null) return { exitCode: child.exitCode, output, listened: false };
      const live = await fetch(`http://127.0.0.1:${port}/api/health/live`).catch(() => null);
      if (live?.ok) return { exitCode: null, output, listened: true };
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    throw new Error(`the server neither started nor exited:\n${output}`);
  } finally {
    if (child.exitCode === null) {
      child.kill('SIGTERM');
      await exited;
    }
  }
}

describe('the signing key', () => {
  it.skipIf(!existsSync(SERVER_MAIN))(
    'is checked at start-up: the server refuses to start with a short or repetitive JWT_SECRET',
    async () => {
      const cases: Array<[string | undefined, RegExp]> = [
        ['short-secret', /JWT_SECRET must be at least 32 bytes/],
        ['ab'.repeat(24), /JWT_SECRET looks weak/],
      ];
      for (const [secret, message] of cases) {
        const result = await startWith(secret);
        expect(result.listened, String(secret)).toBe(false);
        expect(result.exitCode, String(secret)).not.toBe(0);
        expect(result.output, String(secret)).toMatch(message);
      }
      // The control: a random key of 256 bits starts the same server.
      const started = await startWith(randomBytes(32).toString('base64url'));
      expect(started.listened, started.output).toBe(true);
    },
    // Each start loads the whole built server in a fresh process.
    120_000,
  );
});

/** The directives of a Content-Security-Policy header, by name. */
function cspDirectives(response: Response): Map<string, string[]> {
  const header = response.headers['content-security-policy'] as string | undefined;
  expect(header).toBeDefined();
  return new Map(
    header!
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

describe('security headers', () => {
  it('carry a CSP with no inline or eval script, nosniff, no referrer and no HSTS outside production', async () => {
    const answers: Array<[string, Response]> = [
      ['live', await testApp.http().get('/api/health/live').expect(200)],
      ['401', await testApp.http().get('/api/auth/me').expect(401)],
      ['404', await testApp.http().get('/api/no-such-route').expect(404)],
      [
        '400',
        await testApp
          .http()
          .post('/api/auth/login')
          .set('X-Forwarded-For', randomIp())
          .send({})
          .expect(400),
      ],
    ];
    for (const [label, response] of answers) {
      const csp = cspDirectives(response);
      const scriptSrc = csp.get('script-src') ?? csp.get('default-src');
      expect(scriptSrc, label).toEqual(["'self'"]);
      expect(csp.get('default-src'), label).toEqual(["'self'"]);
      expect(csp.get('object-src'), label).toEqual(["'none'"]);
      expect(csp.get('frame-ancestors'), label).toEqual(["'none'"]);
      expect(csp.get('base-uri'), label).toEqual(["'self'"]);
      expect(csp.has('script-src-attr') ? csp.get('script-src-attr') : ["'none'"], label).toEqual([
        "'none'",
      ]);
      for (const values of csp.values()) {
        if (values.includes("'unsafe-inline'")) expect(values, label).toBe(csp.get('style-src'));
        expect(values, label).not.toContain("'unsafe-eval'");
      }
      expect(response.headers['x-content-type-options'], label).toBe('nosniff');
      expect(response.headers['referrer-policy'], label).toBe('no-referrer');
      expect(response.headers['x-frame-options'], label).toBe('SAMEORIGIN');
      expect(response.headers['x-powered-by'], label).toBeUndefined();
      expect(response.headers['strict-transport-security'], label).toBeUndefined();
    }
  });
});

describe('CORS', () => {
  const preflight = (origin: string, path = '/api/auth/login') =>
    testApp
      .http()
      .options(path)
      .set('Origin', origin)
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', 'content-type, authorization');

  it('lets the app’s own origin in, with credentials', async () => {
    const response = await preflight(APP_ORIGIN);
    expect(response.status).toBe(204);
    expect(response.headers['access-control-allow-origin']).toBe(APP_ORIGIN);
    expect(response.headers['access-control-allow-credentials']).toBe('true');
    expect(response.headers.vary).toMatch(/Origin/);
  });

  it('gives any other origin no Access-Control-Allow-Origin, on a preflight or on a request', async () => {
    const others = [
      'https://evil.example',
      'http://app.test.evil.example',
      'http://evil-app.test',
      'https://app.test',
      'http://app.test:8080',
      'null',
    ];
    for (const origin of others) {
      for (const path of ['/api/auth/login', '/api/auth/refresh', '/api/customers']) {
        const response = await preflight(origin, path);
        expect(
          response.headers['access-control-allow-origin'],
          `${origin} ${path}`,
        ).toBeUndefined();
        // (The cors package sends Allow-Credentials whatever the origin; with no Allow-Origin the
        // browser withholds the answer all the same.)
      }
      const simple = await testApp.http().get('/api/health/live').set('Origin', origin).expect(200);
      expect(simple.headers['access-control-allow-origin'], origin).toBeUndefined();
    }
  });
});

describe('request bodies', () => {
  // JSON over 1 MB answers 413 in the error shape: auth.e2e-spec.ts ("answers 413 in the error shape
  // for a body over 1 MB"). The two routes with a limit of their own are checked here.
  it('are limited on the raw webhook path (1 MB) and the price-book import (5 MB) as well', async () => {
    const webhook = await testApp
      .http()
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', 't=1,v1=00')
      .send(Buffer.alloc(1024 * 1024 + 1, 0x20));
    expect(webhook.status).toBe(413);
    expect(webhook.body).toMatchObject({ statusCode: 413 });

    const owner = await signupCompany(testApp);
    const importCsv = await testApp
      .http()
      .post('/api/price-book/import')
      .set('Authorization', `Bearer ${owner.accessToken}`)
      .send({ csv: 'x'.repeat(5 * 1024 * 1024 + 10) });
    expect(importCsv.status).toBe(413);
    expect(importCsv.body).toMatchObject({ statusCode: 413, error: 'Payload Too Large' });
  });
});

// Last in the file: Passport keeps one 'jwt' strategy per process, and a second app registers its
// own; once that app is closed, the first app's signed-in requests would meet a closed connection.
describe('security headers in production', () => {
  it('add HSTS, upgrade-insecure-requests and Secure cookies in production', async () => {
    // What production requires besides NODE_ENV (server/src/config/env.schema.ts): the real provider's
    // keys, the photo store's own keys, no fake payment API, a mail server and sender, and the public
    // address.
    const production = await createTestApp({
      NODE_ENV: 'production',
      PUBLIC_APP_URL: 'https://app.pondwright.example',
      STRIPE_SECRET_KEY: 'sk_live_headers_spec_only',
      STRIPE_WEBHOOK_SECRET: 'whsec_headers_spec_only',
      S3_ACCESS_KEY_ID: 'headers-spec-access-key',
      S3_SECRET_ACCESS_KEY: 'headers-spec-secret-key',
      SMTP_HOST: '127.0.0.1',
      MAIL_FROM: 'Headers Spec <quotes@headers-spec.example>',
    });
    try {
      const response = await production.http().get('/api/health/live').expect(200);
      const hsts = response.headers['strict-transport-security'] as string;
      expect(hsts).toMatch(/max-age=\d+/);
      expect(Number(/max-age=(\d+)/.exec(hsts)![1])).toBeGreaterThanOrEqual(180 * 24 * 3600);
      expect(hsts).toContain('includeSubDomains');
      expect(cspDirectives(response).has('upgrade-insecure-requests')).toBe(true);
      expect(response.headers['referrer-policy']).toBe('no-referrer');

      const signup = await production
        .http()
        .post('/api/auth/signup')
        .set('X-Forwarded-For', randomIp())
        .send({
          companyName: 'Production Ponds',
          name: 'Prod Owner',
          email: `prod.${randomBytes(4).toString('hex')}@example.test`,
          password: 'lily-pad-granite-42',
        })
        .expect(201);
      const cookie = ([] as string[])
        .concat(signup.headers['set-cookie'] ?? [])
        .find((value) => value.startsWith('pw_refresh='))!;
      expect(cookie).toMatch(/;\s*Secure/i);
      expect(cookie).toMatch(/;\s*HttpOnly/i);
      expect(cookie).toMatch(/;\s*SameSite=Strict/i);

      // CORS follows PUBLIC_APP_URL there too.
      const preflight = await production
        .http()
        .options('/api/auth/login')
        .set('Origin', 'https://app.pondwright.example')
        .set('Access-Control-Request-Method', 'POST');
      expect(preflight.headers['access-control-allow-origin']).toBe(
        'https://app.pondwright.example',
      );
    } finally {
      await production.close();
    }
  });
});
