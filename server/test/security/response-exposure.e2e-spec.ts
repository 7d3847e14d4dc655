import type { Role } from '@pondwright/shared';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeS3, type FakeS3 } from '../../src/dev-fakes/fake-s3';
import { createTestApp, GOOD_PASSWORD, randomIp, type TestApp } from '../support/test-app';
import {
  callRoute,
  fillPath,
  PARAM_KINDS,
  ROUTE_SPECS,
  uploads,
  type Answer,
} from './route-requests';
import { discoverRoutes, type Route } from './route-table';
import { buildWorld, photoBytes, type World } from './tenant-world';

/**
 * What answers never carry: password hashes, refresh-token, invite and quote-link token hashes (for
 * anyone), and, for a crew lead, any cost, price or margin. Every route a role may call is called
 * against a company with an object of every kind (the route-security world), and each JSON answer is
 * walked key by key; the stored hashes themselves are searched for in every answer's text.
 */
let testApp: TestApp;
let s3: FakeS3;
const s3Directory = mkdtempSync(join(tmpdir(), 'pondwright-exposure-s3-'));
let world: World;
let routes: Route[];

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, directory: s3Directory, bucket: 'exposure-test' });
  testApp = await createTestApp({ S3_ENDPOINT: s3.url, S3_BUCKET: 'exposure-test' });
  uploads.photo = await photoBytes(90);
  uploads.logo = await sharp({
    create: { width: 16, height: 16, channels: 3, background: '#225544' },
  })
    .png()
    .toBuffer();
  world = await buildWorld(testApp, 'expo');
  routes = discoverRoutes(testApp.app).filter(
    (route) =>
      ROUTE_SPECS[route.name] &&
      !route.unbuildable &&
      route.params.every((param) => PARAM_KINDS[param.key]),
  );
}, 120_000);

afterAll(async () => {
  await testApp?.close();
  await s3?.stop();
  rmSync(s3Directory, { recursive: true, force: true });
});

/** Every key path in a JSON value with its value, arrays as `[]`: `budget.lines[].unitCost`. */
function keyPaths(value: unknown, prefix = ''): Array<{ path: string; value: unknown }> {
  if (Array.isArray(value)) return value.flatMap((item) => keyPaths(item, `${prefix}[]`));
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([key, child]) => {
    const path = prefix ? `${prefix}.${key}` : key;
    return [{ path, value: child }, ...keyPaths(child, path)];
  });
}

const lastKey = (path: string) => path.split('.').pop()!.replace(/\[\]$/g, '');

/** The words of a key: `grossMarginPct` → gross, margin, pct; `unit_cost` → unit, cost. */
const keyWords = (key: string) =>
  key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);

/** Words of keys that would carry money or how it is made (`taxable`, a yes/no, is not one). */
const MONEY_WORDS = new Set([
  'cost',
  'costs',
  'price',
  'prices',
  'priced',
  'total',
  'totals',
  'subtotal',
  'margin',
  'markup',
  'amount',
  'deposit',
  'balance',
  'tax',
  'discount',
  'budget',
  'profit',
  'revenue',
  'rate',
  'money',
]);
const isMoneyKey = (key: string) => keyWords(key).some((word) => MONEY_WORDS.has(word));
/** Money words that mean something else on a given route. */
const NOT_MONEY = new Set([
  // The number of customers the search found, for paging.
  'CustomersController.list: total',
]);

/** Keys that would carry a secret or its hash. */
const SECRET_KEY = /hash|password|secret|salt|^token$|refresh/i;
/**
 * `contentSha256` is the fingerprint of a quote version or a daily log's content: the homeowner is
 * shown it and sends it back when accepting, so it is public by design and no secret's hash.
 */
const PUBLIC_FINGERPRINTS = new Set(['contentSha256']);

/** Routes a role may call, reads first, so the writes' changes come after every read. */
function routesFor(role: Role): Route[] {
  const allowed = routes.filter((route) => !route.isPublic && route.roles.includes(role));
  return [
    ...allowed.filter((route) => route.method === 'GET'),
    ...allowed.filter((route) => route.method !== 'GET'),
  ];
}

