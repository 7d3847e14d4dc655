import type { EstimateView, QuoteView } from '@pondwright/shared';
import { createServer } from 'node:net';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakePayments, type FakePayments } from '../src/dev-fakes/fake-payments';
import { startFakeSmtp, type FakeSmtp } from '../src/dev-fakes/fake-smtp';
import { OutboxService } from '../src/mail/outbox.service';
import { approvedEstimate, tokenFromMail } from './support/quote-fixtures';
import { bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

const SECRET_KEY = 'sk_test_payments_spec_key';
const WEBHOOK_SECRET = 'whsec_payments_spec_secret';

let testApp: TestApp;
let smtp: FakeSmtp;
let payments: FakePayments;
let outbox: OutboxService;
let appUrl: string;

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

beforeAll(async () => {
  // The provider's fake must know where to send webhooks, so the app's port is chosen first.
  const appPort = await freePort();
  appUrl = `http://127.0.0.1:${appPort}`;
  smtp = await startFakeSmtp({ smtpPort: 0, httpPort: 0 });
  payments = await startFakePayments({
    port: 0,
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: `${appUrl}/api/payments/webhook`,
    webhookFirstBackoffMs: 20,
  });
  testApp = await createTestApp({
    SMTP_PORT: String(smtp.smtpPort),
    STRIPE_SECRET_KEY: SECRET_KEY,
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    STRIPE_API_URL: payments.url,
  });
  await testApp.app.listen(appPort, '127.0.0.1');
  outbox = testApp.app.get(OutboxService);
  // Earlier test files leave mail queued (their apps run no worker): not this file's to count.
  await testApp.dataSource.query(`DELETE FROM outbox_messages`);
});
afterAll(async () => {
  await testApp.close();
  await payments.stop();
  await smtp.stop();
});

type Owner = Awaited<ReturnType<typeof signupCompany>>;

/** An estimate sent, opened and accepted with no options; answers the token and the quote. */
async function acceptedQuote(
  owner: Owner,
): Promise<{ estimate: EstimateView; token: string; quote: QuoteView }> {
  const estimate = await approvedEstimate(testApp, owner, 'Juniper Ashdown');
  await testApp
    .http()
    .post(`/api/estimates/${estimate.id}/send`)
    .set(...bearer(owner))
    .send({ recipientEmail: 'juniper@example.test' })
    .expect(201);
  await outbox.drain();
  const mail = smtp.messages().find((m) => m.subject.includes(`No. ${estimate.number})`))!;
  const token = tokenFromMail(mail.text);
  const shown = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
  await testApp
    .http()
    .post(`/api/quotes/${token}/checkout`)
    .expect(409)
    .expect((r) => expect(r.body.code).toBe('QUOTE_NOT_ACCEPTED'));
  const quote = (
    await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Juniper Ashdown',
        consent: true,
        optionIds: [],
        contentSha256: shown.estimate.contentSha256,
      })
      .expect(200)
  ).body as QuoteView;
  return { estimate, token, quote };
}

async function paymentRows(estimateId: string) {
  return (await testApp.dataSource.query(
    `SELECT status, amount, currency FROM payments WHERE estimate_id = $1 ORDER BY created_at`,
    [estimateId],
  )) as Array<{ status: string; amount: string; currency: string }>;
}

async function depositEvents(estimateId: string) {
  return (await testApp.dataSource.query(
    `SELECT action FROM estimate_events WHERE estimate_id = $1 AND action = 'deposit-paid'`,
    [estimateId],
  )) as unknown[];
}

