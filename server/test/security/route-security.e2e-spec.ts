import { ROLES, type Role } from '@pondwright/shared';
import { examplePondInput } from '@pondwright/shared/engine';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeS3, type FakeS3 } from '../../src/dev-fakes/fake-s3';
import { bearer, createTestApp, uniqueEmail, type TestApp } from '../support/test-app';
import { changedTables, snapshotCompany } from './company-snapshot';
import {
  callRoute,
  describeCall,
  fillPath,
  isWrite,
  leaks,
  PARAM_KINDS,
  PARENT_SCOPED_KINDS,
  read,
  ROUTE_SPECS,
  uploads,
  type Answer,
} from './route-requests';
import { discoverRoutes, mountedRoutes, type Route } from './route-table';
import { buildWorld, photoBytes, type ObjectKind, type World } from './tenant-world';

/**
 * Cases kept out of the matrix because they expose a bug the owner of that code has yet to fix. Each
 * entry is the case's key exactly as its failure message begins (`<check> <Controller.handler> ...`),
 * with the bug beside it. The request is still sent, so later cases see the same state, but its
 * failure is not counted. Remove the entry with the fix.
 */
const KNOWN_GAPS: ReadonlyArray<{ key: string; bug: string }> = [];

const isKnownGap = (key: string) => KNOWN_GAPS.some((gap) => gap.key === key);

let testApp: TestApp;
let s3: FakeS3;
const s3Directory = mkdtempSync(join(tmpdir(), 'pondwright-security-s3-'));
let routes: Route[];
/** Company A: signs in and tries company B's ids. */
let attacker: World;
/** Company B: owns real objects of every kind. */
let victim: World;
const requestCounts: Record<string, number> = {};

beforeAll(async () => {
  s3 = await startFakeS3({ port: 0, directory: s3Directory, bucket: 'security-test' });
  testApp = await createTestApp({ S3_ENDPOINT: s3.url, S3_BUCKET: 'security-test' });
  uploads.photo = await photoBytes(200);
  uploads.logo = await sharp({
    create: { width: 16, height: 16, channels: 3, background: '#336699' },
  })
    .png()
    .toBuffer();
  [attacker, victim] = await Promise.all([
    buildWorld(testApp, 'alpha', { spares: true }),
    buildWorld(testApp, 'bravo'),
  ]);
  routes = discoverRoutes(testApp.app);
}, 120_000);

afterAll(async () => {
  console.info(
    `route security: ${routes?.length ?? 0} routes; requests per matrix ${JSON.stringify(requestCounts)}`,
  );
  await testApp?.close();
  await s3?.stop();
  rmSync(s3Directory, { recursive: true, force: true });
});

const count = (matrix: string) => {
  requestCounts[matrix] = (requestCounts[matrix] ?? 0) + 1;
};

const kindOf = (route: Route, index: number): ObjectKind => PARAM_KINDS[route.params[index]!.key]!;

/** The routes the matrices can call: known to ROUTE_SPECS with every parameter mapped. */
function buildableRoutes(): Route[] {
  return routes.filter(
    (route) =>
      ROUTE_SPECS[route.name] &&
      !route.unbuildable &&
      route.params.every((param) => PARAM_KINDS[param.key]),
  );
}

const guarded = () => buildableRoutes().filter((route) => !route.isPublic);
const withIds = () => guarded().filter((route) => route.params.length > 0);

/**
 * Whose id goes in each parameter: every one of B's, then, with two or more ids, one of B's among
 * A's own (B's log under A's job, A's log under B's job). A number within its parent (an estimate's
 * version number) follows the id before it.
 */
function tenantVariants(route: Route): Array<{ label: string; worlds: World[] }> {
  const variants = [{ label: "all of B's ids", worlds: route.params.map(() => victim) }];
  const idIndexes = route.params
    .map((_, index) => index)
    .filter((index) => !PARENT_SCOPED_KINDS.has(kindOf(route, index)));
  if (idIndexes.length > 1) {
    for (const foreign of idIndexes) {
      const worlds: World[] = [];
      route.params.forEach((_, index) => {
        if (PARENT_SCOPED_KINDS.has(kindOf(route, index))) worlds.push(worlds[index - 1]!);
        else worlds.push(index === foreign ? victim : attacker);
      });
      variants.push({ label: `B's ${route.params[foreign]!.key} in A's path`, worlds });
    }
  }
  return variants;
}

