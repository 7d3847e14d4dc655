import 'reflect-metadata';
import { afterAll, expect } from 'vitest';
import { randomBytes } from 'node:crypto';

// The server's settings for tests: the test database, a fresh random signing key, quiet logs, and
// proxy headers trusted so each test can speak from an address of its own (X-Forwarded-For).
process.env.NODE_ENV = 'test';
process.env.DB_NAME = process.env.DB_TEST_NAME ?? 'pondwright_test';
process.env.DB_PASSWORD ??= 'pondwright';
process.env.JWT_SECRET = randomBytes(32).toString('base64url');
process.env.TRUST_PROXY = 'true';
process.env.LOG_LEVEL = 'silent';
process.env.RATE_LIMIT_PER_MINUTE = '100000';
process.env.PUBLIC_APP_URL = 'http://app.test';
process.env.OUTBOX_WORKER = 'off';

// pg 8 queues a query sent to a connection still busy with another (a Promise.all inside a
// transaction) and warns once; pg 9 refuses it. Any test file that makes the server do so fails.
const busyConnectionWarnings: string[] = [];
process.on('warning', (warning) => {
  if (warning.message.includes('already executing a query')) {
    busyConnectionWarnings.push(warning.stack ?? warning.message);
  }
});
afterAll(() => {
  expect(busyConnectionWarnings, 'a query was sent to a busy connection').toEqual([]);
});
