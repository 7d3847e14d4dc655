import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../src/seed/demo-data';
import { seedDemo } from '../src/seed/seed-demo';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: Awaited<ReturnType<typeof signupCompany>>;

beforeAll(async () => {
  testApp = await createTestApp();
  owner = await signupCompany(testApp, { companyName: 'Reedmarsh Water Gardens' });
});
afterAll(async () => {
  await testApp.close();
});

const SITE = {
  label: 'Back garden',
  addressLine: '14 Alder Row',
  city: 'Fernhollow',
  accessWidthIn: 36,
  carryDistanceFt: 120.5,
  slopePct: 4,
  soil: 'clay',
  waterAvailable: true,
  powerAvailable: false,
  utilitiesLocated: false,
  notes: 'Side gate, narrow path past the shed',
};

function createCustomer(session: { accessToken: string }, body: object) {
  return testApp
    .http()
    .post('/api/customers')
    .set(...bearer(session))
    .send(body);
}

describe('customers', () => {
  it('are created with a first site, read back with numbers as numbers, edited and deleted', async () => {
    const created = await createCustomer(owner, {
      name: '  Marlow Fenwick ',
      email: 'Marlow@Example.test',
      phone: '555-0101',
      sites: [SITE],
    }).expect(201);
    expect(created.body).toMatchObject({
      name: 'Marlow Fenwick',
      email: 'marlow@example.test',
      siteCount: 1,
      sites: [{ ...SITE, customerId: created.body.id }],
    });
    const id = created.body.id as string;

    const changed = await testApp
      .http()
      .patch(`/api/customers/${id}`)
      .set(...bearer(owner))
      .send({ notes: 'Prefers mornings' })
      .expect(200);
    expect(changed.body).toMatchObject({ name: 'Marlow Fenwick', notes: 'Prefers mornings' });

    const site = await testApp
      .http()
      .post(`/api/customers/${id}/sites`)
      .set(...bearer(owner))
      .send({ addressLine: '3 Sedge Lane' })
      .expect(201);
    expect(site.body).toMatchObject({ addressLine: '3 Sedge Lane', soil: null, slopePct: null });
    const edited = await testApp
      .http()
      .patch(`/api/customers/${id}/sites/${site.body.id}`)
      .set(...bearer(owner))
      .send({ soil: 'loam', utilitiesLocated: true, accessWidthIn: 48 })
      .expect(200);
    expect(edited.body).toMatchObject({ soil: 'loam', utilitiesLocated: true, accessWidthIn: 48 });
    await testApp
      .http()
      .delete(`/api/customers/${id}/sites/${site.body.id}`)
      .set(...bearer(owner))
      .expect(204);
    const detail = await testApp
      .http()
      .get(`/api/customers/${id}`)
      .set(...bearer(owner))
      .expect(200);
    expect(detail.body.sites).toHaveLength(1);

    await testApp
      .http()
      .delete(`/api/customers/${id}`)
      .set(...bearer(owner))
      .expect(204);
    await testApp
      .http()
      .get(`/api/customers/${id}`)
      .set(...bearer(owner))
      .expect(404);
  });

  it('keeps a customer who has an estimate: 409 with a code, and nothing removed', async () => {
    const customer = await testApp
      .http()
      .post('/api/customers')
      .set(...bearer(owner))
      .send({ name: 'Ottoline Brackwater' })
      .expect(201);
    await testApp
      .http()
      .post('/api/estimates')
      .set(...bearer(owner))
      .send({ title: 'Wildlife pond', customerId: customer.body.id })
      .expect(201);

    const refused = await testApp
      .http()
      .delete(`/api/customers/${customer.body.id}`)
      .set(...bearer(owner))
      .expect(409);
    expect(refused.body).toMatchObject({ code: 'CUSTOMER_HAS_ESTIMATES' });
    expect(refused.body.message).toMatch(/has an estimate/);
    await testApp
      .http()
      .get(`/api/customers/${customer.body.id}`)
      .set(...bearer(owner))
      .expect(200);
  });

  it('refuse bad fields with one clear message per field and save nothing', async () => {
    const name = `Nobody ${Date.now()}`;
    const response = await createCustomer(owner, {
      name,
      email: 'not-an-address',
      sites: [{ addressLine: '1 Reed Walk', soil: 'peat', slopePct: 140 }],
    }).expect(400);
    expect(response.body.details).toEqual(
      expect.arrayContaining([
        { field: 'email', message: 'Enter a valid e-mail address, or leave it empty' },
      ]),
    );
    const blank = await createCustomer(owner, { name: '   ' }).expect(400);
    expect(blank.body.message).toBe('Enter the customer’s name');
    const unknown = await createCustomer(owner, { name: 'X', colour: 'blue' }).expect(400);
    expect(unknown.body.details[0].field).toBe('colour');
    const nulled = await createCustomer(owner, { name: null }).expect(400);
    expect(nulled.body.details[0].field).toBe('name');

    const customer = await createCustomer(owner, { name: 'Site Checker' }).expect(201);
    const badSite = await testApp
      .http()
      .post(`/api/customers/${customer.body.id}/sites`)
      .set(...bearer(owner))
      .send({ addressLine: '2 Reed Walk', accessWidthIn: 0, carryDistanceFt: 5000, soil: 'peat' })
      .expect(400);
    expect(badSite.body.details).toEqual([
      { field: 'accessWidthIn', message: 'Access width must be more than 0 in' },
      { field: 'carryDistanceFt', message: 'Carry distance must be at most 2000 ft' },
      { field: 'soil', message: 'Soil must be one of: sand-gravel, loam, clay' },
    ]);
    const search = await testApp
      .http()
      .get('/api/customers')
      .query({ q: name })
      .set(...bearer(owner))
      .expect(200);
    expect(search.body.total).toBe(0);

    const badQuery = await testApp
      .http()
      .get('/api/customers')
      .query({ sort: 'phone', pageSize: 500 })
      .set(...bearer(owner))
      .expect(400);
    expect(badQuery.body.details).toEqual([
      { field: 'sort', message: 'Sort by one of: name, createdAt, updatedAt' },
      { field: 'pageSize', message: 'Page size must be between 10 and 100' },
    ]);
  });

  it('are searched by name, e-mail or phone, sorted and paginated on the server', async () => {
    const company = await signupCompany(testApp);
    const names = Array.from(
      { length: 23 },
      (_, index) => `Customer ${String(index).padStart(2, '0')}`,
    );
    for (const [index, name] of names.entries()) {
      await createCustomer(company, {
        name,
        email: `c${index}@example.test`,
        phone: `555-01${String(index).padStart(2, '0')}`,
      }).expect(201);
    }
    await createCustomer(company, { name: 'Wren 100% Ponds_Ltd', phone: '555-9999' }).expect(201);

    const list = (query: Record<string, string | number>) =>
      testApp
        .http()
        .get('/api/customers')
        .query(query)
        .set(...bearer(company))
        .expect(200)
        .then((response) => response.body);

    const first = await list({ pageSize: 10 });
    expect(first).toMatchObject({ total: 24, page: 1, pageSize: 10 });
    expect(first.items.map((item: { name: string }) => item.name)).toEqual(names.slice(0, 10));
    const third = await list({ pageSize: 10, page: 3 });
    expect(third.items.map((item: { name: string }) => item.name)).toEqual([
      ...names.slice(20),
      'Wren 100% Ponds_Ltd',
    ]);
    const past = await list({ pageSize: 10, page: 9 });
    expect(past).toMatchObject({ items: [], total: 24, page: 9 });

    const descending = await list({ sort: 'name', order: 'desc', pageSize: 10 });
    expect(descending.items[0].name).toBe('Wren 100% Ponds_Ltd');
    const newest = await list({ sort: 'createdAt', order: 'desc', pageSize: 10 });
    expect(newest.items[0].name).toBe('Wren 100% Ponds_Ltd');

    expect((await list({ q: 'C7@EXAMPLE' })).items.map((i: { name: string }) => i.name)).toEqual([
      'Customer 07',
    ]);
    expect((await list({ q: '555-0112' })).items[0].name).toBe('Customer 12');
    expect((await list({ q: 'customer 1' })).total).toBe(10);
    // % and _ are searched for literally, not as wildcards.
    expect((await list({ q: '100%' })).total).toBe(1);
    expect((await list({ q: 'r_n' })).total).toBe(0);
    expect((await list({ q: 's_l' })).total).toBe(1);
  });

  it('let crew leads read but not write; estimators write', async () => {
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const estimator = await addMember(testApp, owner, 'estimator');
    const customer = await createCustomer(estimator, {
      name: 'Rowan Pebbleford',
      sites: [SITE],
    }).expect(201);
    const id = customer.body.id as string;
    const siteId = customer.body.sites[0].id as string;

    await testApp
      .http()
      .get('/api/customers')
      .set(...bearer(crewLead))
      .expect(200);
    const read = await testApp
      .http()
      .get(`/api/customers/${id}`)
      .set(...bearer(crewLead))
      .expect(200);
    expect(read.body.sites[0].notes).toBe(SITE.notes);

    const writes = [
      testApp.http().post('/api/customers').send({ name: 'No' }),
      testApp.http().patch(`/api/customers/${id}`).send({ name: 'No' }),
      testApp.http().delete(`/api/customers/${id}`),
      testApp.http().post(`/api/customers/${id}/sites`).send({ addressLine: '9 Moss Way' }),
      testApp.http().patch(`/api/customers/${id}/sites/${siteId}`).send({ notes: 'No' }),
      testApp.http().delete(`/api/customers/${id}/sites/${siteId}`),
    ];
    for (const write of writes) await write.set(...bearer(crewLead)).expect(403);
    await testApp.http().get('/api/customers').expect(401);
  });

  it('of another company answer 404 and reveal nothing', async () => {
    const other = await signupCompany(testApp);
    const theirs = await createCustomer(other, {
      name: 'Elsewhere Person',
      sites: [{ addressLine: '5 Hidden Close' }],
    }).expect(201);
    const id = theirs.body.id as string;
    const siteId = theirs.body.sites[0].id as string;

    const attempts = [
      testApp.http().get(`/api/customers/${id}`),
      testApp.http().patch(`/api/customers/${id}`).send({ name: 'Taken' }),
      testApp.http().delete(`/api/customers/${id}`),
      testApp.http().post(`/api/customers/${id}/sites`).send({ addressLine: '1 Nope Row' }),
      testApp.http().patch(`/api/customers/${id}/sites/${siteId}`).send({ notes: 'x' }),
      testApp.http().delete(`/api/customers/${id}/sites/${siteId}`),
      testApp.http().get('/api/customers/not-a-uuid'),
    ];
    for (const attempt of attempts) {
      const response = await attempt.set(...bearer(owner)).expect(404);
      expect(JSON.stringify(response.body)).not.toContain('Elsewhere');
    }
    const mine = await testApp
      .http()
      .get('/api/customers')
      .query({ q: 'Elsewhere' })
      .set(...bearer(owner))
      .expect(200);
    expect(mine.body.total).toBe(0);

    // A site of one customer cannot be reached through another customer of the same company.
    const own = await createCustomer(other, { name: 'Second Person' }).expect(201);
    await testApp
      .http()
      .patch(`/api/customers/${own.body.id}/sites/${siteId}`)
      .set(...bearer(other))
      .send({ notes: 'x' })
      .expect(404);
    const still = await testApp
      .http()
      .get(`/api/customers/${id}`)
      .set(...bearer(other))
      .expect(200);
    expect(still.body).toMatchObject({ name: 'Elsewhere Person', siteCount: 1 });
  });

  it('are seeded for the demo company once, and never overwritten', async () => {
    await seedDemo(testApp.dataSource);
    await testApp.dataSource.query(
      `UPDATE customers SET notes = 'changed by a person' WHERE name = 'Corwin Ashgrove'`,
    );
    const again = await seedDemo(testApp.dataSource);
    expect(again.created).toEqual([]);
    const rows = (await testApp.dataSource.query(
      `SELECT c.name, c.notes, (SELECT count(*)::int FROM sites s WHERE s.customer_id = c.id) AS sites
         FROM customers c JOIN users u ON u.company_id = c.company_id WHERE u.email = $1`,
      [DEMO_USERS[0]!.email],
    )) as Array<{ name: string; notes: string; sites: number }>;
    expect(rows).toHaveLength(8);
    expect(rows.find((row) => row.name === 'Corwin Ashgrove')?.notes).toBe('changed by a person');
    expect(rows.reduce((sum, row) => sum + row.sites, 0)).toBe(9);
  });
});
