import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

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
    db('stop');
    const started = Date.now();
    const down = await testApp.http().get('/api/health').expect(503);
    expect(Date.now() - started).toBeLessThan(5000);
    expect(down.body).toMatchObject({ statusCode: 503, error: 'Service Unavailable' });

    db('start');
    // The same server process reconnects on its own: no restart.
    const up = await testApp.http().get('/api/health').expect(200);
    expect(up.body).toEqual({ status: 'ok' });
  });
});
