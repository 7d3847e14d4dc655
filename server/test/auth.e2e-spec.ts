import { createHmac } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  bearer,
  createTestApp,
  GOOD_PASSWORD,
  randomIp,
  refreshCookieOf,
  signupCompany,
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

function login(email: string, password: string, ip = randomIp()) {
  return testApp
    .http()
    .post('/api/auth/login')
    .set('X-Forwarded-For', ip)
    .send({ email, password });
}

describe('sign-up', () => {
  it('creates a company and its owner and answers 201 with an access token and a refresh cookie', async () => {
    const email = uniqueEmail('founder');
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .send({ companyName: 'Cattail Creek Ponds', name: 'Founder', email, password: GOOD_PASSWORD })
      .expect(201);
    expect(Object.keys(response.body)).toEqual(['accessToken']);
    const cookie = ([] as string[])
      .concat(response.headers['set-cookie'] ?? [])
      .find((c) => c.startsWith('pw_refresh='))!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth/);

    const me = await testApp
      .http()
      .get('/api/auth/me')
      .set(...bearer(response.body))
      .expect(200);
    expect(me.body).toMatchObject({
      email,
      name: 'Founder',
      role: 'owner',
      companyName: 'Cattail Creek Ponds',
    });
    expect(me.body).not.toHaveProperty('passwordHash');
  });

  it('stores the password as a bcrypt hash of cost 12', async () => {
    const owner = await signupCompany(testApp);
    const [row] = await testApp.dataSource.query('SELECT password_hash FROM users WHERE id = $1', [
      owner.userId,
    ]);
    // bcrypt's modular crypt format: $2a$/$2b$, then the cost (OWASP Password Storage Cheat Sheet).
    expect(row.password_hash).toMatch(/^\$2[ab]\$12\$/);
  });

  it('refuses an e-mail that already has an account with 409 and changes nothing', async () => {
    const owner = await signupCompany(testApp);
    const before = await testApp.dataSource.query('SELECT count(*)::int AS n FROM companies');
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .send({
        companyName: 'Second Try Ponds',
        name: 'Again',
        email: owner.email.toUpperCase(),
        password: GOOD_PASSWORD,
      })
      .expect(409);
    expect(response.body).toMatchObject({ statusCode: 409, error: 'Conflict' });
    const after = await testApp.dataSource.query('SELECT count(*)::int AS n FROM companies');
    expect(after[0].n).toBe(before[0].n);
  });

  it('gives a message per field for bad input, and refuses unknown fields', async () => {
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .send({
        companyName: '',
        name: 'A',
        email: 'not-an-email',
        password: 'short',
        companyId: 'x',
      })
      .expect(400);
    const fields = (response.body.details as Array<{ field: string }>).map((d) => d.field).sort();
    expect(fields).toEqual(['companyId', 'companyName', 'email', 'password']);
    expect(response.body.error).toBe('Bad Request');
  });

  it('refuses a commonly used password (NIST SP 800-63B §5.1.1.2)', async () => {
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .send({
        companyName: 'Common Ponds',
        name: 'Someone',
        email: uniqueEmail(),
        password: 'password123',
      })
      .expect(400);
    expect(response.body.details).toEqual([
      { field: 'password', message: expect.stringMatching(/too common/) },
    ]);
  });

  it('accepts a 64-character password with no composition rules (NIST SP 800-63B)', async () => {
    const long = 'a quiet pond under the old willow tree keeps its own slow time k';
    expect(long).toHaveLength(64);
    await signupCompany(testApp, { password: long });
  });

  it('answers 400 with the error shape for malformed JSON, never 500', async () => {
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@b.test",')
      .expect(400);
    expect(response.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON',
    });
  });

  it('answers 413 in the error shape for a body over 1 MB', async () => {
    const response = await testApp
      .http()
      .post('/api/auth/signup')
      .send({ companyName: 'x'.repeat(1_100_000) })
      .expect(413);
    expect(response.body).toMatchObject({ statusCode: 413, error: 'Payload Too Large' });
  });
});

