import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

const dbScript = resolve(__dirname, '../../scripts/db.sh');
const db = (command: 'start' | 'stop') =>
  execFileSync('bash', [dbScript, command], { stdio: 'pipe' });

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  db('start');
  await testApp.close();
});

describe('GET /api/health', () => {
  it('answers 200 {status:"ok"} while the database answers', async () => {
    const response = await testApp.http().get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok' });
  });

  it('answers 503 in the error shape within seconds when PostgreSQL is down, and recovers when it is back', async () => {
    const owner = await signupCompany(testApp);
    db('stop');
    try {
      const started = Date.now();
      const down = await testApp.http().get('/api/health').expect(503);
      expect(Date.now() - started).toBeLessThan(5000);
      expect(down.body).toMatchObject({ statusCode: 503, error: 'Service Unavailable' });
      expect(down.body.requestId).toBe(down.headers['x-request-id']);

      // An ordinary route: 503 JSON with the request id, in well under the 2 s connection timeout
      // plus a margin for this loaded machine; never a hang and never a 500.
      const listStarted = Date.now();
      const list = await testApp
        .http()
        .get('/api/estimates')
        .set(...bearer(owner))
        .expect(503);
      expect(Date.now() - listStarted).toBeLessThan(3000);
      expect(list.body).toMatchObject({ statusCode: 503, error: 'Service Unavailable' });
      expect(list.body.requestId).toMatch(/^[0-9a-f-]{36}$/);
      expect(list.headers['x-request-id']).toBe(list.body.requestId);

      // Liveness does not depend on the database, so nothing restarts a server that would recover.
      await testApp.http().get('/api/health/live').expect(200, { status: 'ok' });
      await testApp.http().get('/api/health/ready').expect(503);
    } finally {
      db('start');
    }

    // The same server process reconnects on its own: no restart.
    const up = await testApp.http().get('/api/health').expect(200);
    expect(up.body).toEqual({ status: 'ok' });
    await testApp.http().get('/api/health/ready').expect(200);
    await testApp
      .http()
      .get('/api/estimates')
      .set(...bearer(owner))
      .expect(200);
  });

  it('keeps a caller’s plain request id and replaces one that could forge a log line', async () => {
    const kept = await testApp.http().get('/api/health/live').set('x-request-id', 'lb-7f3a.42');
    expect(kept.headers['x-request-id']).toBe('lb-7f3a.42');
    const replaced = await testApp
      .http()
      .get('/api/health/live')
      .set('x-request-id', 'ok" ,"level":60,"msg":"forged');
    expect(replaced.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });
});
