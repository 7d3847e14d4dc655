import { examplePondInput } from '@pondwright/shared/engine';
import type { Role } from '@pondwright/shared';
import type { Test } from 'supertest';
import { bearer, uniqueEmail, type TestApp } from '../support/test-app';
import type { Route } from './route-table';
import type { ObjectKind, Session, World } from './tenant-world';

/**
 * What each path parameter names, keyed by the literal segment before it (`:id` means a customer under
 * `customers/` and a job under `jobs/`). A route with a parameter missing here fails the matrix by name.
 */
export const PARAM_KINDS: Readonly<Record<string, ObjectKind>> = {
  'customers/:id': 'customer',
  'sites/:siteId': 'site',
  'estimates/:id': 'estimate',
  'versions/:versionNumber': 'estimateVersionNumber',
  'quote-links/:linkId': 'quoteLink',
  'jobs/:id': 'job',
  'jobs/:jobId': 'job',
  'logs/:logId': 'log',
  'photos/:photoId': 'photo',
  'change-orders/:orderId': 'changeOrder',
  'invites/:id': 'invite',
  'users/:id': 'teamMember',
  'outbox/:id': 'outboxMessage',
  'priced-takeoffs/:id': 'pricedTakeoff',
  'versions/:id': 'priceBookVersion',
  // Public routes: the token is the credential, so there is no other company's id to try.
  'invites/:token': 'inviteToken',
  'quotes/:token': 'quoteToken',
};

/** Kinds that are not ids of their own but numbers within their parent (version 1 of an estimate). */
export const PARENT_SCOPED_KINDS: ReadonlySet<ObjectKind> = new Set(['estimateVersionNumber']);

/** Files for the multipart routes, made once in `beforeAll`. */
export const uploads: { photo: Buffer; logo: Buffer } = {
  photo: Buffer.alloc(0),
  logo: Buffer.alloc(0),
};

/**
 * How to call each route besides its path. `body` and `multipart` build a valid request from the
 * caller's own company (`own`), so a 404 can only come from the ids in the path; `query` is added to
 * every call; `listQueries` are extra calls of a list that name the other company (`victim`) in the
 * query string. Every route needs an entry: a route added without one fails the matrix by name.
 */
export type RouteSpec = {
  body?: (own: World) => object;
  multipart?: (request: Test, own: World) => Test;
  query?: string;
  listQueries?: (victim: World) => string[];
};

const changeOrderLine = {
  id: 'pergola',
  category: 'materials',
  description: 'Cedar pergola over the bench',
  quantity: '1',
  unit: 'ea',
  unitCost: '900.00',
  taxable: true,
};

const draftBody = (own: World) => ({
  title: 'Redrawn pond',
  customerId: own.objects.customer,
  siteId: null,
  input: examplePondInput(),
  discountPct: '0',
  manualLines: [],
  scope: 'Dig and build a lined pond.',
  notes: '',
  revision: 1,
});

const photoUpload = (request: Test) =>
  request
    .field('kind', 'after')
    .field('caption', 'Finished pond')
    .attach('photo', uploads.photo, { filename: 'IMG_0002.JPG', contentType: 'image/jpeg' });

