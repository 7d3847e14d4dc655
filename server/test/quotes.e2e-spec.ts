import type { EstimateQuoteStatus, EstimateView, QuoteView } from '@pondwright/shared';
import { quoteSelectionTotals } from '@pondwright/shared';
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../src/dev-fakes/fake-smtp';
import { AppConfig } from '../src/config/app-config';
import { MailAttachments } from '../src/mail/mail-attachments';
import { MailTransport } from '../src/mail/mail-transport';
import { OutboxService } from '../src/mail/outbox.service';
import { QuoteExpiryService } from '../src/quotes/quote-expiry.service';
import { approvedEstimate, tokenFromMail } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;
let smtp: FakeSmtp;
let outbox: OutboxService;

beforeAll(async () => {
  smtp = await startFakeSmtp({ smtpPort: 0, httpPort: 0 });
  testApp = await createTestApp({
    SMTP_PORT: String(smtp.smtpPort),
    MAILBOX_URL: `http://127.0.0.1:${smtp.httpPort}`,
  });
  outbox = testApp.app.get(OutboxService);
  // Earlier test files leave mail queued (their apps run no worker): not this file's to count.
  await testApp.dataSource.query(`DELETE FROM outbox_messages`);
});
afterAll(async () => {
  await testApp.close();
  await smtp.stop();
});
beforeEach(() => smtp.clear());

type Owner = Awaited<ReturnType<typeof signupCompany>>;

function send(owner: Owner, estimateId: string, recipientEmail = 'wren@example.test') {
  return testApp
    .http()
    .post(`/api/estimates/${estimateId}/send`)
    .set(...bearer(owner))
    .send({ recipientEmail, message: 'Here is the quote we talked about.' });
}

/** Sends the estimate, lets the outbox deliver it, and reads the link's token out of the e-mail. */
async function sendAndReadToken(owner: Owner, estimate: EstimateView): Promise<string> {
  await send(owner, estimate.id).expect(201);
  expect(await outbox.drain()).toBeGreaterThanOrEqual(1);
  const mail = smtp.messages().find((m) => m.subject.includes(`No. ${estimate.number}`));
  expect(mail).toBeDefined();
  return tokenFromMail(mail!.text);
}

async function getEstimate(owner: Owner, id: string): Promise<EstimateView> {
  return (
    await testApp
      .http()
      .get(`/api/estimates/${id}`)
      .set(...bearer(owner))
      .expect(200)
  ).body as EstimateView;
}

async function getQuoteStatus(owner: Owner, id: string): Promise<EstimateQuoteStatus> {
  return (
    await testApp
      .http()
      .get(`/api/estimates/${id}/quote`)
      .set(...bearer(owner))
      .expect(200)
  ).body as EstimateQuoteStatus;
}

const view = (token: string) => testApp.http().get(`/api/quotes/${token}`);

function accept(token: string, quote: QuoteView, optionIds: string[], fullName = 'Wren Halloway') {
  return testApp
    .http()
    .post(`/api/quotes/${token}/accept`)
    .set('User-Agent', 'QuoteTest/1.0 (phone)')
    .set('X-Forwarded-For', '203.0.113.7')
    .send({ fullName, consent: true, optionIds, contentSha256: quote.estimate.contentSha256 });
}

