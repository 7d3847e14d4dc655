import type { CustomerDetail, EstimateView, JobView } from '@pondwright/shared';
import { examplePondInput } from '@pondwright/shared/engine';
import type { PriceBook } from '@pondwright/shared/pricing';
import { randomUUID } from 'node:crypto';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { acceptedEstimate, addCustomer } from '../support/quote-fixtures';
import {
  addMember,
  bearer,
  createTestApp,
  GOOD_PASSWORD,
  randomIp,
  signupCompany,
  tokenFromInviteUrl,
  uniqueEmail,
  type TestApp,
} from '../support/test-app';

/**
 * Mass assignment: a client that adds fields the form never sends (another company's id, an id of
 * its choosing, a status, totals, an approver, an author, a role) must have them refused (400) or
 * dropped, never stored. Every case re-reads what it tried to change, through the API and the rows.
 */
let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

type Owner = Awaited<ReturnType<typeof signupCompany>>;
type Session = { accessToken: string };

/** The fields an attacker adds, naming company B and B's owner wherever an id fits. */
function hostileFields(victim: Owner) {
  return {
    id: randomUUID(),
    companyId: victim.companyId,
    company_id: victim.companyId,
    status: 'approved',
    total: '0.01',
    totals: { total: '0.01', deposit: '0.00' },
    approvedById: victim.userId,
    approver: victim.userId,
    createdById: victim.userId,
    created_by: victim.userId,
    role: 'owner',
    createdAt: '2000-01-01T00:00:00.000Z',
  };
}

function call(
  session: Session,
  method: 'post' | 'put' | 'patch',
  path: string,
  body: object,
): Promise<Response> {
  const agent = testApp.http();
  return agent[method](path)
    .set(...bearer(session))
    .send(body);
}

async function expectRefused(response: Response, label: string) {
  expect(response.status, `${label}: ${response.text}`).toBe(400);
}

const rows = <T>(sql: string, params: unknown[]) =>
  testApp.dataSource.query(sql, params) as Promise<T[]>;

let owner: Owner;
let victim: Owner;
let estimator: Awaited<ReturnType<typeof addMember>>;
let crewLead: Awaited<ReturnType<typeof addMember>>;
let hostile: ReturnType<typeof hostileFields>;

beforeAll(async () => {
  [owner, victim] = await Promise.all([signupCompany(testApp), signupCompany(testApp)]);
  [estimator, crewLead] = await Promise.all([
    addMember(testApp, owner, 'estimator'),
    addMember(testApp, owner, 'crew_lead'),
  ]);
  hostile = hostileFields(victim);
});

/** Nothing anywhere carries the id the attacker chose. */
async function expectIdUnused(id: string) {
  const tables = ['customers', 'sites', 'estimates', 'jobs', 'crews', 'users', 'invites'];
  for (const table of tables) {
    expect(await rows(`SELECT 1 FROM ${table} WHERE id = $1`, [id]), table).toEqual([]);
  }
}

describe('customers', () => {
  it('refuses extra fields on create, on update, and inside the sites sent along', async () => {
    const countBefore = await rows(
      `SELECT count(*)::int AS n FROM customers WHERE company_id = $1`,
      [owner.companyId],
    );
    await expectRefused(
      await call(estimator, 'post', '/api/customers', { name: 'Extra Fieldson', ...hostile }),
      'create',
    );
    const { role: _role, ...siteExtras } = hostile;
    await expectRefused(
      await call(estimator, 'post', '/api/customers', {
        name: 'Extra Fieldson',
        sites: [{ addressLine: '1 Spoof Lane', customerId: randomUUID(), ...siteExtras }],
      }),
      'create with a site',
    );
    expect(
      await rows(`SELECT count(*)::int AS n FROM customers WHERE company_id = $1`, [
        owner.companyId,
      ]),
    ).toEqual(countBefore);
    expect(await rows(`SELECT 1 FROM customers WHERE name = 'Extra Fieldson'`, [])).toEqual([]);

    const customer = (
      await call(estimator, 'post', '/api/customers', {
        name: 'Plain Fieldson',
        sites: [{ addressLine: '2 Honest Lane' }],
      }).then((r) => (expect(r.status).toBe(201), r))
    ).body as CustomerDetail;
    const site = customer.sites[0]!;
    await expectRefused(
      await call(estimator, 'patch', `/api/customers/${customer.id}`, {
        name: 'Renamed',
        ...hostile,
      }),
      'update',
    );
    await expectRefused(
      await call(estimator, 'post', `/api/customers/${customer.id}/sites`, {
        addressLine: '3 Spoof Lane',
        ...siteExtras,
      }),
      'add a site',
    );
    await expectRefused(
      await call(estimator, 'patch', `/api/customers/${customer.id}/sites/${site.id}`, {
        notes: 'moved',
        customerId: randomUUID(),
        ...siteExtras,
      }),
      'update a site',
    );
    const reread = (
      await testApp
        .http()
        .get(`/api/customers/${customer.id}`)
        .set(...bearer(estimator))
        .expect(200)
    ).body as CustomerDetail;
    expect(reread).toEqual(customer);
    expect(await rows(`SELECT company_id FROM customers WHERE id = $1`, [customer.id])).toEqual([
      { company_id: owner.companyId },
    ]);
    expect(
      await rows(`SELECT company_id, customer_id FROM sites WHERE id = $1`, [site.id]),
    ).toEqual([{ company_id: owner.companyId, customer_id: customer.id }]);
    await expectIdUnused(hostile.id);
  });
});

