import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
} from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

describe('invites', () => {
  it('lets an owner invite an estimator, who previews, accepts and signs in with the invited role', async () => {
    const owner = await signupCompany(testApp, { companyName: 'Bulrush Bend Ponds' });
    const email = uniqueEmail('estimator');
    const created = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email, role: 'estimator' })
      .expect(201);
    expect(created.body).toMatchObject({ email, role: 'estimator', invitedByName: 'Owner Person' });
    expect(created.body.inviteUrl).toMatch(
      /^http:\/\/app\.test\/accept-invite\/[A-Za-z0-9_-]{43}$/,
    );
    const token = tokenFromInviteUrl(created.body.inviteUrl);

    const pending = await testApp
      .http()
      .get('/api/invites')
      .set(...bearer(owner))
      .expect(200);
    expect(pending.body.map((invite: { email: string }) => invite.email)).toContain(email);
    expect(JSON.stringify(pending.body)).not.toContain(token);

    const preview = await testApp.http().get(`/api/auth/invites/${token}`).expect(200);
    expect(preview.body).toEqual({ email, role: 'estimator', companyName: 'Bulrush Bend Ponds' });

    await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'Estie Mate', password: GOOD_PASSWORD })
      .expect(201);
    const login = await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email, password: GOOD_PASSWORD })
      .expect(200);
    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(login.body))
      .expect(200);
    expect(me.body).toMatchObject({
      email,
      name: 'Estie Mate',
      role: 'estimator',
      companyId: owner.companyId,
    });
  });

  it('are single use: a second accept answers 410 and creates nobody', async () => {
    const owner = await signupCompany(testApp);
    const created = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: uniqueEmail(), role: 'crew_lead' })
      .expect(201);
    const token = tokenFromInviteUrl(created.body.inviteUrl);
    await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'First', password: GOOD_PASSWORD })
      .expect(201);
    await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'Second', password: GOOD_PASSWORD })
      .expect(410);
    const members = await testApp
      .http()
      .get('/api/users')
      .set(...bearer(owner))
      .expect(200);
    expect(members.body).toHaveLength(2);
  });

  it('expire: an expired invite answers 410, an unknown one 404', async () => {
    const owner = await signupCompany(testApp);
    const created = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: uniqueEmail(), role: 'estimator' })
      .expect(201);
    await testApp.dataSource.query(
      `UPDATE invites SET expires_at = now() - interval '1 minute' WHERE id = $1`,
      [created.body.id],
    );
    const token = tokenFromInviteUrl(created.body.inviteUrl);
    await testApp.http().get(`/api/auth/invites/${token}`).expect(410);
    await testApp
      .http()
      .post('/api/auth/accept-invite')
      .send({ token, name: 'Late', password: GOOD_PASSWORD })
      .expect(410);
    await testApp.http().get('/api/auth/invites/not-a-real-token').expect(404);
  });

  it('can be revoked by the owner, after which the link answers 410', async () => {
    const owner = await signupCompany(testApp);
    const created = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: uniqueEmail(), role: 'estimator' })
      .expect(201);
    await testApp
      .http()
      .delete(`/api/invites/${created.body.id}`)
      .set(...bearer(owner))
      .expect(204);
    await testApp
      .http()
      .get(`/api/auth/invites/${tokenFromInviteUrl(created.body.inviteUrl)}`)
      .expect(410);
  });

  it('are stored only as a hash of the token', async () => {
    const owner = await signupCompany(testApp);
    const created = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: uniqueEmail(), role: 'estimator' })
      .expect(201);
    const token = tokenFromInviteUrl(created.body.inviteUrl);
    const [row] = await testApp.dataSource.query('SELECT token_hash FROM invites WHERE id = $1', [
      created.body.id,
    ]);
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.token_hash).not.toContain(token);
  });

  it('refuse an e-mail that already has an account, and a bad role, with field messages', async () => {
    const owner = await signupCompany(testApp);
    const taken = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: owner.email, role: 'estimator' })
      .expect(409);
    expect(taken.body.details).toEqual([{ field: 'email', message: expect.any(String) }]);
    const badRole = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: uniqueEmail(), role: 'boss' })
      .expect(400);
    expect(badRole.body.details[0].field).toBe('role');
  });
});

describe('roles', () => {
  it('give an estimator 403 on owner routes and 200 on their own', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .get('/api/users')
      .set(...bearer(estimator))
      .expect(403);
    await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(estimator))
      .send({ email: uniqueEmail(), role: 'owner' })
      .expect(403);
    await testApp
      .http()
      .patch(`/api/users/${estimator.userId}`)
      .set(...bearer(estimator))
      .send({ role: 'owner' })
      .expect(403);
    await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(estimator))
      .expect(200);
  });

  it('give a crew lead 403 on owner routes', async () => {
    const owner = await signupCompany(testApp);
    const crewLead = await addMember(testApp, owner, 'crew_lead');
    await testApp
      .http()
      .get('/api/invites')
      .set(...bearer(crewLead))
      .expect(403);
    await testApp
      .http()
      .delete(`/api/users/${owner.userId}`)
      .set(...bearer(crewLead))
      .expect(403);
  });

  it('apply a role change at once, without waiting for a new token', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await testApp
      .http()
      .patch(`/api/users/${estimator.userId}`)
      .set(...bearer(owner))
      .send({ role: 'owner' })
      .expect(200);
    await testApp
      .http()
      .get('/api/users')
      .set(...bearer(estimator))
      .expect(200);
  });
});

