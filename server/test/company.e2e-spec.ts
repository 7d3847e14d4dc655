import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

describe('the company profile', () => {
  it('starts in US units and is readable by every member', async () => {
    const owner = await signupCompany(testApp, { companyName: 'Sedge Hollow Ponds' });
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    const response = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(crewLead))
      .expect(200);
    expect(response.body).toEqual({
      id: owner.companyId,
      name: 'Sedge Hollow Ponds',
      unitSystem: 'us',
    });
  });

  it('lets the owner switch to metric and rename the company; members see the change', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ unitSystem: 'metric', name: '  Reedwater Gardens ' })
      .expect(200);
    const seen = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(estimator))
      .expect(200);
    expect(seen.body).toMatchObject({ name: 'Reedwater Gardens', unitSystem: 'metric' });
    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(estimator))
      .expect(200);
    expect(me.body.companyName).toBe('Reedwater Gardens');
  });

  it('refuses other roles, bad values and empty changes, changing nothing', async () => {
    const owner = await signupCompany(testApp, { companyName: 'Unchanged Ponds' });
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(estimator))
      .send({ unitSystem: 'metric' })
      .expect(403);
    const bad = await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ unitSystem: 'imperial' })
      .expect(400);
    expect(bad.body.details).toEqual([
      { field: 'unitSystem', message: 'Choose US customary or metric' },
    ]);
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({})
      .expect(400);
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(owner))
      .send({ id: 'x', name: 'Renamed' })
      .expect(400);
    const after = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(owner))
      .expect(200);
    expect(after.body).toMatchObject({ name: 'Unchanged Ponds', unitSystem: 'us' });
  });

  it('changes only the caller’s own company', async () => {
    const ownerA = await signupCompany(testApp, { companyName: 'Alpha Water Features' });
    const ownerB = await signupCompany(testApp, { companyName: 'Beta Water Features' });
    await testApp
      .http()
      .patch('/api/company')
      .set(...bearer(ownerA))
      .send({ unitSystem: 'metric' })
      .expect(200);
    const b = await testApp
      .http()
      .get('/api/company')
      .set(...bearer(ownerB))
      .expect(200);
    expect(b.body).toMatchObject({ name: 'Beta Water Features', unitSystem: 'us' });
  });
});
