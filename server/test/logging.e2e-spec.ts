import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { approvedEstimate, sendQuote } from './support/quote-fixtures';
import {
  bearer,
  createTestApp,
  randomIp,
  refreshCookieOf,
  signupCompany,
  type TestApp,
} from './support/test-app';

/** Everything the app logs, as written: pino's JSON lines with the production logger settings. */
let output = '';
const destination = new Writable({
  write(chunk: Buffer | string, _encoding, done) {
    output += chunk.toString();
    done();
  },
});

// A built client of the quote page alone, so `/q/<token>` is served as in production.
const clientDist = mkdtempSync(join(tmpdir(), 'pondwright-log-dist-'));
writeFileSync(join(clientDist, 'index.html'), '<!doctype html><title>staff app</title>');
writeFileSync(join(clientDist, 'quote.html'), '<!doctype html><title>quote page</title>');

type LogLine = { req?: { id?: unknown }; reqId?: unknown; msg?: unknown };

let testApp: TestApp;
/** What must never be written to the log, by name for the failure message. */
const secrets = new Map<string, string>();
/** The request id each request was answered with (`X-Request-Id`). */
const requestIds: Array<{ request: string; id: string }> = [];

async function sent(label: string, test: request.Test): Promise<request.Response> {
  const response = await test;
  requestIds.push({ request: label, id: String(response.headers['x-request-id']) });
  return response;
}

function cookieValue(cookie: string): string {
  return cookie.slice(cookie.indexOf('=') + 1);
}

beforeAll(async () => {
  testApp = await createTestApp(
    { LOG_LEVEL: 'trace', CLIENT_DIST_DIR: clientDist },
    { logDestination: destination },
  );
  const owner = await signupCompany(testApp);
  const estimate = await approvedEstimate(testApp, owner);
  const quoteToken = await sendQuote(testApp, owner, estimate.id);
  secrets.set('JWT signing key', process.env.JWT_SECRET!);
  secrets.set('quote token', quoteToken);
  // Only what the requests below send and receive is judged: the lines written so far are set-up.
  output = '';

  const address = randomIp();
  const wrongPassword = `wrong-${randomBytes(8).toString('hex')}`;
  secrets.set('a wrong password', wrongPassword);
  await sent(
    'sign-in with a wrong password',
    testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', address)
      .send({ email: owner.email, password: wrongPassword })
      .expect(401),
  );

  secrets.set('password', owner.password);
  const signedIn = await sent(
    'sign-in',
    testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', address)
      .send({ email: owner.email, password: owner.password })
      .expect(200),
  );
  const accessToken = signedIn.body.accessToken as string;
  const refreshCookie = refreshCookieOf(signedIn);
  secrets.set('access token (JWT)', accessToken);
  secrets.set('access token signature', accessToken.split('.')[2]!);
  secrets.set('refresh cookie', cookieValue(refreshCookie));

  const refreshed = await sent(
    'refresh',
    testApp.http().post('/api/auth/refresh').set('Cookie', refreshCookie).expect(200),
  );
  secrets.set('refreshed access token', refreshed.body.accessToken as string);
  secrets.set('rotated refresh cookie', cookieValue(refreshCookieOf(refreshed)));

  await sent(
    'authenticated request',
    testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer({ accessToken }))
      .expect(200),
  );
  await sent(
    'authenticated request with its own request id',
    testApp
      .http()
      .get('/api/estimates')
      .set(...bearer(refreshed.body as { accessToken: string }))
      .set('X-Request-Id', 'caller-chosen-id-42')
      .expect(200),
  );
  await sent(
    'refused bearer token',
    testApp.http().get('/api/auth/me').set('Authorization', `Bearer ${accessToken}x`).expect(401),
  );

  await sent('quote by token', testApp.http().get(`/api/quotes/${quoteToken}`).expect(200));
  await sent('quote PDF by token', testApp.http().get(`/api/quotes/${quoteToken}/pdf`).expect(200));
  await sent('quote page', testApp.http().get(`/q/${quoteToken}`).expect(200));
  const unknownToken = randomBytes(32).toString('base64url');
  secrets.set('unknown quote token', unknownToken);
  await sent('unknown quote token', testApp.http().get(`/api/quotes/${unknownToken}`).expect(404));
  await sent('quote page, unknown token', testApp.http().get(`/q/${unknownToken}`).expect(404));
});

afterAll(async () => {
  await testApp?.close();
  rmSync(clientDist, { recursive: true, force: true });
});

describe('the server log', () => {
  const lines = () => output.split('\n').filter((line) => line.trim() !== '');
  const parsed = () => lines().map((line) => JSON.parse(line) as LogLine);
  const idOf = (line: LogLine) => line.req?.id ?? line.reqId;

  it('is one JSON object per line, each with the id of the request it belongs to', () => {
    expect(lines().length).toBeGreaterThan(0);
    const notJson = lines().filter((line) => {
      try {
        JSON.parse(line);
        return false;
      } catch {
        return true;
      }
    });
    expect(notJson).toEqual([]);
    const withoutId = parsed().filter((line) => typeof idOf(line) !== 'string' || !idOf(line));
    expect(withoutId).toEqual([]);
  });

  it('logs every request under the id it answered with, a caller’s plain id kept', () => {
    const logged = new Set(parsed().map(idOf));
    const unlogged = requestIds.filter(({ id }) => !logged.has(id)).map(({ request }) => request);
    expect(unlogged).toEqual([]);
    expect(new Set(requestIds.map(({ id }) => id)).size).toBe(requestIds.length);
    expect(requestIds.map(({ id }) => id)).toContain('caller-chosen-id-42');
  });

  it('holds no password, token, refresh cookie, quote token or signing key', () => {
    expect(secrets.size).toBe(10);
    const leaked = [...secrets].filter(([, value]) => output.includes(value)).map(([name]) => name);
    expect(leaked).toEqual([]);
  });
});
