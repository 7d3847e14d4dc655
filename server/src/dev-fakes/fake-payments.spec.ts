import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { type FakePayments, startFakePayments } from './fake-payments';

const secretKey = 'sk_test_fake_payments_spec';
const webhookSecret = 'whsec_fake_payments_spec';

type Delivery = { body: string; signature: string };

/** A stand-in for the app's webhook endpoint: records raw bodies, fails the first `failures` calls. */
async function startWebhookReceiver() {
  const receiver = {
    deliveries: [] as Delivery[],
    failures: 0,
    url: '',
    server: null as Server | null,
  };
  const server = createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on('data', (chunk: Buffer) => chunks.push(chunk));
    request.on('end', () => {
      if (receiver.failures > 0) {
        receiver.failures--;
        response.writeHead(500).end();
        return;
      }
      receiver.deliveries.push({
        body: Buffer.concat(chunks).toString('utf8'),
        signature: String(request.headers['stripe-signature']),
      });
      response.writeHead(200).end('{"received":true}');
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  receiver.server = server;
  receiver.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/payments/webhook`;
  return receiver;
}

const depositParams = (overrides: Partial<Stripe.Checkout.SessionCreateParams> = {}) =>
  ({
    mode: 'payment',
    allowed_payment_method_types: ['card'],
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: 'usd',
          unit_amount: 125_000,
          product_data: { name: 'Deposit for quote Q-12', description: 'Façade pond, 30%' },
        },
      },
      {
        quantity: 2,
        price_data: { currency: 'usd', unit_amount: 2_550, product_data: { name: 'Test kit' } },
      },
    ],
    metadata: { estimateId: 'est_42', quoteToken: 'tok_abc' },
    client_reference_id: 'link_7',
    customer_email: 'jane@example.com',
    success_url: 'http://127.0.0.1:3000/q/tok_abc?payment=success&session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:3000/q/tok_abc?payment=cancelled',
    ...overrides,
  }) satisfies Stripe.Checkout.SessionCreateParams;

describe('fake payment provider, through the official SDK', () => {
  let receiver: Awaited<ReturnType<typeof startWebhookReceiver>>;
  let fake: FakePayments;
  let stripe: Stripe;

  const pay = (sessionId: string) =>
    fetch(`${fake.url}/checkout/${sessionId}/pay`, { method: 'POST', redirect: 'manual' });
  const listEvents = async () =>
    (await (await fetch(`${fake.url}/_fake/events`)).json()) as Array<{
      event: Stripe.Event;
      deliveries: Array<{ status: number | null; error: string | null }>;
    }>;

  beforeAll(async () => {
    receiver = await startWebhookReceiver();
    fake = await startFakePayments({
      port: 0,
      secretKey,
      webhookSecret,
      webhookUrl: receiver.url,
      webhookFirstBackoffMs: 5,
    });
    stripe = new Stripe(secretKey, { host: '127.0.0.1', port: fake.port, protocol: 'http' });
  });
  afterAll(async () => {
    await fake.stop();
    await new Promise((resolve) => receiver.server?.close(resolve));
  });
  beforeEach(() => {
    receiver.deliveries = [];
    receiver.failures = 0;
  });

  it('creates a checkout session whose amount and metadata round-trip', async () => {
    const session = await stripe.checkout.sessions.create(depositParams());

    expect(session).toMatchObject({
      object: 'checkout.session',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 125_000 + 2 * 2_550,
      currency: 'usd',
      metadata: { estimateId: 'est_42', quoteToken: 'tok_abc' },
      client_reference_id: 'link_7',
      customer_email: 'jane@example.com',
      payment_intent: null,
      livemode: false,
      mode: 'payment',
    });
    expect(session.id).toMatch(/^cs_test_\w+$/);
    expect(session.url).toBe(`${fake.url}/checkout/${session.id}`);
    expect(fake.url).toBe(`http://127.0.0.1:${fake.port}`);

    const fetched = await stripe.checkout.sessions.retrieve(session.id);
    expect(fetched).toMatchObject({ id: session.id, amount_total: session.amount_total });
    expect(fake.sessions()[0]?.id).toBe(session.id);
  });

  it('answers like the provider for a bad key, an unknown session and a missing param', async () => {
    const wrongKey = new Stripe('sk_test_wrong', {
      host: '127.0.0.1',
      port: fake.port,
      protocol: 'http',
    });
    await expect(wrongKey.checkout.sessions.create(depositParams())).rejects.toMatchObject({
      type: 'StripeAuthenticationError',
      statusCode: 401,
    });
    await expect(stripe.checkout.sessions.retrieve('cs_test_missing')).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      statusCode: 404,
      code: 'resource_missing',
    });
    await expect(
      stripe.checkout.sessions.create(depositParams({ success_url: undefined })),
    ).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      param: 'success_url',
      code: 'parameter_missing',
    });
  });

  it('honours idempotency keys: same key, same session; other params, an error', async () => {
    const first = await stripe.checkout.sessions.create(depositParams(), { idempotencyKey: 'k-1' });
    const again = await stripe.checkout.sessions.create(depositParams(), { idempotencyKey: 'k-1' });
    expect(again.id).toBe(first.id);

    await expect(
      stripe.checkout.sessions.create(depositParams({ customer_email: 'other@example.com' }), {
        idempotencyKey: 'k-1',
      }),
    ).rejects.toMatchObject({ type: 'StripeIdempotencyError' });
  });

  it('serves a labelled, mobile-friendly test checkout page', async () => {
    const session = await stripe.checkout.sessions.create(depositParams());
    const page = await fetch(session.url ?? '');
    const html = await page.text();

    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
    expect(html).toContain('Test checkout — no real money moves');
    expect(html).toContain('name="viewport"');
    expect(html).toContain('Deposit for quote Q-12');
    expect(html).toContain('Façade pond, 30%');
    expect(html).toMatch(
      new RegExp(
        `<form method="post" action="/checkout/${session.id}/pay">\\s*<button type="submit">Pay \\$1,301\\.00</button>`,
      ),
    );
    expect(html).toContain(
      '<a href="http://127.0.0.1:3000/q/tok_abc?payment=cancelled">Cancel</a>',
    );
    expect((await fetch(`${fake.url}/checkout/cs_test_missing`)).status).toBe(404);
  });

  it('pays: a webhook the SDK verifies, the redirect back, and only one event', async () => {
    const session = await stripe.checkout.sessions.create(depositParams());

    const paid = await pay(session.id);

    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(
      `http://127.0.0.1:3000/q/tok_abc?payment=success&session=${session.id}`,
    );
    expect(receiver.deliveries).toHaveLength(1);
    const [delivery] = receiver.deliveries;
    const event = stripe.webhooks.constructEvent(
      delivery?.body ?? '',
      delivery?.signature ?? '',
      webhookSecret,
    );
    expect(event.type).toBe('checkout.session.completed');
    expect(event.id).toMatch(/^evt_test_\w+$/);
    const completed = event.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      amount_total: 130_100,
      metadata: { estimateId: 'est_42', quoteToken: 'tok_abc' },
    });
    expect(completed.payment_intent).toMatch(/^pi_test_\w+$/);
    expect(() =>
      stripe.webhooks.constructEvent(
        delivery?.body ?? '',
        delivery?.signature ?? '',
        'whsec_wrong',
      ),
    ).toThrow(Stripe.errors.StripeSignatureVerificationError);

    expect(await stripe.checkout.sessions.retrieve(session.id)).toMatchObject({
      status: 'complete',
      payment_status: 'paid',
    });

    const paidAgain = await pay(session.id);
    expect(paidAgain.status).toBe(303);
    expect(receiver.deliveries).toHaveLength(1);
    expect((await listEvents()).filter((entry) => entry.event.id === event.id)).toHaveLength(1);
  });

  it('resends the same event, freshly signed', async () => {
    const session = await stripe.checkout.sessions.create(depositParams());
    await pay(session.id);
    const [{ event } = { event: null }] = await listEvents();
    expect(event?.data.object).toMatchObject({ id: session.id });

    const resent = await fetch(`${fake.url}/_fake/events/${event?.id}/resend`, { method: 'POST' });

    expect(resent.status).toBe(200);
    expect(receiver.deliveries).toHaveLength(2);
    const again = receiver.deliveries[1];
    const verified = stripe.webhooks.constructEvent(
      again?.body ?? '',
      again?.signature ?? '',
      webhookSecret,
    );
    expect(verified.id).toBe(event?.id);
    expect(
      (await fetch(`${fake.url}/_fake/events/evt_test_missing/resend`, { method: 'POST' })).status,
    ).toBe(404);
  });

  it('retries a failing webhook endpoint until it answers 2xx', async () => {
    receiver.failures = 2;
    const session = await stripe.checkout.sessions.create(depositParams());

    expect((await pay(session.id)).status).toBe(303);

    expect(receiver.deliveries).toHaveLength(1);
    const [latest] = await listEvents();
    expect(latest?.deliveries.map((attempt) => attempt.status)).toEqual([500, 500, 200]);
  });

  it('still sends the payer back when the webhook endpoint stays unreachable', async () => {
    const unreachable = await startFakePayments({
      port: 0,
      secretKey,
      webhookSecret,
      webhookUrl: 'http://127.0.0.1:9/unreachable',
      webhookFirstBackoffMs: 1,
    });
    try {
      const client = new Stripe(secretKey, {
        host: '127.0.0.1',
        port: unreachable.port,
        protocol: 'http',
      });
      const session = await client.checkout.sessions.create(depositParams());
      const paid = await fetch(`${unreachable.url}/checkout/${session.id}/pay`, {
        method: 'POST',
        redirect: 'manual',
      });
      expect(paid.status).toBe(303);
      const events = (await (await fetch(`${unreachable.url}/_fake/events`)).json()) as Array<{
        deliveries: Array<{ status: number | null; error: string | null }>;
      }>;
      expect(events[0]?.deliveries).toHaveLength(6);
      expect(
        events[0]?.deliveries.every((attempt) => attempt.status === null && attempt.error),
      ).toBe(true);
    } finally {
      await unreachable.stop();
    }
  });
});
