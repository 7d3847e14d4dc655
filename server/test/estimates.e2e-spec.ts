import { examplePondInput as typicalPond } from '@pondwright/shared/engine';
import { ESTIMATE_VIEW_EVENT_LIMIT, type EstimateView, type ManualLine } from '@pondwright/shared';
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Session = { accessToken: string };

/** Customers are inserted directly: these tests are about estimates, not the customer screens. */
async function addCustomer(companyId: string, name = 'Test Customer A'): Promise<string> {
  const [row] = (await testApp.dataSource.query(
    'INSERT INTO customers (company_id, name) VALUES ($1, $2) RETURNING id',
    [companyId, name],
  )) as [{ id: string }];
  return row.id;
}

async function addSite(companyId: string, customerId: string): Promise<string> {
  const [row] = (await testApp.dataSource.query(
    'INSERT INTO sites (company_id, customer_id, address_line) VALUES ($1, $2, $3) RETURNING id',
    [companyId, customerId, '1 Test Lane'],
  )) as [{ id: string }];
  return row.id;
}

async function createEstimate(session: Session, customerId: string, title = 'Back-garden pond') {
  const response = await testApp
    .http()
    .post('/api/estimates')
    .set(...bearer(session))
    .send({ title, customerId })
    .expect(201);
  return response.body as EstimateView;
}

function draftBody(estimate: EstimateView, changes: Record<string, unknown> = {}) {
  const { content, revision } = estimate.draft;
  return { ...content, revision, ...changes };
}

function saveDraft(session: Session, id: string, body: object) {
  return testApp
    .http()
    .put(`/api/estimates/${id}/draft`)
    .set(...bearer(session))
    .send(body);
}

function finalise(session: Session, id: string, revision: number) {
  return testApp
    .http()
    .post(`/api/estimates/${id}/finalise`)
    .set(...bearer(session))
    .send({ revision });
}

