import type { QuoteView } from '@pondwright/shared';
import { quoteSelectionTotals } from '@pondwright/shared';
import { randomBytes } from 'node:crypto';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakePayments, type FakePayments } from '../../src/dev-fakes/fake-payments';
import type { CheckoutSession } from '../../src/dev-fakes/checkout-session';
import { approvedEstimate, sendQuote } from '../support/quote-fixtures';
import { bearer, createTestApp, signupCompany, type TestApp } from '../support/test-app';

/**
 * The payment webhook is public: its signature, its age and its event id are all that stand between
 * a forged or replayed request and a deposit marked paid. Events here are signed by the provider's
 * own SDK (`generateTestHeaderString`), exactly as the provider signs them.
 */
const SECRET_KEY = 'sk_test_webhook_security_key';
const WEBHOOK_SECRET = 'whsec_webhook_security_secret';
const stripe = new Stripe(SECRET_KEY);

let testApp: TestApp;
let payments: FakePayments;

beforeAll(async () => {
  // The tests sign and post every event themselves; the fake only creates the checkout sessions.
  payments = await startFakePayments({
    port: 0,
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: 'http://127.0.0.1:9/unused',
  });
  testApp = await createTestApp({
    STRIPE_SECRET_KEY: SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STRIPE_API_URL: payments.url,
  });
});
afterAll(async () => {
  await testApp.close();
  await payments.stop();
});

type Owner = Awaited<ReturnType<typeof signupCompany>>;
type Checkout = { owner: Owner; estimateId: string; token: string; session: CheckoutSession };

/** An estimate sent, accepted with every option, and a deposit checkout opened for it. */
async function openCheckout(checkoutBody?: object): Promise<Checkout & { quote: QuoteView }> {
  const owner = await signupCompany(testApp);
  const estimate = await approvedEstimate(testApp, owner);
  const token = await sendQuote(testApp, owner, estimate.id);
  const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
  const quote = (
    await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: shown.options.map((option) => option.id),
        contentSha256: shown.estimate.contentSha256,
      })
      .expect(200)
  ).body as QuoteView;
  const checkout = await testApp
    .http()
    .post(`/api/quotes/${token}/checkout`)
    .send(checkoutBody ?? {})
    .expect(200);
  const sessionId = new URL(checkout.body.url as string).pathname.split('/').pop();
  const session = payments.sessions().find((candidate) => candidate.id === sessionId)!;
  expect(session).toBeDefined();
  return { owner, estimateId: estimate.id, token, session, quote };
}

/** The provider's `checkout.session.completed` event for the session, paid unless overridden. */
function completedEvent(session: CheckoutSession, overrides: Partial<CheckoutSession> = {}) {
  return JSON.stringify({
    id: `evt_test_${randomBytes(12).toString('hex')}`,
    object: 'event',
    type: 'checkout.session.completed',
    api_version: null,
    created: Math.floor(Date.now() / 1000),
    data: {
      object: {
        ...session,
        status: 'complete',
        payment_status: 'paid',
        payment_intent: `pi_test_${randomBytes(8).toString('hex')}`,
        ...overrides,
      },
    },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
  });
}

function sign(payload: string, options: { secret?: string; ageSeconds?: number } = {}): string {
  return stripe.webhooks.generateTestHeaderString({
    payload,
    secret: options.secret ?? WEBHOOK_SECRET,
    timestamp: Math.floor(Date.now() / 1000) - (options.ageSeconds ?? 0),
  });
}

function deliver(body: string | Buffer, signature: string) {
  return testApp
    .http()
    .post('/api/payments/webhook')
    .set('Content-Type', 'application/json')
    .set('Stripe-Signature', signature)
    .send(body);
}