describe('sign-in', () => {
  it('answers 200 with an access token for the right password', async () => {
    const owner = await signupCompany(testApp);
    const response = await login(owner.email, owner.password).expect(200);
    expect(response.body.accessToken).toEqual(expect.any(String));
    refreshCookieOf(response);
  });

  it('gives the same 401 message for a wrong password and an unknown e-mail', async () => {
    const owner = await signupCompany(testApp);
    const wrongPassword = await login(owner.email, 'not-the-password').expect(401);
    const unknownEmail = await login(uniqueEmail('nobody'), 'not-the-password').expect(401);
    expect(wrongPassword.body.message).toBe(unknownEmail.body.message);
    expect(wrongPassword.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
  });

  it('answers 429 after 10 failures for one account, even from different addresses', async () => {
    const owner = await signupCompany(testApp);
    for (let attempt = 0; attempt < 10; attempt++) {
      await login(owner.email, 'wrong-password-x').expect(401);
    }
    const blocked = await login(owner.email, owner.password).expect(429);
    expect(blocked.body).toMatchObject({ statusCode: 429, error: 'Too Many Requests' });
  });

  it('answers 429 after 10 failures from one address, whatever the account', async () => {
    const ip = randomIp();
    for (let attempt = 0; attempt < 10; attempt++) {
      await login(uniqueEmail('guess'), 'wrong-password-x', ip).expect(401);
    }
    const owner = await signupCompany(testApp);
    await login(owner.email, owner.password, ip).expect(429);
    await login(owner.email, owner.password, randomIp()).expect(200);
  });
});

describe('access tokens', () => {
  it('are HS256 JWTs with issuer, audience and an expiry of 15 minutes or less', async () => {
    const owner = await signupCompany(testApp);
    const [header, payload] = owner.accessToken
      .split('.')
      .slice(0, 2)
      .map((part) => JSON.parse(Buffer.from(part, 'base64url').toString() || '{}'));
    expect(header.alg).toBe('HS256');
    expect(payload).toMatchObject({ iss: 'pondwright', aud: 'pondwright-api', role: 'owner' });
    expect(payload.exp - payload.iat).toBeLessThanOrEqual(15 * 60);
  });

  it('refuses a token signed with alg "none" or with another key, and an edited payload', async () => {
    const owner = await signupCompany(testApp);
    const [header, payload, signature] = owner.accessToken.split('.');
    const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
    const claims = JSON.parse(Buffer.from(payload!, 'base64url').toString());

    const unsigned = `${encode({ alg: 'none', typ: 'JWT' })}.${payload}.`;
    const edited = `${header}.${encode({ ...claims, role: 'owner', cid: '00000000-0000-0000-0000-000000000000' })}.${signature}`;
    const otherKey = `${header}.${payload}.${createHmac('sha256', 'x'.repeat(40)).update(`${header}.${payload}`).digest('base64url')}`;
    for (const token of [unsigned, edited, otherKey, 'not.a.jwt']) {
      await testApp.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
    }
  });

  it('are required on every non-public route', async () => {
    const response = await testApp.http().get('/api/auth/me').expect(401);
    expect(response.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
  });
});

describe('refresh tokens', () => {
  it('rotate on every use, and reusing an old one revokes the whole family', async () => {
    const owner = await signupCompany(testApp);
    const first = await testApp
      .http()
      .post('/api/auth/refresh')
      .set('Cookie', owner.refreshCookie)
      .expect(200);
    const second = refreshCookieOf(first);
    expect(second).not.toBe(owner.refreshCookie);

    // The first cookie again: stolen and replayed. The thief is refused and so is the rightful holder.
    await testApp.http().post('/api/auth/refresh').set('Cookie', owner.refreshCookie).expect(401);
    await testApp.http().post('/api/auth/refresh').set('Cookie', second).expect(401);
  });

  it('end at sign-out', async () => {
    const owner = await signupCompany(testApp);
    await testApp.http().post('/api/auth/logout').set('Cookie', owner.refreshCookie).expect(204);
    await testApp.http().post('/api/auth/refresh').set('Cookie', owner.refreshCookie).expect(401);
  });

  it('answer 401 when missing', async () => {
    await testApp.http().post('/api/auth/refresh').expect(401);
  });
});