/** The read that shows B's object of each kind as B sees it (null: only the snapshot sees it). */
const REREAD: Record<ObjectKind, ((world: World) => string) | null> = {
  customer: (w) => `/api/customers/${w.objects.customer}`,
  site: (w) => `/api/customers/${w.objects.customer}`,
  estimate: (w) => `/api/estimates/${w.objects.estimate}`,
  estimateVersionNumber: (w) => `/api/estimates/${w.objects.estimate}/versions/1`,
  quoteLink: (w) => `/api/estimates/${w.objects.estimate}/quote`,
  job: (w) => `/api/jobs/${w.objects.job}`,
  log: (w) => `/api/jobs/${w.objects.job}/logs`,
  photo: (w) => `/api/jobs/${w.objects.job}/photos`,
  changeOrder: (w) => `/api/jobs/${w.objects.job}/change-orders`,
  invite: () => '/api/invites',
  teamMember: (w) => `/api/users/${w.objects.teamMember}`,
  outboxMessage: null,
  pricedTakeoff: (w) => `/api/priced-takeoffs/${w.objects.pricedTakeoff}`,
  priceBookVersion: (w) => `/api/price-book/versions/${w.objects.priceBookVersion}`,
  inviteToken: null,
  quoteToken: null,
};

async function rereadVictim(route: Route, worlds: World[]): Promise<Record<string, unknown>> {
  const reads: Record<string, unknown> = {};
  for (const [index, world] of worlds.entries()) {
    const path = world === victim ? REREAD[kindOf(route, index)]?.(victim) : undefined;
    if (path && !(path in reads)) reads[path] = await read(testApp, victim.sessions.owner, path);
  }
  return reads;
}

function check(failures: string[], key: string, problem: string | null) {
  if (problem && !isKnownGap(key)) failures.push(`${key}: ${problem}`);
}

const report = (failures: string[]) => `${failures.length} failure(s):\n${failures.join('\n')}`;

describe('the route table', () => {
  it('is read from Nest, mounted as built, and every route has an entry the matrices can call', () => {
    const problems: string[] = [];
    const mounted = mountedRoutes(testApp.app);
    const seen = new Set<string>();
    for (const route of routes) {
      const signature = `${route.method} ${route.path}`;
      if (seen.has(signature)) problems.push(`${route.name}: ${signature} is declared twice`);
      seen.add(signature);
      if (!mounted.has(signature)) problems.push(`${route.name}: ${signature} is not mounted`);
      if (!ROUTE_SPECS[route.name]) problems.push(`${route.name}: no entry in ROUTE_SPECS`);
      if (route.unbuildable)
        problems.push(`${route.name}: cannot build a request: ${route.unbuildable}`);
      for (const param of route.params) {
        if (!PARAM_KINDS[param.key]) {
          problems.push(
            `${route.name}: no object mapped for parameter ${param.key} in PARAM_KINDS`,
          );
        }
      }
      if (!route.isPublic && route.roles.length === 0) {
        problems.push(`${route.name}: neither @Public() nor @Roles(...)`);
      }
    }
    const names = new Set(routes.map((route) => route.name));
    for (const name of Object.keys(ROUTE_SPECS)) {
      if (!names.has(name)) problems.push(`${name}: in ROUTE_SPECS but no longer a route`);
    }
    for (const gap of KNOWN_GAPS) {
      if (!names.has(gap.key.split(' ')[1] ?? '')) {
        problems.push(`KNOWN_GAPS "${gap.key}" names no route`);
      }
    }
    expect(routes.length).toBeGreaterThan(80);
    expect(problems).toEqual([]);
  });
});

describe('the role matrix', () => {
  it('answers 401 to an anonymous caller on every route that is not public', async () => {
    const failures: string[] = [];
    for (const route of guarded()) {
      const path = fillPath(route, () => attacker);
      const answer = await callRoute(testApp, route, path, null, attacker);
      count('anonymous');
      check(
        failures,
        `anonymous ${route.name}`,
        answer.status === 401
          ? null
          : `${describeCall(route, path, 'anonymous')} answered ${answer.status}`,
      );
    }
    expect(failures, report(failures)).toEqual([]);
  });

  it('answers 403 to every signed-in role the route does not allow', async () => {
    const failures: string[] = [];
    for (const route of guarded()) {
      const path = fillPath(route, () => attacker);
      for (const role of ROLES.filter((r) => !route.roles.includes(r))) {
        const answer = await callRoute(testApp, route, path, attacker.sessions[role], attacker);
        count('forbidden role');
        check(
          failures,
          `role ${route.name} ${role}`,
          answer.status === 403
            ? null
            : `${describeCall(route, path, role)} answered ${answer.status}`,
        );
      }
    }
    expect(failures, report(failures)).toEqual([]);
  });
});