describe('deposit payment', () => {
  it('takes the deposit through the hosted checkout and credits it once, even when replayed', async () => {
    const owner = await signupCompany(testApp);
    const { estimate, token, quote } = await acceptedQuote(owner);

    const checkout = await testApp.http().post(`/api/quotes/${token}/checkout`).expect(200);
    const url = new URL(checkout.body.url as string);
    expect(url.origin).toBe(payments.url);
    const [session] = payments.sessions();
    // The amount asked for is the accepted deposit in cents, exactly.
    expect(session!.amount_total).toBe(Math.round(Number(quote.acceptance!.deposit) * 100));
    expect(session!.success_url).toBe(`http://app.test/q/${token}?payment=success`);
    expect(await paymentRows(estimate.id)).toEqual([
      { status: 'pending', amount: quote.acceptance!.deposit, currency: 'USD' },
    ]);

    // The homeowner pays on the fake checkout page; it sends the signed webhook, then redirects back.
    const paid = await fetch(`${payments.url}/checkout/${session!.id}/pay`, {
      method: 'POST',
      redirect: 'manual',
    });
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://app.test/q/${token}?payment=success`);

    const after = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
    expect(after.payment).toMatchObject({ status: 'paid', amount: quote.acceptance!.deposit });
    expect(await depositEvents(estimate.id)).toHaveLength(1);

    // The provider delivers the same event again: nothing more is recorded or e-mailed.
    const [delivered] = (await (await fetch(`${payments.url}/_fake/events`)).json()) as Array<{
      event: { id: string };
    }>;
    const resent = await fetch(`${payments.url}/_fake/events/${delivered!.event.id}/resend`, {
      method: 'POST',
    });
    expect(resent.ok).toBe(true);
    expect((await paymentRows(estimate.id)).filter((p) => p.status === 'paid')).toHaveLength(1);
    expect(await depositEvents(estimate.id)).toHaveLength(1);

    await outbox.drain();
    const receipts = smtp.messages().filter((m) => /deposit/i.test(m.subject));
    expect(receipts.map((m) => m.to[0]).sort()).toEqual(
      ['juniper@example.test', owner.email].sort(),
    );

    const again = await testApp.http().post(`/api/quotes/${token}/checkout`).expect(409);
    expect(again.body.code).toBe('DEPOSIT_ALREADY_PAID');
  });

  it('refuses webhooks whose signature does not verify, and records nothing', async () => {
    const owner = await signupCompany(testApp);
    const { estimate, token } = await acceptedQuote(owner);
    await testApp.http().post(`/api/quotes/${token}/checkout`).expect(200);
    const session = payments.sessions()[0]!;
    const payload = JSON.stringify({
      id: `evt_forged_${estimate.number}_${Date.now()}`,
      object: 'event',
      type: 'checkout.session.completed',
      data: { object: { ...session, status: 'complete', payment_status: 'paid' } },
    });
    const stripe = new Stripe(SECRET_KEY);
    const post = (signature: string) =>
      testApp
        .http()
        .post('/api/payments/webhook')
        .set('Content-Type', 'application/json')
        .set('Stripe-Signature', signature)
        .send(payload);

    // Signed with another secret, tampered, or unsigned: 400, and the event id is not even stored.
    const forged = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_attacker' });
    expect((await post(forged).expect(400)).body.code).toBe('WEBHOOK_SIGNATURE_INVALID');
    await post('t=1,v1=00').expect(400);
    await testApp.http().post('/api/payments/webhook').send({}).expect(400);
    expect((await paymentRows(estimate.id))[0]!.status).toBe('pending');
    expect(
      await testApp.dataSource.query(
        `SELECT 1 FROM payment_events WHERE event_id LIKE 'evt_forged_%'`,
      ),
    ).toEqual([]);

    // The same event properly signed (the provider's SDK makes the header) counts once, however often it comes.
    const signed = () =>
      stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
    expect((await post(signed()).expect(200)).body).toEqual({ received: true, duplicate: false });
    expect((await post(signed()).expect(200)).body).toEqual({ received: true, duplicate: true });
    const results = await Promise.all([post(signed()), post(signed())]);
    expect(results.map((r) => r.status)).toEqual([200, 200]);
    expect((await paymentRows(estimate.id)).map((p) => p.status)).toEqual(['paid']);
    expect(await depositEvents(estimate.id)).toHaveLength(1);
  });
});

describe('the final invoice', () => {
  it('asks for the total less the deposit, and the balance is paid through the same provider', async () => {
    const owner = await signupCompany(testApp);
    const { estimate, token, quote } = await acceptedQuote(owner);
    await testApp.http().post(`/api/quotes/${token}/checkout`).expect(200);
    const depositSession = payments.sessions()[0]!;
    await fetch(`${payments.url}/checkout/${depositSession.id}/pay`, {
      method: 'POST',
      redirect: 'manual',
    });

    const job = (
      await testApp
        .http()
        .post('/api/jobs')
        .set(...bearer(owner))
        .send({ estimateId: estimate.id })
        .expect(201)
    ).body as { id: string; budget: { total: string } };
    const invoiceEarly = await testApp
      .http()
      .post(`/api/jobs/${job.id}/invoice`)
      .set(...bearer(owner))
      .send({})
      .expect(409);
    expect(invoiceEarly.body.code).toBe('JOB_NOT_COMPLETE');
    for (const status of ['in_progress', 'completed']) {
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/status`)
        .set(...bearer(owner))
        .send({ status })
        .expect(200);
    }

    const invoice = (
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/invoice`)
        .set(...bearer(owner))
        .send({})
        .expect(201)
    ).body as { total: string; depositPaid: string; balance: string; status: string };
    // Balance = accepted total − deposit paid (no options chosen, so the job's total is the quote's).
    expect(invoice.total).toBe(quote.acceptance!.total);
    expect(invoice.depositPaid).toBe(quote.acceptance!.deposit);
    expect(Math.round(Number(invoice.balance) * 100)).toBe(
      Math.round(Number(invoice.total) * 100) - Math.round(Number(invoice.depositPaid) * 100),
    );

    await outbox.drain();
    const mail = smtp.messages().find((m) => m.subject.startsWith('Your final invoice'))!;
    const invoiceToken = tokenFromMail(mail.text);
    const shown = (await testApp.http().get(`/api/quotes/${invoiceToken}`).expect(200))
      .body as QuoteView;
    expect(shown.invoice).toMatchObject({ balance: invoice.balance, status: 'open' });

    const checkout = await testApp.http().post(`/api/quotes/${invoiceToken}/checkout`).expect(200);
    const session = payments.sessions()[0]!;
    expect(checkout.body.url).toContain(session.id);
    expect(session.amount_total).toBe(Math.round(Number(invoice.balance) * 100));
    await fetch(`${payments.url}/checkout/${session.id}/pay`, {
      method: 'POST',
      redirect: 'manual',
    });

    const paid = (await testApp.http().get(`/api/quotes/${invoiceToken}`).expect(200))
      .body as QuoteView;
    expect(paid.invoice).toMatchObject({ status: 'paid' });
    expect(paid.invoice!.paidAt).toBeTruthy();
    const again = await testApp.http().post(`/api/quotes/${invoiceToken}/checkout`).expect(409);
    expect(again.body.code).toBe('DEPOSIT_ALREADY_PAID');
    const resend = await testApp
      .http()
      .post(`/api/jobs/${job.id}/invoice`)
      .set(...bearer(owner))
      .send({})
      .expect(409);
    expect(resend.body.code).toBe('INVOICE_PAID');
  });
});