describe('sending a quote', () => {
  it('e-mails a link with the PDF; the token works and the first open marks it viewed', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    expect(estimate.status).toBe('approved');

    const sent = await send(owner, estimate.id).expect(201);
    const status = sent.body as EstimateQuoteStatus;
    expect(status.links).toHaveLength(1);
    expect(status.links[0]).toMatchObject({
      status: 'active',
      recipientEmail: 'wren@example.test',
    });
    expect(JSON.stringify(status)).not.toMatch(/token/i);

    // Nothing leaves before the worker runs: the e-mail waits in the outbox.
    expect(smtp.messages()).toHaveLength(0);
    expect(await outbox.drain()).toBe(1);
    const [mail] = smtp.messages();
    expect(mail!.to).toEqual(['wren@example.test']);
    expect(mail!.text).toContain('Here is the quote we talked about.');
    expect(mail!.attachments).toEqual([
      expect.objectContaining({
        filename: `quote-${estimate.number}.pdf`,
        contentType: 'application/pdf',
      }),
    ]);
    const token = tokenFromMail(mail!.text);
    // 32 random bytes: 256 bits, above the 128 asked for; only the SHA-256 is stored.
    expect(Buffer.from(token, 'base64url')).toHaveLength(32);
    const stored = (await testApp.dataSource.query(
      'SELECT token_hash FROM quote_links WHERE estimate_id = $1',
      [estimate.id],
    )) as Array<{ token_hash: string }>;
    expect(stored[0]!.token_hash).not.toContain(token);

    const quote = (await view(token).expect(200)).body as QuoteView;
    expect(quote).toMatchObject({
      state: 'open',
      estimate: { number: estimate.number, customerName: 'Wren Halloway', versionNumber: 1 },
      scope: 'Dig and build a lined pond with a stream and waterfall.',
    });
    expect(quote.options.map((o) => o.label)).toContain('Flagstone bench beside the pond');
    expect(quote.cautions.join(' ')).toMatch(/call-before-you-dig/);
    expect(quote.drawings.plan?.basins.length).toBeGreaterThan(0);
    // The homeowner never sees costs or margins.
    expect(JSON.stringify(quote)).not.toMatch(
      /extendedCost|markupPct|grossMargin|unitCost|direct cost|[Cc]ontingency/,
    );
    // What is included names the work in plain words; the add-on is offered, not included.
    expect(quote.included.some((item) => /liner/i.test(item))).toBe(true);
    expect(quote.included).not.toContain('Flagstone bench beside the pond');

    await view(token).expect(200);
    const after = await getEstimate(owner, estimate.id);
    expect(after.status).toBe('viewed');
    expect(after.events.filter((e) => e.action === 'quote-viewed')).toHaveLength(1);
    expect(after.events.at(-1)).toMatchObject({ action: 'quote-viewed', actorName: 'Homeowner' });
  });

  it('refuses to send a draft, and only owners and estimators may send', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const crew = await addMember(testApp, owner, 'crew_lead');
    await testApp
      .http()
      .post(`/api/estimates/${estimate.id}/send`)
      .set(...bearer(crew))
      .send({ recipientEmail: 'a@example.test' })
      .expect(403);
    const bad = await send(owner, estimate.id, 'not-an-email').expect(400);
    expect(bad.body.details).toEqual([expect.objectContaining({ field: 'recipientEmail' })]);

    const draft = (
      await testApp
        .http()
        .post('/api/estimates')
        .set(...bearer(owner))
        .send({ title: 'Draft only', customerId: estimate.customerId })
        .expect(201)
    ).body as EstimateView;
    const refused = await send(owner, draft.id).expect(409);
    expect(refused.body.code).toBe('ESTIMATE_NOT_SENDABLE');
    expect(
      await testApp.dataSource.query('SELECT 1 FROM quote_links WHERE estimate_id = $1', [
        draft.id,
      ]),
    ).toEqual([]);
  });

  it('hides one company’s quotes from another', async () => {
    const owner = await signupCompany(testApp);
    const other = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    await send(other, estimate.id).expect(404);
    await testApp
      .http()
      .get(`/api/estimates/${estimate.id}/quote`)
      .set(...bearer(other))
      .expect(404);
    await testApp
      .http()
      .get(`/api/estimates/${estimate.id}/quote.pdf`)
      .set(...bearer(other))
      .expect(404);
  });
});

describe('dead and wrong links', () => {
  it('answers 404 for unknown or malformed tokens and 410 for revoked or expired ones', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const first = await sendAndReadToken(owner, estimate);

    const unknown = await view(randomBytes(32).toString('base64url')).expect(404);
    expect(unknown.body).toMatchObject({ code: 'QUOTE_NOT_FOUND' });
    expect(unknown.body.message).toMatch(/could not find/);
    expect(JSON.stringify(unknown.body)).not.toMatch(/at .*\.ts|stack/i);
    await view('short').expect(404);
    await view(`${first.slice(0, 42)}A`.replace(/^./, first[0] === 'A' ? 'B' : 'A')).expect(404);

    // A resend withdraws the first link.
    const second = await sendAndReadToken(owner, estimate);
    const revoked = await view(first).expect(410);
    expect(revoked.body.code).toBe('QUOTE_LINK_REVOKED');
    await view(second).expect(200);

    // Staff revoke by hand.
    const status = await getQuoteStatus(owner, estimate.id);
    const active = status.links.find((link) => link.status === 'active')!;
    await testApp
      .http()
      .post(`/api/estimates/${estimate.id}/quote-links/${active.id}/revoke`)
      .set(...bearer(owner))
      .expect(200);
    await view(second).expect(410);

    const third = await sendAndReadToken(owner, estimate);
    await testApp.dataSource.query(
      `UPDATE quote_links SET expires_at = now() - interval '1 minute' WHERE revoked_at IS NULL AND estimate_id = $1`,
      [estimate.id],
    );
    // The minute sweep finds the lapsed quote before anyone opens the dead link.
    expect(await testApp.app.get(QuoteExpiryService).sweep()).toBeGreaterThanOrEqual(1);
    const expired = await view(third).expect(410);
    expect(expired.body.code).toBe('QUOTE_LINK_EXPIRED');
    const after = await getEstimate(owner, estimate.id);
    expect(after.status).toBe('expired');
    expect(after.events.filter((e) => e.action === 'quote-expired')).toHaveLength(1);
  });
});