describe('tenant isolation', () => {
  /** Every allowed role of A calls every variant; each must be 404 with nothing of B's in it. */
  async function tryVictimIds(route: Route, failures: string[]) {
    const before = await snapshotCompany(testApp.dataSource, victim.companyId);
    for (const variant of tenantVariants(route)) {
      const path = fillPath(route, (index) => variant.worlds[index]!);
      for (const role of route.roles) {
        const key = `tenant ${route.name} ${variant.label} as ${role}`;
        const readsBefore = isWrite(route) ? await rereadVictim(route, variant.worlds) : {};
        const answer: Answer = await callRoute(
          testApp,
          route,
          path,
          attacker.sessions[role],
          attacker,
        );
        count(isWrite(route) ? 'tenant writes' : 'tenant reads');
        const problems: string[] = [];
        if (answer.status !== 404) problems.push(`answered ${answer.status}, not 404`);
        const leaked = leaks(answer, victim);
        if (leaked.length) problems.push(`answer contains B's ${leaked.join(', ')}`);
        if (isWrite(route)) {
          const readsAfter = await rereadVictim(route, variant.worlds);
          for (const [readPath, value] of Object.entries(readsBefore)) {
            if (JSON.stringify(value) !== JSON.stringify(readsAfter[readPath])) {
              problems.push(`B's ${readPath} reads differently afterwards`);
            }
          }
        }
        check(
          failures,
          key,
          problems.length ? `${describeCall(route, path, role)}: ${problems.join('; ')}` : null,
        );
      }
    }
    const changed = changedTables(
      before,
      await snapshotCompany(testApp.dataSource, victim.companyId),
    );
    check(
      failures,
      `tenant ${route.name} rows`,
      changed.length ? `B's rows changed in ${changed.join(', ')}` : null,
    );
  }

  it("answers 404 and nothing of B's when A reads with B's ids", async () => {
    const failures: string[] = [];
    for (const route of withIds().filter((r) => !isWrite(r))) await tryVictimIds(route, failures);
    expect(failures, report(failures)).toEqual([]);
  });

  it("answers 404 and leaves B unchanged when A writes with B's ids", async () => {
    const failures: string[] = [];
    for (const route of withIds().filter(isWrite)) await tryVictimIds(route, failures);
    expect(failures, report(failures)).toEqual([]);
  });

  it("lists nothing of B's on any route without ids, whatever the query", async () => {
    const failures: string[] = [];
    const lists = guarded().filter((route) => route.method === 'GET' && route.params.length === 0);
    for (const route of lists) {
      const queries = ['', ...(ROUTE_SPECS[route.name]!.listQueries?.(victim) ?? [])];
      for (const query of queries) {
        for (const role of route.roles) {
          const path = `${route.path}${query}`;
          const answer = await callRoute(testApp, route, path, attacker.sessions[role], attacker);
          count('lists');
          const problems: string[] = [];
          if (answer.status >= 500 || answer.status === 401 || answer.status === 403) {
            problems.push(`answered ${answer.status}`);
          }
          const leaked = leaks(answer, victim);
          if (leaked.length) problems.push(`answer contains B's ${leaked.join(', ')}`);
          check(
            failures,
            `list ${route.name} ${query || 'no query'} as ${role}`,
            problems.length ? `${describeCall(route, path, role)}: ${problems.join('; ')}` : null,
          );
        }
      }
    }
    expect(failures, report(failures)).toEqual([]);
  });

  /**
   * B's ids sent in a request body, on A's own objects. The answer must be the one a made-up id gets
   * (404, or 400 naming the field), so it reveals neither B's data nor that the id exists.
   */
  it("refuses B's ids in a request body exactly as it refuses made-up ids", async () => {
    const spares = attacker.spares!;
    const draft = {
      title: 'Redrawn pond',
      siteId: null,
      input: examplePondInput(),
      discountPct: '0',
      manualLines: [],
      scope: '',
      notes: '',
      revision: spares.draftRevision,
    };
    const cases: Array<{
      name: string;
      method: 'post' | 'put';
      path: string;
      reference: string;
      body: (id: string) => object;
      multipart?: boolean;
    }> = [
      {
        name: "JobsController.create from B's accepted estimate",
        method: 'post',
        path: '/api/jobs',
        reference: victim.objects.estimate,
        body: (id) => ({ estimateId: id }),
      },
      {
        name: "JobsController.create with B's crew",
        method: 'post',
        path: '/api/jobs',
        reference: victim.crewId,
        body: (id) => ({ estimateId: spares.acceptedEstimateId, crewId: id }),
      },
      {
        name: "JobsController.reschedule onto B's crew",
        method: 'post',
        path: `/api/jobs/${spares.openJobId}/schedule`,
        reference: victim.crewId,
        body: (id) => ({ plannedStart: '2027-05-03', crewId: id, reason: 'crew' }),
      },
      {
        name: "EstimatesController.create for B's customer",
        method: 'post',
        path: '/api/estimates',
        reference: victim.estimateCustomerId,
        body: (id) => ({ title: 'Borrowed customer', customerId: id }),
      },
      {
        name: "EstimatesController.create at B's site",
        method: 'post',
        path: '/api/estimates',
        reference: victim.objects.site,
        body: (id) => ({
          title: 'Borrowed site',
          customerId: attacker.objects.customer,
          siteId: id,
        }),
      },
      {
        name: "EstimatesController.saveDraft for B's customer",
        method: 'put',
        path: `/api/estimates/${spares.draftEstimateId}/draft`,
        reference: victim.objects.customer,
        body: (id) => ({ ...draft, customerId: id }),
      },
      {
        name: "EstimatesController.saveDraft at B's site",
        method: 'put',
        path: `/api/estimates/${spares.draftEstimateId}/draft`,
        reference: victim.objects.site,
        body: (id) => ({ ...draft, customerId: attacker.objects.customer, siteId: id }),
      },
      {
        name: "CrewsController.create led by B's crew lead",
        method: 'post',
        path: '/api/crews',
        reference: victim.userIds.crew_lead,
        body: (id) => ({ name: 'Borrowed lead', leadUserId: id }),
      },
      {
        name: "PhotosController.upload filed under B's daily log",
        method: 'put',
        path: `/api/jobs/${spares.openJobId}/photos`,
        reference: victim.objects.log,
        body: (id) => ({ logId: id }),
        multipart: true,
      },
    ];
    const failures: string[] = [];
    for (const testCase of cases) {
      const send = async (id: string) => {
        const path = testCase.multipart ? `${testCase.path}/${randomUUID()}` : testCase.path;
        const agent = testApp.http();
        let request = agent[testCase.method](path).set(...bearer(attacker.sessions.owner));
        if (testCase.multipart) {
          request = request
            .field('kind', 'progress')
            .field('logId', id)
            .attach('photo', uploads.photo, { filename: 'x.jpg', contentType: 'image/jpeg' });
        } else {
          request = request.send(testCase.body(id));
        }
        const response = await request;
        count('body references');
        // Each answer carries its own request id; everything else must match.
        const { requestId: _requestId, ...body } = response.body as Record<string, unknown>;
        return {
          status: response.status,
          text: `${JSON.stringify(response.headers)}\n${response.text}`,
          body: JSON.stringify(body).replaceAll(id, '<id>'),
        };
      };
      const before = await snapshotCompany(testApp.dataSource, victim.companyId);
      const theirs = await send(testCase.reference);
      const madeUp = await send(randomUUID());
      const changed = changedTables(
        before,
        await snapshotCompany(testApp.dataSource, victim.companyId),
      );
      const problems: string[] = [];
      if (theirs.status < 400) problems.push(`accepted B's id with ${theirs.status}`);
      if (theirs.status !== madeUp.status || theirs.body !== madeUp.body) {
        problems.push(
          `answered ${theirs.status} ${theirs.body} for B's id but ${madeUp.status} ${madeUp.body} for a made-up one`,
        );
      }
      const leaked = victim.secrets.filter(
        (secret) => secret !== testCase.reference && theirs.text.includes(secret),
      );
      if (leaked.length) problems.push(`answer contains B's ${leaked.join(', ')}`);
      if (changed.length) problems.push(`B's rows changed in ${changed.join(', ')}`);
      check(failures, `body ${testCase.name}`, problems.length ? problems.join('; ') : null);
    }
    expect(failures, report(failures)).toEqual([]);
  });

  /**
   * Figures and lists A reads must not move when B's data does: counts, sums and learned rates carry
   * none of B's ids, so only this shows a query that forgot the company.
   */
  it("shows A the same lists and figures after B's changes", async () => {
    const lists = guarded().filter((route) => route.method === 'GET' && route.params.length === 0);
    const answers = async (world: World) => {
      const seen: Record<string, string> = {};
      for (const route of lists) {
        const role = route.roles.includes('owner') ? 'owner' : route.roles[0]!;
        const answer = await callRoute(testApp, route, route.path, world.sessions[role], world);
        count('lists before and after');
        seen[route.name] = `${answer.status} ${answer.body.replace(/"requestId":"[^"]*"/, '')}`;
      }
      return seen;
    };
    const [attackerBefore, victimBefore] = [await answers(attacker), await answers(victim)];

    const owner = victim.sessions.owner;
    const post = (path: string, body: object, status = 201) =>
      testApp
        .http()
        .post(path)
        .set(...bearer(owner))
        .send(body)
        .expect(status);
    await post('/api/customers', { name: `${victim.tag} Newcomer` });
    await post('/api/estimates', {
      title: `${victim.tag} second pond`,
      customerId: victim.objects.customer,
    });
    // Closing the job teaches B's learned rates from it.
    await post(`/api/jobs/${victim.objects.job}/status`, { status: 'closed' }, 200);
    await post('/api/crews', { name: `${victim.tag} south crew` });
    await post('/api/invites', { email: uniqueEmail(victim.tag), role: 'estimator' });
    await post('/api/priced-takeoffs', {
      name: `${victim.tag} second takeoff`,
      input: examplePondInput(),
    });
    count('lists before and after');

    const [attackerAfter, victimAfter] = [await answers(attacker), await answers(victim)];
    const moved = (before: Record<string, string>, after: Record<string, string>) =>
      lists.map((route) => route.name).filter((name) => before[name] !== after[name]);
    expect(moved(attackerBefore, attackerAfter)).toEqual([]);
    // B's own answers did move, so the changes reached every kind of figure A was compared on.
    expect(moved(victimBefore, victimAfter)).toEqual(
      expect.arrayContaining([
        'CustomersController.list',
        'EstimatesController.list',
        'EstimatesStatsController.get',
        'LearnedRatesController.list',
        'JobsController.list',
        'CrewsController.list',
        'InvitesController.list',
        'PricedTakeoffsController.list',
      ]),
    );
  });

  /**
   * The controls: B's owner makes the same calls on B's own objects and is not told 404, so every 404
   * above came from the company check and not from a wrong path, body or id. Runs last: it changes B.
   */
  it('finds every one of those objects for the company that owns them', async () => {
    const failures: string[] = [];
    const ownerRole = (route: Route): Role =>
      route.roles.includes('owner') ? 'owner' : route.roles[0]!;
    const reads = withIds().filter((route) => !isWrite(route));
    // Deletions last, children before parents, so no control removes what a later one needs.
    const writes = withIds()
      .filter(isWrite)
      .sort(
        (a, b) =>
          Number(a.method === 'DELETE') - Number(b.method === 'DELETE') ||
          (a.method === 'DELETE' ? b.params.length - a.params.length : 0),
      );
    for (const route of [...reads, ...writes]) {
      const role = ownerRole(route);
      const path = fillPath(route, () => victim);
      const answer = await callRoute(testApp, route, path, victim.sessions[role], victim);
      count('controls');
      const ok = isWrite(route)
        ? ![401, 403, 404].includes(answer.status) && answer.status < 500
        : answer.status >= 200 && answer.status < 300;
      check(
        failures,
        `control ${route.name}`,
        ok
          ? null
          : `${describeCall(route, path, role)} answered ${answer.status} ${answer.text.split('\n')[1]}`,
      );
    }
    expect(failures, report(failures)).toEqual([]);
  });
});