async function callAll(role: Role): Promise<Array<{ route: Route; answer: Answer }>> {
  const answers: Array<{ route: Route; answer: Answer }> = [];
  for (const route of routesFor(role)) {
    const path = fillPath(route, () => world);
    answers.push({
      route,
      answer: await callRoute(testApp, route, path, world.sessions[role], world),
    });
  }
  return answers;
}

/** The hashes stored for this company's people, sessions, invites and quote links. */
async function storedHashes(): Promise<string[]> {
  const rows = (await testApp.dataSource.query(
    `SELECT password_hash AS hash FROM users WHERE company_id = $1
     UNION ALL SELECT r.token_hash FROM refresh_tokens r JOIN users u ON u.id = r.user_id WHERE u.company_id = $1
     UNION ALL SELECT token_hash FROM invites WHERE company_id = $1
     UNION ALL SELECT token_hash FROM quote_links WHERE company_id = $1`,
    [world.companyId],
  )) as Array<{ hash: string }>;
  return rows.map((row) => row.hash);
}

describe('a crew lead', () => {
  it('gets no cost, price, total, margin or markup from any route a crew lead may call', async () => {
    const answers = await callAll('crew_lead');
    expect(answers.length).toBeGreaterThan(10);
    const found: string[] = [];
    for (const { route, answer } of answers) {
      // Errors are answers too: a 409 must not describe the money either.
      expect(answer.status, `${route.name}: ${answer.body.slice(0, 200)}`).toBeLessThan(500);
      for (const { path, value } of keyPaths(answer.json)) {
        // A figure under a money word; a container (`crewBudget`, quantities only) is judged by its
        // own keys, and `budget: null` is the crew lead's view of the job's budget.
        if (value === null || typeof value === 'object') continue;
        const entry = `${route.name}: ${path}`;
        if (isMoneyKey(lastKey(path)) && !NOT_MONEY.has(entry)) found.push(entry);
      }
      // Money written out in text (a note or a PDF line) would look like "$1,234.56".
      if (answer.json !== null) {
        expect(answer.body, route.name).not.toMatch(/\$\s?\d{1,3}(,\d{3})*\.\d{2}/);
      }
    }
    expect([...new Set(found)]).toEqual([]);
    // The answers seen, for the record: every JSON read the crew lead has.
    expect(answers.filter(({ answer }) => answer.json !== null).length).toBeGreaterThan(5);
  });
});

describe('every role', () => {
  it('gets no password hash and no token hash, by key or by value, from any route it may call', async () => {
    // A sign-in and a refresh first, so the company has refresh tokens to look for.
    const login = await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email: await ownerEmail(), password: GOOD_PASSWORD })
      .expect(200);
    const hashes = await storedHashes();
    expect(hashes.length).toBeGreaterThanOrEqual(6);

    const texts: Array<{ name: string; text: string; json: unknown }> = [
      {
        name: 'AuthController.login',
        text: `${JSON.stringify(login.headers)}\n${login.text}`,
        json: login.body,
      },
    ];
    for (const role of ['owner', 'estimator', 'crew_lead'] as const) {
      for (const { route, answer } of await callAll(role)) {
        texts.push({ name: `${route.name} as ${role}`, text: answer.text, json: answer.json });
      }
    }
    for (const route of routes.filter(
      (candidate) => candidate.isPublic && candidate.method === 'GET',
    )) {
      const path = fillPath(route, () => world);
      const answer = await callRoute(testApp, route, path, null, world);
      texts.push({ name: `${route.name} anonymous`, text: answer.text, json: answer.json });
    }

    const found: string[] = [];
    for (const { name, text, json } of texts) {
      for (const { path } of keyPaths(json)) {
        const key = lastKey(path);
        if (SECRET_KEY.test(key) && !PUBLIC_FINGERPRINTS.has(key))
          found.push(`${name}: key ${path}`);
      }
      for (const hash of hashes) if (text.includes(hash)) found.push(`${name}: a stored hash`);
      if (/\$2[aby]\$\d\d\$/.test(text)) found.push(`${name}: a bcrypt hash`);
    }
    expect(found).toEqual([]);
  });
});

async function ownerEmail(): Promise<string> {
  const [row] = (await testApp.dataSource.query(`SELECT email FROM users WHERE id = $1`, [
    world.userIds.owner,
  ])) as Array<{ email: string }>;
  return row!.email;
}