describe('accepting and declining', () => {
  it('records the acceptance with the version’s hash and locks the estimate', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const token = await sendAndReadToken(owner, estimate);
    const quote = (await view(token).expect(200)).body as QuoteView;
    const bench = quote.options.find((o) => o.label === 'Flagstone bench beside the pond')!;

    const wrongVersion = await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: [],
        contentSha256: 'a'.repeat(64),
      })
      .expect(409);
    expect(wrongVersion.body.code).toBe('QUOTE_VERSION_CHANGED');
    const noConsent = await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'W',
        consent: false,
        optionIds: [],
        contentSha256: quote.estimate.contentSha256,
      })
      .expect(400);
    expect(noConsent.body.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'consent',
      'fullName',
    ]);
    const unknownOption = await accept(token, quote, ['no-such-option']).expect(400);
    expect(unknownOption.body.details[0].field).toBe('optionIds');

    const accepted = (await accept(token, quote, [bench.id]).expect(200)).body as QuoteView;
    // Total = base total + bench price + bench tax; deposit = deposit % of it, to the cent (by hand,
    // from the figures the quote showed, not from the server's answer).
    const expectedTotalCents =
      Math.round(Number(quote.base.total) * 100) +
      Math.round(Number(bench.price) * 100) +
      Math.round(Number(bench.tax) * 100);
    expect(Math.round(Number(accepted.acceptance!.total) * 100)).toBe(expectedTotalCents);
    const expectedDeposit = quoteSelectionTotals({
      baseTotal: quote.base.total,
      depositPct: quote.depositPct,
      options: quote.options,
      chosenIds: [bench.id],
    }).deposit;
    expect(accepted.acceptance).toMatchObject({
      fullName: 'Wren Halloway',
      optionIds: [bench.id],
      deposit: expectedDeposit,
    });
    expect(accepted.state).toBe('accepted');

    const [record] = (await testApp.dataSource.query(
      'SELECT ip, user_agent, option_ids, content_sha256, consent_text FROM quote_acceptances WHERE estimate_id = $1',
      [estimate.id],
    )) as Array<Record<string, unknown>>;
    expect(record).toMatchObject({
      ip: '203.0.113.7',
      user_agent: 'QuoteTest/1.0 (phone)',
      option_ids: [bench.id],
      content_sha256: quote.estimate.contentSha256,
    });
    expect(record!.content_sha256).toBe(estimate.versions.at(-1)!.contentSha256);

    // Locked: no second answer, no edit, no resend, and the record itself cannot be changed.
    expect((await accept(token, quote, []).expect(409)).body.code).toBe('QUOTE_ALREADY_ANSWERED');
    await testApp.http().post(`/api/quotes/${token}/decline`).send({}).expect(409);
    const current = await getEstimate(owner, estimate.id);
    expect(current.status).toBe('accepted');
    const edit = await testApp
      .http()
      .put(`/api/estimates/${estimate.id}/draft`)
      .set(...bearer(owner))
      .send({ ...current.draft.content, revision: current.draft.revision, notes: 'change' })
      .expect(409);
    expect(edit.body.code).toBe('ESTIMATE_LOCKED');
    expect((await send(owner, estimate.id).expect(409)).body.code).toBe('ESTIMATE_LOCKED');
    await expect(
      testApp.dataSource.query(
        `UPDATE quote_acceptances SET full_name = 'Someone Else' WHERE estimate_id = $1`,
        [estimate.id],
      ),
    ).rejects.toThrow(/cannot be changed/);

    // Both sides are told, through the outbox.
    await outbox.drain();
    const subjects = smtp.messages().map((m) => m.subject);
    expect(subjects).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/You accepted your quote/),
        expect.stringMatching(new RegExp(`Estimate ${estimate.number} accepted`)),
      ]),
    );
  });

  it('records a decline with its reason, and editing a sent quote withdraws its link', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const token = await sendAndReadToken(owner, estimate);
    const declined = (
      await testApp
        .http()
        .post(`/api/quotes/${token}/decline`)
        .send({ reason: 'We decided to wait until spring.' })
        .expect(200)
    ).body as QuoteView;
    expect(declined.state).toBe('declined');
    const status = await getQuoteStatus(owner, estimate.id);
    expect(status.declined).toMatchObject({ reason: 'We decided to wait until spring.' });

    // Sent again, then edited: the homeowner's link stops working at once.
    const again = await sendAndReadToken(owner, estimate);
    await view(again).expect(200);
    const current = await getEstimate(owner, estimate.id);
    await testApp
      .http()
      .put(`/api/estimates/${estimate.id}/draft`)
      .set(...bearer(owner))
      .send({ ...current.draft.content, revision: current.draft.revision, discountPct: '2' })
      .expect(200);
    expect((await view(again).expect(410)).body.code).toBe('QUOTE_LINK_REVOKED');
  });
});