describe('the team', () => {
  it('keeps at least one active owner: the last owner cannot be demoted, deactivated or removed', async () => {
    const owner = await signupCompany(testApp);
    const demote = await testApp
      .http()
      .patch(`/api/users/${owner.userId}`)
      .set(...bearer(owner))
      .send({ role: 'estimator' })
      .expect(409);
    expect(demote.body.message).toMatch(/at least one active owner/);
    await testApp
      .http()
      .patch(`/api/users/${owner.userId}`)
      .set(...bearer(owner))
      .send({ active: false })
      .expect(409);
    await testApp
      .http()
      .delete(`/api/users/${owner.userId}`)
      .set(...bearer(owner))
      .expect(409);
    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(owner))
      .expect(200);
    expect(me.body.role).toBe('owner');
  });

  it('lets one of two owners step down', async () => {
    const owner = await signupCompany(testApp);
    const second = await addMember(testApp, owner, 'owner');
    await testApp
      .http()
      .patch(`/api/users/${owner.userId}`)
      .set(...bearer(second))
      .send({ role: 'estimator' })
      .expect(200);
    await testApp
      .http()
      .patch(`/api/users/${second.userId}`)
      .set(...bearer(second))
      .send({ role: 'estimator' })
      .expect(409);
  });

  it('ends a deactivated member’s access at once: token, refresh and sign-in all refused', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const updated = await testApp
      .http()
      .patch(`/api/users/${estimator.userId}`)
      .set(...bearer(owner))
      .send({ active: false })
      .expect(200);
    expect(updated.body).toMatchObject({ id: estimator.userId, active: false });
    await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(estimator))
      .expect(401);
    await testApp
      .http()
      .post('/api/auth/refresh')
      .set('Cookie', estimator.refreshCookie)
      .expect(401);
    await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email: estimator.email, password: estimator.password })
      .expect(401);

    await testApp
      .http()
      .patch(`/api/users/${estimator.userId}`)
      .set(...bearer(owner))
      .send({ active: true })
      .expect(200);
    await testApp
      .http()
      .post('/api/auth/login')
      .set('X-Forwarded-For', randomIp())
      .send({ email: estimator.email, password: estimator.password })
      .expect(200);
  });

  it('refuses a body that tries to set other fields (mass assignment)', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const response = await testApp
      .http()
      .patch(`/api/users/${estimator.userId}`)
      .set(...bearer(owner))
      .send({
        role: 'crew_lead',
        companyId: '00000000-0000-0000-0000-000000000000',
        email: 'x@y.test',
      })
      .expect(400);
    expect(response.body.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'companyId',
      'email',
    ]);
    const member = await testApp
      .http()
      .get(`/api/users/${estimator.userId}`)
      .set(...bearer(owner))
      .expect(200);
    expect(member.body.role).toBe('estimator');
  });
});

describe('tenant isolation', () => {
  it('company A cannot read, list, change or delete company B’s users or invites: 404 and no data', async () => {
    const ownerA = await signupCompany(testApp, { companyName: 'Alder Ponds' });
    const ownerB = await signupCompany(testApp, { companyName: 'Birch Ponds' });
    const estimatorB = await addMember(testApp, ownerB, 'estimator');
    const inviteB = await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(ownerB))
      .send({ email: uniqueEmail(), role: 'crew_lead' })
      .expect(201);

    const listA = await testApp
      .http()
      .get('/api/users')
      .set(...bearer(ownerA))
      .expect(200);
    expect(listA.body.map((u: { id: string }) => u.id)).toEqual([ownerA.userId]);
    const invitesA = await testApp
      .http()
      .get('/api/invites')
      .set(...bearer(ownerA))
      .expect(200);
    expect(invitesA.body).toEqual([]);

    for (const call of [
      testApp.http().get(`/api/users/${estimatorB.userId}`),
      testApp.http().patch(`/api/users/${estimatorB.userId}`).send({ role: 'owner' }),
      testApp.http().patch(`/api/users/${ownerB.userId}`).send({ active: false }),
      testApp.http().delete(`/api/users/${estimatorB.userId}`),
      testApp.http().delete(`/api/invites/${inviteB.body.id}`),
    ]) {
      const response = await call.set(...bearer(ownerA)).expect(404);
      expect(JSON.stringify(response.body)).not.toContain('Birch');
      expect(JSON.stringify(response.body)).not.toContain(estimatorB.email);
    }

    const stillThere = await testApp
      .http()
      .get(`/api/users/${estimatorB.userId}`)
      .set(...bearer(ownerB))
      .expect(200);
    expect(stillThere.body).toMatchObject({ role: 'estimator', active: true });
    const invitesB = await testApp
      .http()
      .get('/api/invites')
      .set(...bearer(ownerB))
      .expect(200);
    expect(invitesB.body.map((i: { id: string }) => i.id)).toContain(inviteB.body.id);
  });

  it('answers 404 for ids that are not ids at all', async () => {
    const owner = await signupCompany(testApp);
    await testApp
      .http()
      .get('/api/users/not-a-uuid')
      .set(...bearer(owner))
      .expect(404);
  });
});