export const ROUTE_SPECS: Readonly<Record<string, RouteSpec>> = {
  'AuthController.signup': {},
  'AuthController.login': {},
  'AuthController.refresh': {},
  'AuthController.logout': {},
  'AuthController.me': {},
  'AuthController.previewInvite': {},
  'AuthController.acceptInvite': {},

  'ChangeOrdersController.list': {},
  'ChangeOrdersController.create': {
    body: () => ({ title: 'Pergola', reason: 'Asked for on site', lines: [changeOrderLine] }),
  },
  'ChangeOrdersController.send': { body: () => ({}) },

  'CompaniesController.current': {},
  'CompaniesController.update': { body: () => ({ name: 'Renamed Water Gardens' }) },
  'CompaniesController.quoteTerms': {},
  'CompaniesController.setQuoteTerms': { body: () => ({ terms: 'Net 30 days.' }) },
  'CompaniesController.setLogo': {
    multipart: (request) =>
      request.attach('logo', uploads.logo, { filename: 'logo.png', contentType: 'image/png' }),
  },
  'CompaniesController.removeLogo': {},
  'CompaniesController.logo': {},

  'CrewsController.list': {},
  'CrewsController.create': { body: () => ({ name: 'Night crew', leadUserId: null }) },

  'CustomersController.list': {
    listQueries: (victim) => [`?search=${victim.tag}`, `?search=${victim.tag}&sort=name`],
  },
  'CustomersController.create': { body: () => ({ name: 'Marlow Newcomer' }) },
  'CustomersController.get': {},
  'CustomersController.update': { body: () => ({ name: 'Renamed Customer', notes: 'Changed' }) },
  'CustomersController.remove': {},
  'CustomersController.addSite': { body: () => ({ addressLine: '9 Moss Way' }) },
  'CustomersController.updateSite': { body: () => ({ notes: 'Gate code changed' }) },
  'CustomersController.removeSite': {},

  'EstimatesStatsController.get': {},
  'EstimatesController.create': {
    body: (own) => ({ title: 'Wildlife pond', customerId: own.objects.customer }),
  },
  'EstimatesController.list': {
    listQueries: (victim) => [`?search=${victim.tag}`, '?status=accepted'],
  },
  'EstimatesController.get': {},
  'EstimatesController.events': {},
  'EstimatesController.saveDraft': { body: draftBody },
  'EstimatesController.finalise': { body: () => ({ revision: 1 }) },
  'EstimatesController.getVersion': {},
  'EstimatesController.compare': { query: '?a=1&b=2' },
  'EstimatesController.approve': {},
  'EstimatesController.sendBack': { body: () => ({ comment: 'Lower the discount' }) },
  'ApprovalsController.queue': {},

  'EstimateQuoteController.send': {
    body: () => ({ recipientEmail: 'intruder@example.test', message: 'Here it is' }),
  },
  'EstimateQuoteController.status': {},
  'EstimateQuoteController.revoke': {},
  'EstimateQuoteController.pdf': {},

  'HealthController.check': {},
  'HealthController.live': {},

  'InvitesController.list': {},
  'InvitesController.create': {
    body: () => ({ email: uniqueEmail('invitee'), role: 'estimator' }),
  },
  'InvitesController.revoke': {},

  'InvoicesController.get': {},
  'InvoicesController.send': { body: () => ({ recipientEmail: 'intruder@example.test' }) },

  'JobsController.report': {},
  'JobsController.reportCsv': {},
  'JobsController.create': { body: (own) => ({ estimateId: own.objects.estimate }) },
  'JobsController.list': {
    listQueries: (victim) => [
      `?crewId=${victim.crewId}`,
      '?from=2027-01-01&to=2027-12-31',
      '?status=completed',
    ],
  },
  'JobsController.get': {},
  'JobsController.reschedule': {
    body: (own) => ({ plannedStart: '2027-04-05', crewId: own.crewId, reason: 'weather' }),
  },
  'JobsController.setStatus': { body: () => ({ status: 'in_progress' }) },
  'JobsController.listLogs': {},
  'JobsController.saveLog': {
    body: () => ({
      logDate: '2027-03-22',
      notes: 'Edited elsewhere',
      entries: [],
      baseRevision: 1,
    }),
  },

  'LearnedRatesController.list': {},
  'LearnedRatesController.adopt': { body: () => ({ parameter: 'pumpSetLaborHours' }) },

  'DevMailboxController.list': {},
  'DevMailboxController.clear': {},

  'OutboxController.retry': {},

  'PaymentsWebhookController.receive': {},

  'PhotosController.list': {},
  'PhotosController.upload': { multipart: photoUpload },
  'PhotosController.image': {},
  'PhotosController.thumbnail': {},

  'PriceBookController.current': {},
  'PriceBookController.save': {},
  'PriceBookController.listVersions': {},
  'PriceBookController.getVersion': {},
  'PriceBookController.versionChanges': {},
  'PriceBookController.policy': {},
  'PriceBookController.savePolicy': {},
  'PriceBookController.exportCsv': {},
  'PriceBookController.importCsv': {},
  'PriceBookController.materials': {},

  'PricedTakeoffsController.create': {
    body: () => ({ name: 'Patio pond', input: examplePondInput() }),
  },
  'PricedTakeoffsController.list': {},
  'PricedTakeoffsController.get': {},
  'PricedTakeoffsController.repricePreview': {},
  'PricedTakeoffsController.reprice': {},

  'PublicQuotesController.view': {},
  'PublicQuotesController.accept': {},
  'PublicQuotesController.decline': {},
  'PublicQuotesController.checkout': {},
  'PublicQuotesController.pdf': {},
  'PublicQuotesController.logo': {},

  'TakeoffController.compute': { body: () => examplePondInput() },

  'UsersController.list': {},
  'UsersController.get': {},
  'UsersController.update': { body: () => ({ role: 'crew_lead' }) },
  'UsersController.remove': {},
};