describe('the outbox', () => {
  it('keeps a message through an SMTP outage and delivers exactly one copy once it is back', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    const { smtpPort, httpPort } = smtp;
    await smtp.stop();
    try {
      await send(owner, estimate.id).expect(201);
      expect(await outbox.drain()).toBe(0);
      const [pending] = (await testApp.dataSource.query(
        `SELECT status, attempts, last_error, next_attempt_at > now() AS later
         FROM outbox_messages WHERE kind = 'quote-sent' AND company_id = $1`,
        [owner.companyId],
      )) as Array<{ status: string; attempts: number; last_error: string; later: boolean }>;
      expect(pending).toMatchObject({ status: 'pending', attempts: 1, later: true });
      expect(pending!.last_error).toBeTruthy();
      // Not due yet: a second drain during the back-off sends nothing and spends no attempt.
      expect(await outbox.drain()).toBe(0);
      // The estimator can see the e-mail has not left yet, and why.
      const waiting = await getQuoteStatus(owner, estimate.id);
      expect(waiting.links[0]!.email).toMatchObject({ status: 'pending', attempts: 1 });
      expect(waiting.links[0]!.email!.lastError).toMatch(/ECONNREFUSED/);
    } finally {
      smtp = await startFakeSmtp({ smtpPort, httpPort });
    }
    await testApp.dataSource.query(
      `UPDATE outbox_messages SET next_attempt_at = now() WHERE status = 'pending'`,
    );
    const [sent, again] = [await outbox.drain(), await outbox.drain()];
    expect(again).toBe(0);
    expect(sent).toBeGreaterThanOrEqual(1);
    const copies = smtp.messages().filter((m) => m.subject.includes(`No. ${estimate.number})`));
    expect(copies).toHaveLength(1);
    const [row] = (await testApp.dataSource.query(
      `SELECT status, attempts FROM outbox_messages WHERE kind = 'quote-sent' AND company_id = $1`,
      [owner.companyId],
    )) as Array<{ status: string; attempts: number }>;
    expect(row).toEqual({ status: 'sent', attempts: 2 });
    const delivered = await getQuoteStatus(owner, estimate.id);
    expect(delivered.links[0]!.email).toMatchObject({
      status: 'sent',
      attempts: 2,
      lastError: null,
    });
  });

  it('never hands one message to two drains running at once', async () => {
    const owner = await signupCompany(testApp);
    const estimate = await approvedEstimate(testApp, owner);
    await send(owner, estimate.id).expect(201);
    // Two workers racing, as two server instances would: separate services sharing only the database.
    const second = new OutboxService(
      testApp.dataSource,
      testApp.app.get(MailTransport),
      testApp.app.get(AppConfig),
      testApp.app.get(MailAttachments),
    );
    const [a, b] = await Promise.all([outbox.drain(), second.drain()]);
    expect(a + b).toBeGreaterThanOrEqual(1);
    const copies = smtp.messages().filter((m) => m.subject.includes(`No. ${estimate.number})`));
    expect(copies).toHaveLength(1);
  });

  it('e-mails invitations through the outbox', async () => {
    const owner = await signupCompany(testApp);
    await testApp
      .http()
      .post('/api/invites')
      .set(...bearer(owner))
      .send({ email: 'new.estimator@example.test', role: 'estimator' })
      .expect(201);
    await outbox.drain();
    const mail = smtp.messages().find((m) => m.to.includes('new.estimator@example.test'));
    expect(mail?.subject).toMatch(/invited you/);
    expect(mail?.text).toMatch(/\/accept-invite\/[A-Za-z0-9_-]{43}/);
  });
});

describe('developer mailbox', () => {
  it('lists captured mail for owners only', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    await outbox.drain();
    await testApp
      .http()
      .get('/api/dev/mailbox')
      .set(...bearer(estimator))
      .expect(403);
    const listed = await testApp
      .http()
      .get('/api/dev/mailbox')
      .set(...bearer(owner))
      .expect(200);
    expect(Array.isArray(listed.body)).toBe(true);
  });
});