/** Everything a credited deposit would change, read through the staff API and the database. */
async function paymentState({ owner, estimateId }: Pick<Checkout, 'owner' | 'estimateId'>) {
  const [estimate, quoteStatus, rows, events, handled, mail] = await Promise.all([
    testApp
      .http()
      .get(`/api/estimates/${estimateId}`)
      .set(...bearer(owner)),
    testApp
      .http()
      .get(`/api/estimates/${estimateId}/quote`)
      .set(...bearer(owner)),
    testApp.dataSource.query(
      `SELECT id, status, amount, currency, paid_at, provider_payment_ref FROM payments
       WHERE estimate_id = $1 ORDER BY created_at`,
      [estimateId],
    ),
    testApp.dataSource.query(
      `SELECT action FROM estimate_events WHERE estimate_id = $1 ORDER BY id`,
      [estimateId],
    ),
    testApp.dataSource.query(
      `SELECT e.event_id FROM payment_events e JOIN payments p ON p.id = e.payment_id
       WHERE p.estimate_id = $1`,
      [estimateId],
    ),
    testApp.dataSource.query(
      `SELECT kind FROM outbox_messages WHERE company_id = $1 ORDER BY kind`,
      [owner.companyId],
    ),
  ]);
  return {
    estimate: estimate.body as unknown,
    quoteStatus: quoteStatus.body as unknown,
    payments: rows as Array<{ status: string; amount: string; currency: string }>,
    events: (events as Array<{ action: string }>).map((row) => row.action),
    handledEvents: (handled as unknown[]).length,
    mail: (mail as Array<{ kind: string }>).map((row) => row.kind),
  };
}

const depositPaidCount = (state: Awaited<ReturnType<typeof paymentState>>) =>
  state.events.filter((action) => action === 'deposit-paid').length;

describe('a webhook that is not the provider’s, as sent, just now', () => {
  it('is refused with 400 for a wrong signature, a body changed by one byte, or a timestamp over 5 minutes old, and changes nothing', async () => {
    const checkout = await openCheckout();
    const before = await paymentState(checkout);
    expect(before.payments.map((p) => p.status)).toEqual(['pending']);

    const payload = completedEvent(checkout.session);
    // One byte changed after signing: the first digit of `"amount_total":<n>` goes up by one (a 9
    // down), so the body still parses as the same event, asking a different amount.
    const index = payload.indexOf('"amount_total":') + '"amount_total":'.length;
    const tampered = Buffer.from(payload);
    tampered[index] = tampered[index] === 0x39 ? 0x38 : tampered[index]! + 1;
    expect(Buffer.compare(tampered, Buffer.from(payload))).not.toBe(0);

    const refusals = [
      {
        label: 'signed with another secret',
        body: payload,
        sig: sign(payload, { secret: 'whsec_attacker' }),
      },
      { label: 'one byte changed after signing', body: tampered, sig: sign(payload) },
      {
        label: 'signed 5 minutes and 1 second ago',
        body: payload,
        sig: sign(payload, { ageSeconds: 301 }),
      },
      { label: 'signed an hour ago', body: payload, sig: sign(payload, { ageSeconds: 3600 }) },
      {
        label: 'a signature with no timestamp',
        body: payload,
        sig: sign(payload).replace(/^t=\d+,/, ''),
      },
      { label: 'no signature at all', body: payload, sig: '' },
    ];
    for (const { label, body, sig } of refusals) {
      const response = await deliver(body, sig);
      expect(response.status, label).toBe(400);
      expect(response.body.code, label).toBe('WEBHOOK_SIGNATURE_INVALID');
    }

    const after = await paymentState(checkout);
    expect(after).toEqual(before);
    const eventId = (JSON.parse(payload) as { id: string }).id;
    expect(
      await testApp.dataSource.query(`SELECT 1 FROM payment_events WHERE event_id = $1`, [eventId]),
    ).toEqual([]);

    // The control: the very same event, signed 4 minutes ago, is the provider's and is credited.
    expect((await deliver(payload, sign(payload, { ageSeconds: 240 })).expect(200)).body).toEqual({
      received: true,
      duplicate: false,
    });
    expect((await paymentState(checkout)).payments.map((p) => p.status)).toEqual(['paid']);
  });
});