/** The documented fingerprint, recomputed independently: SHA-256 of key-sorted, compact JSON. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const keys = Object.keys(value).sort();
    return `{${keys
      .map((key) => `${JSON.stringify(key)}:${canonical((value as Record<string, unknown>)[key])}`)
      .join(',')}}`;
  }
  return JSON.stringify(value);
}

const cents = (money: string) => Math.round(Number(money) * 100);

const rockSaw: ManualLine = {
  id: 'rock-saw',
  category: 'equipment',
  description: 'Rock saw rental',
  quantity: '2',
  unit: 'day',
  unitCost: '150.00',
  taxable: false,
  kind: 'base',
};

describe('estimates', () => {
  it('creates numbered estimates whose draft the server prices', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const customerId = await addCustomer(owner.companyId);

    const first = await createEstimate(estimator, customerId);
    const second = await createEstimate(estimator, customerId, 'Stream refit');
    expect([first.number, second.number]).toEqual([1, 2]);
    expect(first).toMatchObject({
      title: 'Back-garden pond',
      customerId,
      customerName: 'Test Customer A',
      siteId: null,
      status: 'draft',
      versions: [],
      draft: { revision: 1, content: { discountPct: '0', manualLines: [], scope: '', notes: '' } },
    });
    expect(first.draft.content.input).toEqual(typicalPond());
    expect(cents(first.draft.computed.priced.totals.total)).toBeGreaterThan(0);
    expect(first.events).toEqual([
      expect.objectContaining({ action: 'created', actorName: 'Member estimator' }),
    ]);
  });

  it('stores the server’s numbers on save, ignoring figures the client sent', async () => {
    const owner = await signupCompany(testApp);
    const customerId = await addCustomer(owner.companyId);
    const estimate = await createEstimate(owner, customerId);
    const book = (
      await testApp
        .http()
        .get('/api/price-book')
        .set(...bearer(owner))
        .expect(200)
    ).body.book as { policy: { markupPct: Record<string, string> } };

    const saved = await saveDraft(
      owner,
      estimate.id,
      draftBody(estimate, {
        manualLines: [{ ...rockSaw, price: '1.00' }],
        scope: 'Dig, line and stone the pond.',
        total: '1.00',
        computed: { priced: { totals: { total: '1.00' } } },
      }),
    ).expect(200);
    const view = saved.body as EstimateView;
    expect(view.draft.revision).toBe(2);
    expect(view.draft.content).not.toHaveProperty('total');
    expect(view.draft.content.manualLines).toEqual([rockSaw]);

    // Pencil check (docs/pricing.md): 2 × 150.00 = 300.00, × (1 + equipment markup).
    const markup = Number(book.policy.markupPct.equipment);
    const line = view.draft.computed.priced.lines.find((l) => l.id === 'manual:rock-saw');
    expect(line).toMatchObject({ extendedCost: '300.00', source: 'manual', optionId: null });
    expect(cents(line!.price)).toBe(Math.round(300 * (1 + markup / 100) * 100));

    const { totals, lines } = view.draft.computed.priced;
    expect(cents(totals.subtotalPrice)).toBe(lines.reduce((sum, l) => sum + cents(l.price), 0));
    expect(
      cents(totals.subtotalPrice) - cents(estimate.draft.computed.priced.totals.subtotalPrice),
    ).toBe(cents(line!.price));
    expect(totals.total).not.toBe('1.00');

    const stored = await testApp.dataSource.query(
      `SELECT computed -> 'priced' -> 'totals' ->> 'total' AS total FROM estimate_drafts WHERE estimate_id = $1`,
      [estimate.id],
    );
    expect(stored).toEqual([{ total: totals.total }]);
  });

  it('answers 409 with the current draft for a stale revision and overwrites nothing', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const customerId = await addCustomer(owner.companyId);
    const estimate = await createEstimate(estimator, customerId);

    await saveDraft(
      owner,
      estimate.id,
      draftBody(estimate, { notes: 'Owner: keep the birch.' }),
    ).expect(200);
    const stale = await saveDraft(
      estimator,
      estimate.id,
      draftBody(estimate, { notes: 'Estimator: remove the birch.' }),
    ).expect(409);
    expect(stale.body).toMatchObject({
      statusCode: 409,
      code: 'STALE_DRAFT',
      current: {
        revision: 2,
        content: { notes: 'Owner: keep the birch.' },
        updatedByName: 'Owner Person',
      },
      details: [{ field: 'notes', message: 'Differs from the saved draft' }],
    });
    await finalise(estimator, estimate.id, 1).expect(409);

    const after = await testApp
      .http()
      .get(`/api/estimates/${estimate.id}`)
      .set(...bearer(estimator))
      .expect(200);
    expect(after.body.draft).toMatchObject({
      revision: 2,
      content: { notes: 'Owner: keep the birch.' },
    });
    expect(after.body.versions).toEqual([]);
  });

  it('refuses invalid input with dotted field paths and stores nothing', async () => {
    const owner = await signupCompany(testApp);
    const customerId = await addCustomer(owner.companyId);
    const estimate = await createEstimate(owner, customerId);
    const input = typicalPond();
    input.basins[0]!.maxDepthFt = -1;
    const refused = await saveDraft(
      owner,
      estimate.id,
      draftBody(estimate, { input, discountPct: 'lots' }),
    ).expect(400);
    expect(refused.body.details).toEqual([
      { field: 'discountPct', message: 'Enter a percentage such as 5 or 2.5' },
    ]);
    const badInput = await saveDraft(owner, estimate.id, draftBody(estimate, { input })).expect(
      400,
    );
    expect(badInput.body.details.map((d: { field: string }) => d.field)).toContain(
      'input.basins.0.maxDepthFt',
    );
    const [{ revision }] = await testApp.dataSource.query(
      'SELECT revision FROM estimate_drafts WHERE estimate_id = $1',
      [estimate.id],
    );
    expect(revision).toBe(1);
  });

  it('finalises immutable, hashed versions and compares two of them', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const customerId = await addCustomer(owner.companyId);
    const siteId = await addSite(owner.companyId, customerId);
    const created = await createEstimate(estimator, customerId);
    const saved = (
      await saveDraft(
        estimator,
        created.id,
        draftBody(created, { siteId, manualLines: [rockSaw] }),
      ).expect(200)
    ).body as EstimateView;

    const finalised = (await finalise(estimator, created.id, 2).expect(201)).body as EstimateView;
    expect(saved.draft.computed.priced.approval.needsApproval).toBe(false);
    expect(finalised.status).toBe('approved');
    expect(finalised.versions).toHaveLength(1);
    await finalise(estimator, created.id, 2)
      .expect(409)
      .expect(({ body }) => expect(body.code).toBe('ESTIMATE_NOT_FINALISABLE'));

    const v1 = await testApp
      .http()
      .get(`/api/estimates/${created.id}/versions/1`)
      .set(...bearer(estimator))
      .expect(200);
    const expected = createHash('sha256')
      .update(canonical({ content: v1.body.content, computed: v1.body.computed }), 'utf8')
      .digest('hex');
    expect(v1.body.contentSha256).toBe(expected);
    expect(v1.body.content).toEqual(saved.draft.content);

    await expect(
      testApp.dataSource.query(
        `UPDATE estimate_versions SET content_sha256 = repeat('0', 64) WHERE estimate_id = $1`,
        [created.id],
      ),
    ).rejects.toThrow(/immutable/);
    await expect(
      testApp.dataSource.query('DELETE FROM estimate_versions WHERE estimate_id = $1', [
        created.id,
      ]),
    ).rejects.toThrow(/immutable/);

    // Editing after finalising starts the next draft.
    const edited = (
      await saveDraft(
        estimator,
        created.id,
        draftBody(finalised, { manualLines: [{ ...rockSaw, quantity: '3' }] }),
      ).expect(200)
    ).body as EstimateView;
    expect(edited.status).toBe('draft');
    await finalise(estimator, created.id, 3).expect(201);

    const comparison = await testApp
      .http()
      .get(`/api/estimates/${created.id}/compare?a=1&b=2`)
      .set(...bearer(estimator))
      .expect(200);
    expect(comparison.body.a.versionNumber).toBe(1);
    expect(comparison.body.b.versionNumber).toBe(2);
    expect(comparison.body.lines).toContainEqual(
      expect.objectContaining({
        id: 'manual:rock-saw',
        change: 'changed',
        before: expect.objectContaining({ quantity: '2', extendedCost: '300.00' }),
        after: expect.objectContaining({ quantity: '3', extendedCost: '450.00' }),
        costDelta: '150.00',
      }),
    );
    expect(comparison.body.totals).toContainEqual(
      expect.objectContaining({ field: 'subtotalCost', delta: '150.00' }),
    );
    await testApp
      .http()
      .get(`/api/estimates/${created.id}/compare?a=1&b=9`)
      .set(...bearer(estimator))
      .expect(404);
  });

  it('sends a thin-margin estimate to the owner, who sends it back or approves it', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const customerId = await addCustomer(owner.companyId);
    const created = await createEstimate(estimator, customerId, 'Discounted pond');
    await saveDraft(estimator, created.id, draftBody(created, { discountPct: '30' })).expect(200);
    const finalised = (await finalise(estimator, created.id, 2).expect(201)).body as EstimateView;
    expect(finalised.status).toBe('awaiting_approval');

    const queue = await testApp
      .http()
      .get('/api/approvals')
      .set(...bearer(owner))
      .expect(200);
    expect(queue.body).toEqual([
      expect.objectContaining({
        estimateId: created.id,
        title: 'Discounted pond',
        customerName: 'Test Customer A',
        versionNumber: 1,
        finalisedByName: 'Member estimator',
      }),
    ]);
    expect(queue.body[0].reasons.map((r: { code: string }) => r.code).sort()).toEqual([
      'discount-above-ceiling',
      'margin-below-floor',
    ]);

    await testApp
      .http()
      .get('/api/approvals')
      .set(...bearer(estimator))
      .expect(403);
    await testApp
      .http()
      .post(`/api/estimates/${created.id}/approve`)
      .set(...bearer(estimator))
      .expect(403);
    const noComment = await testApp
      .http()
      .post(`/api/estimates/${created.id}/send-back`)
      .set(...bearer(owner))
      .send({ comment: '  ' })
      .expect(400);
    expect(noComment.body.details).toEqual([
      { field: 'comment', message: 'Say what needs to change' },
    ]);
    const sentBack = await testApp
      .http()
      .post(`/api/estimates/${created.id}/send-back`)
      .set(...bearer(owner))
      .send({ comment: 'Keep the discount at 10 %.' })
      .expect(201);
    expect(sentBack.body.status).toBe('draft');

    await finalise(estimator, created.id, 2).expect(201);
    const approved = await testApp
      .http()
      .post(`/api/estimates/${created.id}/approve`)
      .set(...bearer(owner))
      .expect(201);
    expect(approved.body.status).toBe('approved');
    await testApp
      .http()
      .post(`/api/estimates/${created.id}/approve`)
      .set(...bearer(owner))
      .expect(409);

    const log = (approved.body as EstimateView).events.map((event) => [
      event.action,
      event.actorName,
    ]);
    expect(log).toEqual([
      ['created', 'Member estimator'],
      ['draft-saved', 'Member estimator'],
      ['finalised', 'Member estimator'],
      ['sent-back', 'Owner Person'],
      ['finalised', 'Member estimator'],
      ['approved', 'Owner Person'],
    ]);
    expect((approved.body as EstimateView).events[3]!.detail).toEqual({
      versionNumber: 1,
      comment: 'Keep the discount at 10 %.',
    });
    await testApp
      .http()
      .get('/api/approvals')
      .set(...bearer(owner))
      .expect(200)
      .expect(({ body }) => expect(body).toEqual([]));
  });

  it('lists estimates with status, search and pages', async () => {
    const owner = await signupCompany(testApp);
    const pondsCustomer = await addCustomer(owner.companyId, 'Harbour Test Household');
    const otherCustomer = await addCustomer(owner.companyId, 'Meadow Test Household');
    const pond = await createEstimate(owner, pondsCustomer, 'Koi pond');
    await createEstimate(owner, otherCustomer, 'Wildlife pond');
    await createEstimate(owner, otherCustomer, 'Bubbling rock');
    await finalise(owner, pond.id, 1).expect(201);

    const list = (query: string) =>
      testApp
        .http()
        .get(`/api/estimates${query}`)
        .set(...bearer(owner))
        .expect(200)
        .then((response) => response.body);
    const all = await list('');
    expect(all.total).toBe(3);
    expect(all.items[0]).toEqual({
      id: pond.id,
      number: 1,
      title: 'Koi pond',
      customerName: 'Harbour Test Household',
      status: 'approved',
      total: pond.draft.computed.priced.totals.total,
      grossMarginPct: pond.draft.computed.priced.totals.grossMarginPct,
      updatedAt: expect.any(String),
    });
    expect((await list('?status=approved')).items.map((i: { id: string }) => i.id)).toEqual([
      pond.id,
    ]);
    expect((await list('?q=meadow')).total).toBe(2);
    expect((await list('?q=pond')).total).toBe(2);
    expect((await list('?q=100%25')).total).toBe(0);
    const page = await list('?page=2&pageSize=2');
    expect(page).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(page.items).toHaveLength(1);
    await testApp
      .http()
      .get('/api/estimates?status=lost')
      .set(...bearer(owner))
      .expect(400);
  });

  it('keeps estimates from crew leads and from other companies', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const customerId = await addCustomer(owner.companyId);
    const estimate = await createEstimate(owner, customerId);

    for (const [method, path] of [
      ['get', '/api/estimates'],
      ['post', '/api/estimates'],
      ['get', `/api/estimates/${estimate.id}`],
      ['put', `/api/estimates/${estimate.id}/draft`],
      ['post', `/api/estimates/${estimate.id}/finalise`],
      ['get', `/api/estimates/${estimate.id}/versions/1`],
      ['get', `/api/estimates/${estimate.id}/compare?a=1&b=1`],
      ['get', '/api/approvals'],
      ['post', `/api/estimates/${estimate.id}/approve`],
    ] as const) {
      const agent = testApp.http();
      await agent[method](path)
        .set(...bearer(crewLead))
        .expect(403);
    }

    const other = await signupCompany(testApp);
    const theirCustomer = await addCustomer(other.companyId, 'Test Customer B');
    await testApp
      .http()
      .get(`/api/estimates/${estimate.id}`)
      .set(...bearer(other))
      .expect(404);
    await saveDraft(other, estimate.id, draftBody(estimate)).expect(404);
    await finalise(other, estimate.id, 1).expect(404);
    await testApp
      .http()
      .post(`/api/estimates/${estimate.id}/approve`)
      .set(...bearer(other))
      .expect(404);

    // Another company's customer (or a site of someone else's customer) is not found, and nothing is made.
    await testApp
      .http()
      .post('/api/estimates')
      .set(...bearer(other))
      .send({ title: 'Borrowed customer', customerId })
      .expect(404);
    const foreignSite = await addSite(owner.companyId, customerId);
    await testApp
      .http()
      .post('/api/estimates')
      .set(...bearer(other))
      .send({ title: 'Borrowed site', customerId: theirCustomer, siteId: foreignSite })
      .expect(404);
    await saveDraft(owner, estimate.id, draftBody(estimate, { customerId: theirCustomer })).expect(
      404,
    );
    const [{ count }] = await testApp.dataSource.query(
      'SELECT count(*)::int AS count FROM estimates WHERE company_id = $1',
      [other.companyId],
    );
    expect(count).toBe(0);
  });

  it('sends the latest 50 audit entries with the estimate and the whole log on its own route', async () => {
    const owner = await signupCompany(testApp);
    const customerId = await addCustomer(owner.companyId);
    let estimate = await createEstimate(owner, customerId);
    const saves = ESTIMATE_VIEW_EVENT_LIMIT + 5;
    for (let save = 1; save <= saves; save++) {
      const response = await saveDraft(
        owner,
        estimate.id,
        draftBody(estimate, { notes: `Visit ${save}` }),
      ).expect(200);
      estimate = response.body as EstimateView;
    }

    // One 'created' and one 'draft-saved' per save.
    expect(estimate.eventCount).toBe(saves + 1);
    expect(estimate.events).toHaveLength(ESTIMATE_VIEW_EVENT_LIMIT);
    expect(estimate.events.at(-1)).toMatchObject({
      action: 'draft-saved',
      detail: { revision: saves + 1 },
    });
    expect(estimate.events[0]).toMatchObject({
      detail: { revision: saves + 2 - ESTIMATE_VIEW_EVENT_LIMIT },
    });

    const all = await testApp
      .http()
      .get(`/api/estimates/${estimate.id}/events`)
      .set(...bearer(owner))
      .expect(200);
    const log = all.body as EstimateView['events'];
    expect(log).toHaveLength(saves + 1);
    expect(log[0]).toMatchObject({ action: 'created' });
    expect(log.map((event) => Number(event.id))).toEqual(
      [...log.map((event) => Number(event.id))].sort((a, b) => a - b),
    );
    expect(log.slice(-ESTIMATE_VIEW_EVENT_LIMIT)).toEqual(estimate.events);

    await testApp
      .http()
      .get('/api/estimates/00000000-0000-4000-8000-000000000000/events')
      .set(...bearer(owner))
      .expect(404);
  });
});