export const isWrite = (route: Route) => route.method !== 'GET';

/** The route's path with each parameter taken from the world `pick` chooses for it. */
export function fillPath(route: Route, pick: (paramIndex: number) => World): string {
  let index = 0;
  return route.path.replace(/:([A-Za-z_]\w*)/g, (_match, name: string) => {
    const param = route.params[index]!;
    if (param.name !== name) throw new Error(`${route.name}: parameters out of order`);
    const kind = PARAM_KINDS[param.key]!;
    return encodeURIComponent(pick(index++).objects[kind]);
  });
}

/** `text` is the headers and the body, for searching; `body` the body alone. */
export type Answer = { status: number; text: string; body: string; json: unknown };

/**
 * Calls a route as `session` (anonymous when null) with the route's own body, built from `own`, and
 * keeps the raw answer (headers and body as text) so any response type can be searched.
 */
export async function callRoute(
  testApp: TestApp,
  route: Route,
  path: string,
  session: Session | null,
  own: World,
  bodyOverride?: object,
): Promise<Answer> {
  const spec = ROUTE_SPECS[route.name] ?? {};
  const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let request = testApp.http()[method](`${path}${spec.query ?? ''}`);
  if (session) request = request.set(...bearer(session));
  request = request.buffer(true).parse((response, done) => {
    const chunks: Buffer[] = [];
    response.on('data', (chunk: Buffer) => chunks.push(chunk));
    response.on('end', () => done(null, Buffer.concat(chunks)));
  });
  if (bodyOverride) request = request.send(bodyOverride);
  else if (spec.multipart) request = spec.multipart(request, own);
  else if (spec.body && route.method !== 'GET') request = request.send(spec.body(own));
  const response = await request;
  const body = (response.body as Buffer).toString('utf8');
  let json: unknown = null;
  try {
    json = JSON.parse(body);
  } catch {
    json = null;
  }
  return {
    status: response.status,
    text: `${JSON.stringify(response.headers)}\n${body}`,
    body,
    json,
  };
}

/** Calls a plain GET as `session` and answers the parsed body (for re-reading an object). */
export async function read(testApp: TestApp, session: Session, path: string): Promise<unknown> {
  const response = await testApp
    .http()
    .get(path)
    .set(...bearer(session));
  return { status: response.status, body: response.body as unknown };
}

/** The secrets of `victim` that appear in an answer. */
export function leaks(answer: Answer, victim: World): string[] {
  return victim.secrets.filter((secret) => answer.text.includes(secret));
}

export const describeCall = (route: Route, path: string, role: Role | 'anonymous') =>
  `${route.name} (${route.method} ${path}) as ${role}`;