describe('estimates', () => {
  it('refuses extra fields on create and finalise, and drops them from a draft: status, totals, author and company stay the server’s', async () => {
    const customerId = await addCustomer(testApp, owner.companyId, 'Marsh Wren');
    const estimatesBefore = await rows(
      `SELECT count(*)::int AS n FROM estimates WHERE company_id IN ($1, $2)`,
      [owner.companyId, victim.companyId],
    );
    await expectRefused(
      await call(estimator, 'post', '/api/estimates', {
        title: 'Spoofed pond',
        customerId,
        number: 1,
        ...hostile,
      }),
      'create',
    );
    expect(
      await rows(`SELECT count(*)::int AS n FROM estimates WHERE company_id IN ($1, $2)`, [
        owner.companyId,
        victim.companyId,
      ]),
    ).toEqual(estimatesBefore);

    const created = (
      await call(estimator, 'post', '/api/estimates', { title: 'Honest pond', customerId })
    ).body as EstimateView;
    expect(created.status).toBe('draft');
    const line = {
      id: 'bench',
      category: 'materials',
      description: 'Flagstone bench',
      quantity: '1',
      unit: 'ea',
      unitCost: '400.00',
      taxable: true,
      kind: 'base',
    };
    const content = { ...created.draft.content, manualLines: [line], scope: 'Dig a pond.' };
    const clean = await call(estimator, 'put', `/api/estimates/${created.id}/draft`, {
      ...content,
      revision: created.draft.revision,
    });
    expect(clean.status).toBe(200);
    const cleanView = clean.body as EstimateView;

    // The same content with figures of the client's own, at the top and on the manual line.
    const spoofed = await call(estimator, 'put', `/api/estimates/${created.id}/draft`, {
      ...content,
      ...hostile,
      number: 1,
      computed: { totals: { total: '0.01' } },
      priceBookVersionId: randomUUID(),
      manualLines: [
        {
          ...line,
          price: '0.01',
          unitPrice: '0.01',
          extendedCost: '0.01',
          total: '0.01',
          markupPct: '0',
        },
      ],
      revision: cleanView.draft.revision,
    });
    // The draft schema drops unknown keys (the client's own figures are expected and never stored).
    expect(spoofed.status, spoofed.text).toBe(200);
    const reread = (
      await testApp
        .http()
        .get(`/api/estimates/${created.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as EstimateView;
    expect(reread).toMatchObject({
      id: created.id,
      number: created.number,
      status: 'draft',
      versions: [],
    });
    expect(reread.draft.computed).toEqual(cleanView.draft.computed);
    expect(reread.draft.priceBookVersionId).toBe(cleanView.draft.priceBookVersionId);
    expect(reread.draft.content.manualLines).toEqual([line]);
    expect(JSON.stringify(reread.draft.content)).not.toContain('0.01');
    expect(
      await rows(`SELECT company_id, status, created_by FROM estimates WHERE id = $1`, [
        created.id,
      ]),
    ).toEqual([{ company_id: owner.companyId, status: 'draft', created_by: estimator.userId }]);

    await expectRefused(
      await call(estimator, 'post', `/api/estimates/${created.id}/finalise`, {
        revision: reread.draft.revision,
        ...hostile,
      }),
      'finalise',
    );
    expect(
      await rows(`SELECT 1 FROM estimate_versions WHERE estimate_id = $1`, [created.id]),
    ).toEqual([]);
    await expectIdUnused(hostile.id);
  });
});

describe('jobs and crews', () => {
  it('refuse extra fields on create, schedule, status and the daily log', async () => {
    const { estimate } = await acceptedEstimate(testApp, owner);
    await expectRefused(
      await call(owner, 'post', '/api/jobs', {
        estimateId: estimate.id,
        budget: { total: '0.01' },
        ...hostile,
        status: 'closed',
      }),
      'create a job',
    );
    expect(await rows(`SELECT 1 FROM jobs WHERE estimate_id = $1`, [estimate.id])).toEqual([]);
    await expectRefused(
      await call(owner, 'post', '/api/crews', { name: 'Spoof crew', leadUserId: null, ...hostile }),
      'create a crew',
    );
    expect(await rows(`SELECT 1 FROM crews WHERE name = 'Spoof crew'`, [])).toEqual([]);

    const created = await call(estimator, 'post', '/api/jobs', { estimateId: estimate.id });
    expect(created.status).toBe(201);
    const job = created.body as JobView;
    const before = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobView;

    await expectRefused(
      await call(owner, 'post', `/api/jobs/${job.id}/schedule`, {
        plannedStart: '2027-05-01',
        crewId: null,
        ...hostile,
      }),
      'reschedule',
    );
    await expectRefused(
      await call(crewLead, 'post', `/api/jobs/${job.id}/status`, {
        ...hostile,
        status: 'in_progress',
      }),
      'status',
    );
    await expectRefused(
      await call(crewLead, 'put', `/api/jobs/${job.id}/logs/${randomUUID()}`, {
        logDate: '2027-05-02',
        notes: 'Spoofed author',
        entries: [],
        baseRevision: 0,
        ...hostile,
      }),
      'daily log',
    );
    const after = (
      await testApp
        .http()
        .get(`/api/jobs/${job.id}`)
        .set(...bearer(owner))
        .expect(200)
    ).body as JobView;
    expect(after).toEqual(before);
    expect(
      await rows(`SELECT company_id, status, created_by FROM jobs WHERE id = $1`, [job.id]),
    ).toEqual([{ company_id: owner.companyId, status: 'scheduled', created_by: estimator.userId }]);
    expect(await rows(`SELECT 1 FROM job_logs WHERE job_id = $1`, [job.id])).toEqual([]);
    await expectIdUnused(hostile.id);
  });
});

describe('the company', () => {
  it('refuses extra fields on the profile and the quote terms, for this company and the other', async () => {
    const before = (
      await testApp
        .http()
        .get('/api/company')
        .set(...bearer(owner))
        .expect(200)
    ).body;
    const victimBefore = (
      await testApp
        .http()
        .get('/api/company')
        .set(...bearer(victim))
        .expect(200)
    ).body;
    await expectRefused(
      await call(owner, 'patch', '/api/company', {
        name: 'Hijacked Water Gardens',
        hasLogo: true,
        quoteTerms: 'none',
        ...hostile,
        id: victim.companyId,
      }),
      'profile',
    );
    await expectRefused(
      await call(owner, 'put', '/api/company/quote-terms', { terms: 'Net 1 day.', ...hostile }),
      'quote terms',
    );
    expect(
      (
        await testApp
          .http()
          .get('/api/company')
          .set(...bearer(owner))
          .expect(200)
      ).body,
    ).toEqual(before);
    expect(
      (
        await testApp
          .http()
          .get('/api/company')
          .set(...bearer(victim))
          .expect(200)
      ).body,
    ).toEqual(victimBefore);
    const terms = await testApp
      .http()
      .get('/api/company/quote-terms')
      .set(...bearer(owner))
      .expect(200);
    expect(terms.body.isDefault).toBe(true);
  });
});

describe('users and the team', () => {
  it('refuses extra fields on sign-up, invites, accepting an invite and a member update', async () => {
    const email = uniqueEmail('spoof');
    const signup = await testApp
      .http()
      .post('/api/auth/signup')
      .set('X-Forwarded-For', randomIp())
      .send({
        companyName: 'Spoofed Ponds',
        name: 'Spoof Person',
        email,
        password: GOOD_PASSWORD,
        ...hostile,
        role: 'estimator',
      });
    await expectRefused(signup, 'sign-up');
    expect(await rows(`SELECT 1 FROM users WHERE email = $1`, [email])).toEqual([]);

    const inviteEmail = uniqueEmail('invitee');
    await expectRefused(
      await call(owner, 'post', '/api/invites', {
        email: inviteEmail,
        ...hostile,
        role: 'crew_lead',
      }),
      'invite',
    );
    const invite = await call(owner, 'post', '/api/invites', {
      email: inviteEmail,
      role: 'crew_lead',
    });
    expect(invite.status).toBe(201);
    const token = tokenFromInviteUrl(invite.body.inviteUrl as string);
    const accept = await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'New Crew', password: GOOD_PASSWORD, ...hostile, role: 'owner' });
    await expectRefused(accept, 'accept an invite');
    // Accepted properly, the member gets the invite's role in the inviting company, nothing else.
    const accepted = await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'New Crew', password: GOOD_PASSWORD })
      .expect(201);
    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${accepted.body.accessToken}`)
      .expect(200);
    expect(me.body).toMatchObject({ role: 'crew_lead', companyId: owner.companyId });

    const member = (
      await testApp
        .http()
        .get(`/api/users/${estimator.userId}`)
        .set(...bearer(owner))
        .expect(200)
    ).body;
    await expectRefused(
      await call(owner, 'patch', `/api/users/${estimator.userId}`, {
        active: true,
        email: 'taken@example.test',
        passwordHash: '$2a$12$abcdefghijklmnopqrstuv',
        ...hostile,
        role: 'estimator',
      }),
      'member update',
    );
    expect(
      (
        await testApp
          .http()
          .get(`/api/users/${estimator.userId}`)
          .set(...bearer(owner))
          .expect(200)
      ).body,
    ).toEqual(member);
    expect(
      await rows(`SELECT company_id, role, email FROM users WHERE id = $1`, [estimator.userId]),
    ).toEqual([{ company_id: owner.companyId, role: 'estimator', email: estimator.email }]);
    await expectIdUnused(hostile.id);
  });

  it('never lets a member change their own role: 403 for estimators and crew leads, 409 for the last owner', async () => {
    for (const [session, role] of [
      [estimator, 'owner'],
      [crewLead, 'owner'],
      [crewLead, 'estimator'],
    ] as const) {
      await call(session, 'patch', `/api/users/${session.userId}`, { role }).then((r) =>
        expect(r.status, `${role} for self`).toBe(403),
      );
    }
    const lastOwner = await call(owner, 'patch', `/api/users/${owner.userId}`, {
      role: 'estimator',
    });
    expect(lastOwner.status).toBe(409);
    expect(lastOwner.body.code).toBe('LAST_OWNER');
    expect(
      await rows(`SELECT id, role FROM users WHERE id = ANY($1) ORDER BY role`, [
        [owner.userId, estimator.userId, crewLead.userId],
      ]),
    ).toEqual([
      { id: crewLead.userId, role: 'crew_lead' },
      { id: estimator.userId, role: 'estimator' },
      { id: owner.userId, role: 'owner' },
    ]);
    // The role in a token is not trusted either (auth.e2e-spec.ts: an edited payload is refused).
  });
});

describe('the price book', () => {
  it('refuses extra fields on the book, the policy and an import, and drops unknown keys inside the book', async () => {
    const current = await testApp
      .http()
      .get('/api/price-book')
      .set(...bearer(owner))
      .expect(200);
    const book = current.body.book as PriceBook;
    const versionsBefore = await rows(`SELECT id FROM price_book_versions WHERE company_id = $1`, [
      owner.companyId,
    ]);
    await expectRefused(
      await call(owner, 'put', '/api/price-book', { book, version: 99, ...hostile }),
      'book',
    );
    await expectRefused(
      await call(owner, 'put', '/api/price-book/policy', {
        policy: book.policy,
        version: 99,
        ...hostile,
      }),
      'policy',
    );
    await expectRefused(
      await call(owner, 'post', '/api/price-book/import', { csv: 'code\n', ...hostile }),
      'import',
    );
    expect(
      await rows(`SELECT id FROM price_book_versions WHERE company_id = $1`, [owner.companyId]),
    ).toEqual(versionsBefore);
    expect(
      await rows(`SELECT 1 FROM price_book_versions WHERE company_id = $1`, [victim.companyId]),
    ).toHaveLength(1);

    // Keys the schema does not know, inside the book, are dropped before the version is stored.
    const [first, ...rest] = book.materials;
    const saved = await call(owner, 'put', '/api/price-book', {
      book: {
        ...book,
        materials: [{ ...first!, companyId: victim.companyId, margin: '99' }, ...rest],
      },
    });
    expect(saved.status, saved.text).toBe(201);
    const [stored] = await rows<{ book: PriceBook; company_id: string; author_id: string }>(
      `SELECT content AS book, company_id, author_id FROM price_book_versions
       WHERE company_id = $1 ORDER BY version_number DESC LIMIT 1`,
      [owner.companyId],
    );
    expect(JSON.stringify(stored!.book)).not.toContain(victim.companyId);
    expect(stored!.book.materials[0]).toEqual(first);
    expect(stored!.company_id).toBe(owner.companyId);
    expect(stored!.author_id).toBe(owner.userId);
  });

  it('refuses extra fields on a priced takeoff', async () => {
    await expectRefused(
      await call(estimator, 'post', '/api/priced-takeoffs', {
        name: 'Spoofed takeoff',
        input: examplePondInput(),
        ...hostile,
      }),
      'priced takeoff',
    );
    expect(await rows(`SELECT 1 FROM priced_takeoffs WHERE name = 'Spoofed takeoff'`, [])).toEqual(
      [],
    );
  });
});
