import type { QuoteView } from '@pondwright/shared';
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { WRONG_TOKEN_LIMIT } from '../src/quotes/wrong-token-throttle.service';
import { approvedEstimate, sendQuote } from './support/quote-fixtures';
import { createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

/** A well-formed token that matches no link: 32 random bytes, as real ones are made. */
const wrongToken = () => randomBytes(32).toString('base64url');

/** Each test speaks from its own address (the test app trusts X-Forwarded-For, as behind a proxy). */
const address = () => `198.51.100.${1 + Math.floor(Math.random() * 250)}`;

async function sentQuote(): Promise<{ token: string; estimateId: string }> {
  const owner = await signupCompany(testApp);
  const estimate = await approvedEstimate(testApp, owner);
  return {
    token: await sendQuote(testApp, owner, estimate.id, 'wren@example.test'),
    estimateId: estimate.id,
  };
}

describe('the public quote link', () => {
  it('is never cached and never leaks its address to other sites, on answers and refusals alike', async () => {
    const { token } = await sentQuote();
    for (const response of [
      await testApp.http().get(`/api/quotes/${token}`).expect(200),
      await testApp.http().get(`/api/quotes/${wrongToken()}`).expect(404),
    ]) {
      expect(response.headers['cache-control']).toBe('no-store');
      expect(response.headers['referrer-policy']).toBe('no-referrer');
    }
  });

  it(`answers 429 to an address after ${WRONG_TOKEN_LIMIT} wrong tokens, even for a real link, and to no one else`, async () => {
    const { token } = await sentQuote();
    const guesser = address();
    for (let attempt = 0; attempt < WRONG_TOKEN_LIMIT; attempt++) {
      await testApp
        .http()
        .get(`/api/quotes/${wrongToken()}`)
        .set('X-Forwarded-For', guesser)
        .expect(404);
    }
    const blocked = await testApp
      .http()
      .get(`/api/quotes/${wrongToken()}`)
      .set('X-Forwarded-For', guesser)
      .expect(429);
    expect(blocked.body.message).toMatch(/Too many links that do not exist/);
    await testApp.http().get(`/api/quotes/${token}`).set('X-Forwarded-For', guesser).expect(429);

    // The homeowner, elsewhere, is not affected.
    await testApp.http().get(`/api/quotes/${token}`).set('X-Forwarded-For', address()).expect(200);
  });

  it('records exactly one acceptance when 20 accepts arrive at once', async () => {
    const { token, estimateId } = await sentQuote();
    const quote = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
    const body = {
      fullName: 'Wren Halloway',
      consent: true,
      optionIds: [],
      contentSha256: quote.estimate.contentSha256,
    };
    const answers = await Promise.all(
      Array.from({ length: 20 }, () =>
        testApp.http().post(`/api/quotes/${token}/accept`).send(body),
      ),
    );
    const statuses = answers.map((answer) => answer.status).sort();
    expect(statuses.filter((status) => status === 200)).toHaveLength(1);
    // The others find the quote already answered; none fails in some other way.
    expect(statuses.filter((status) => status === 409)).toHaveLength(19);
    const [{ count }] = (await testApp.dataSource.query(
      `SELECT count(*)::int AS count FROM quote_acceptances WHERE estimate_id = $1`,
      [estimateId],
    )) as [{ count: number }];
    expect(count).toBe(1);
  });
});