describe('the same event delivered again', () => {
  it('credits once when it arrives 5 times in a row', async () => {
    const checkout = await openCheckout();
    const payload = completedEvent(checkout.session);
    const answers: boolean[] = [];
    for (let attempt = 0; attempt < 5; attempt += 1) {
      const response = await deliver(payload, sign(payload)).expect(200);
      answers.push(response.body.duplicate as boolean);
    }
    expect(answers).toEqual([false, true, true, true, true]);

    const state = await paymentState(checkout);
    expect(state.payments.map((p) => p.status)).toEqual(['paid']);
    expect(depositPaidCount(state)).toBe(1);
    expect(state.handledEvents).toBe(1);
    expect(state.mail.filter((kind) => kind.startsWith('deposit-receipt'))).toEqual([
      'deposit-receipt',
      'deposit-receipt-company',
    ]);
  });

  it('credits once when it arrives 10 times at once, and when 10 different events for the same checkout arrive at once', async () => {
    const checkout = await openCheckout();
    const payload = completedEvent(checkout.session);
    const same = await Promise.all(
      Array.from({ length: 10 }, () => deliver(payload, sign(payload))),
    );
    expect(same.map((response) => response.status)).toEqual(Array(10).fill(200));
    expect(same.filter((response) => response.body.duplicate === false)).toHaveLength(1);

    // The provider may also report one payment under several event ids (a retry after a timeout on
    // its side): the payment row's lock makes them credit once too.
    const others = Array.from({ length: 10 }, () => completedEvent(checkout.session));
    const distinct = await Promise.all(others.map((body) => deliver(body, sign(body))));
    expect(distinct.map((response) => response.status)).toEqual(Array(10).fill(200));

    const state = await paymentState(checkout);
    expect(state.payments.map((p) => p.status)).toEqual(['paid']);
    expect(depositPaidCount(state)).toBe(1);
    expect(state.mail.filter((kind) => kind.startsWith('deposit-receipt'))).toEqual([
      'deposit-receipt',
      'deposit-receipt-company',
    ]);
  });
});

describe('the deposit amount', () => {
  it('is the server’s: amounts in the accept or checkout body are refused or ignored', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const token = await sendQuote(testApp, owner, estimate.id);
    const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
    const accept = {
      fullName: 'Wren Halloway',
      consent: true,
      optionIds: [],
      contentSha256: shown.estimate.contentSha256,
    };
    for (const extra of [{ deposit: '0.01' }, { total: '1.00' }, { depositPct: '0' }]) {
      const refused = await testApp
        .http()
        .post(`/api/quotes/${token}/accept`)
        .send({ ...accept, ...extra })
        .expect(400);
      expect(refused.body.statusCode).toBe(400);
    }
    const accepted = (
      await testApp.http().post(`/api/quotes/${token}/accept`).send(accept).expect(200)
    ).body as QuoteView;
    const expected = quoteSelectionTotals({
      baseTotal: shown.base.total,
      depositPct: shown.depositPct,
      options: shown.options,
      chosenIds: [],
    });
    expect(accepted.acceptance).toMatchObject({ total: expected.total, deposit: expected.deposit });

    // The checkout route takes no body: whatever amount the page sends, the session asks the deposit.
    const checkout = await testApp
      .http()
      .post(`/api/quotes/${token}/checkout`)
      .send({
        amount: '1.00',
        amount_total: 100,
        unit_amount: 100,
        currency: 'jpy',
        deposit: '0.01',
      })
      .expect(200);
    const sessionId = new URL(checkout.body.url as string).pathname.split('/').pop();
    const session = payments.sessions().find((candidate) => candidate.id === sessionId)!;
    expect(session.amount_total).toBe(Math.round(Number(expected.deposit) * 100));
    expect(session.currency).toBe('usd');
    const [row] = (await testApp.dataSource.query(
      `SELECT amount, currency, status FROM payments WHERE estimate_id = $1`,
      [estimate.id],
    )) as Array<{ amount: string; currency: string; status: string }>;
    expect(row).toEqual({ amount: expected.deposit, currency: 'USD', status: 'pending' });
  });

  it('is not credited as paid when the provider reports another amount or another currency', async () => {
    for (const overrides of [
      { amount_total: 100, amount_subtotal: 100 },
      { currency: 'jpy' },
    ] satisfies Array<Partial<CheckoutSession>>) {
      const checkout = await openCheckout();
      const payload = completedEvent(checkout.session, overrides);
      // Accepted (the provider must stop retrying), recorded for a person, never counted.
      await deliver(payload, sign(payload)).expect(200);
      const state = await paymentState(checkout);
      const label = JSON.stringify(overrides);
      expect(
        state.payments.map((p) => p.status),
        label,
      ).toEqual(['pending']);
      expect(depositPaidCount(state), label).toBe(0);
      expect(state.events, label).toContain('deposit-needs-review');
      expect(
        state.mail.filter((kind) => kind.startsWith('deposit-receipt')),
        label,
      ).toEqual([]);
      const view = (await testApp.http().get(`/api/quotes/${checkout.token}`).expect(200))
        .body as QuoteView;
      expect(view.payment?.status, label).toBe('pending');
    }
  });
});
