import {
  DEFAULT_QUOTE_TERMS,
  type CompanyQuoteTerms,
  type JobView,
  type QuoteView,
} from '@pondwright/shared';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { approvedEstimate, sendQuote, tokenFromMail } from './support/quote-fixtures';
import { addMember, bearer, createTestApp, signupCompany, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

const OWN_TERMS = [
  'Payment: the balance is due within 14 days of completion, by bank transfer.',
  'Warranty: we repair leaks in our workmanship for 2 years.\nThe liner carries its maker’s warranty.',
  'Buried rock or utility lines found while digging are removed or worked around at the agreed day rate.',
].join('\n\n');

function getTerms(session: { accessToken: string }) {
  return testApp
    .http()
    .get('/api/company/quote-terms')
    .set(...bearer(session));
}

function putTerms(session: { accessToken: string }, terms: string | null) {
  return testApp
    .http()
    .put('/api/company/quote-terms')
    .set(...bearer(session))
    .send({ terms });
}

async function quoteView(token: string): Promise<QuoteView> {
  return (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
}

/** The PDF's text as a reader shows it, white space collapsed. */
async function pdfText(path: string, session?: { accessToken: string }): Promise<string> {
  const request = testApp.http().get(path);
  if (session) request.set(...bearer(session));
  const response = await request
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    })
    .expect(200);
  const parser = new PDFParse({ data: new Uint8Array(response.body as Buffer) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}

/** The company's part of a quote's terms: the first three lines come from the quote itself. */
const companyPart = (quote: QuoteView) => quote.terms.slice(3);

describe('the company’s quote terms', () => {
  it('start as the built-in default; the owner saves their own and restores the default', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');

    expect((await getTerms(estimator).expect(200)).body).toEqual({
      terms: DEFAULT_QUOTE_TERMS,
      isDefault: true,
    } satisfies CompanyQuoteTerms);

    const saved = await putTerms(owner, `  ${OWN_TERMS.replace(/\n/g, '\r\n')}\n`).expect(200);
    expect(saved.body).toEqual({ terms: OWN_TERMS, isDefault: false });
    expect((await getTerms(estimator).expect(200)).body).toEqual(saved.body);

    // Text identical to the default is the default: later improvements to it reach the company.
    await putTerms(owner, DEFAULT_QUOTE_TERMS).expect(200);
    expect((await getTerms(owner).expect(200)).body).toEqual({
      terms: DEFAULT_QUOTE_TERMS,
      isDefault: true,
    });
    await putTerms(owner, OWN_TERMS).expect(200);
    expect((await putTerms(owner, null).expect(200)).body).toEqual({
      terms: DEFAULT_QUOTE_TERMS,
      isDefault: true,
    });
  });

  it('may be changed by the owner only', async () => {
    const owner = await signupCompany(testApp);
    const estimator = await addMember(testApp, owner, 'estimator');
    const crewLead = await addMember(testApp, owner, 'crew_lead');

    await putTerms(estimator, OWN_TERMS).expect(403);
    await putTerms(crewLead, OWN_TERMS).expect(403);
    await testApp.http().put('/api/company/quote-terms').send({ terms: OWN_TERMS }).expect(401);
    expect((await getTerms(owner).expect(200)).body.isDefault).toBe(true);
  });

  it('refuses terms that are too long, empty or not text, with a message, keeping the old', async () => {
    const owner = await signupCompany(testApp);
    await putTerms(owner, OWN_TERMS).expect(200);

    const tooLong = await putTerms(owner, 'a'.repeat(4001)).expect(400);
    expect(tooLong.body.details).toEqual([
      { field: 'terms', message: 'Use at most 4,000 characters' },
    ]);
    await putTerms(owner, 'a'.repeat(4000)).expect(200);
    await putTerms(owner, OWN_TERMS).expect(200);

    const empty = await putTerms(owner, '   ').expect(400);
    expect(empty.body.details).toEqual([
      { field: 'terms', message: 'Write your terms, or restore the default terms' },
    ]);
    await testApp
      .http()
      .put('/api/company/quote-terms')
      .set(...bearer(owner))
      .send({ terms: 42 })
      .expect(400);
    await putTerms(owner, 'Net 14\u0000 days').expect(400);
    expect((await getTerms(owner).expect(200)).body.terms).toBe(OWN_TERMS);
  });

  it('leave another company’s terms and quotes alone', async () => {
    const owner = await signupCompany(testApp);
    const other = await signupCompany(testApp);
    await putTerms(owner, OWN_TERMS).expect(200);

    expect((await getTerms(other).expect(200)).body.isDefault).toBe(true);
    const estimate = await approvedEstimate(testApp, other);
    const quote = await quoteView(
      await sendQuote(testApp, other, estimate.id, 'wren@example.test'),
    );
    expect(companyPart(quote).join('\n\n')).toBe(DEFAULT_QUOTE_TERMS);
  });
});

describe('terms on sent quotes', () => {
  it('are frozen when sent: a quote sent before an edit keeps its terms, one sent after gets the new', async () => {
    const owner = await signupCompany(testApp);
    const before = await approvedEstimate(testApp, owner);
    const beforeToken = await sendQuote(testApp, owner, before.id, 'wren@example.test');

    await putTerms(owner, OWN_TERMS).expect(200);
    const after = await approvedEstimate(testApp, owner);
    const afterToken = await sendQuote(testApp, owner, after.id, 'wren@example.test');

    const old = await quoteView(beforeToken);
    expect(companyPart(old).join('\n\n')).toBe(DEFAULT_QUOTE_TERMS);
    const fresh = await quoteView(afterToken);
    // One item per paragraph; a line break inside a paragraph is kept.
    expect(companyPart(fresh)).toEqual(OWN_TERMS.split('\n\n'));
    // The quote's own facts come first, and the safety cautions stay apart, always shown.
    expect(fresh.terms[0]).toMatch(/^Prices are good until \d{4}-\d{2}-\d{2}\./);
    expect(fresh.terms[1]).toMatch(/^A deposit of [\d.]+ % of the accepted total/);
    expect(fresh.cautions.join(' ')).toMatch(/call-before-you-dig/);
    expect(fresh.terms.join(' ')).not.toMatch(/call-before-you-dig/);

    // The PDF (the homeowner's and staff's download) shows the same frozen terms.
    const oldPdf = await pdfText(`/api/quotes/${beforeToken}/pdf`);
    expect(oldPdf).toContain('Plants and fish are not included unless they are listed.');
    expect(oldPdf).not.toContain('bank transfer');
    const freshPdf = await pdfText(`/api/quotes/${afterToken}/pdf`);
    expect(freshPdf).toContain('we repair leaks in our workmanship for 2 years.');
    expect(freshPdf).not.toContain('Plants and fish');
    const staffPdf = await pdfText(`/api/estimates/${before.id}/quote.pdf`, owner);
    expect(staffPdf).toContain('Plants and fish are not included unless they are listed.');

    // Editing again changes neither sent quote.
    await putTerms(owner, 'Cancellation: a cancelled job pays for the work done.').expect(200);
    expect((await quoteView(afterToken)).terms).toEqual(fresh.terms);
    expect((await quoteView(beforeToken)).terms).toEqual(old.terms);

    // A resend is a new sending: it takes the terms of the day.
    const resent = await quoteView(await sendQuote(testApp, owner, before.id, 'wren@example.test'));
    expect(companyPart(resent)).toEqual(['Cancellation: a cancelled job pays for the work done.']);

    // The copy on a link cannot be rewritten.
    await expect(
      testApp.dataSource.query(
        `UPDATE quote_links SET quote_terms = 'Nothing applies.' WHERE estimate_id = $1`,
        [after.id],
      ),
    ).rejects.toThrow(/cannot be changed/);
  });

  it('are recorded with the acceptance as shown, and a change order shows the accepted quote’s', async () => {
    const owner = await signupCompany(testApp);
    await putTerms(owner, OWN_TERMS).expect(200);
    const estimate = await approvedEstimate(testApp, owner);
    const token = await sendQuote(testApp, owner, estimate.id, 'wren@example.test');
    const quote = await quoteView(token);
    await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: [],
        contentSha256: quote.estimate.contentSha256,
      })
      .expect(200);

    const [record] = (await testApp.dataSource.query(
      `SELECT consent_text, terms_shown, content_sha256 FROM quote_acceptances WHERE estimate_id = $1`,
      [estimate.id],
    )) as Array<{ consent_text: string; terms_shown: string[]; content_sha256: string }>;
    expect(record!.consent_text).toMatch(/the terms above/);
    expect(record!.terms_shown).toEqual(quote.terms);
    // The version's fingerprint is untouched by the terms: still the finalised version's.
    expect(record!.content_sha256).toBe(estimate.versions.at(-1)!.contentSha256);

    // Later edits reach neither the accepted quote nor a change order on its job.
    await putTerms(owner, null).expect(200);
    expect((await quoteView(token)).terms).toEqual(quote.terms);
    const job = (
      await testApp
        .http()
        .post('/api/jobs')
        .set(...bearer(owner))
        .send({ estimateId: estimate.id })
        .expect(201)
    ).body as JobView;
    const order = (
      await testApp
        .http()
        .post(`/api/jobs/${job.id}/change-orders`)
        .set(...bearer(owner))
        .send({
          title: 'Retaining wall',
          reason: 'The bank behind the falls is looser than it looked.',
          lines: [
            {
              id: 'wall',
              category: 'materials',
              description: 'Stacked stone retaining wall',
              quantity: '1',
              unit: 'ea',
              unitCost: '300.00',
              taxable: true,
            },
          ],
        })
        .expect(201)
    ).body as { id: string };
    await testApp
      .http()
      .post(`/api/jobs/${job.id}/change-orders/${order.id}/send`)
      .set(...bearer(owner))
      .send({})
      .expect(200);
    const [mail] = (await testApp.dataSource.query(
      `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'change-order-sent'
       ORDER BY created_at DESC LIMIT 1`,
      [owner.companyId],
    )) as Array<{ text_body: string }>;
    const change = await quoteView(tokenFromMail(mail!.text_body));
    expect(change.changeOrder).not.toBeNull();
    expect(companyPart(change)).toEqual(OWN_TERMS.split('\n\n'));
  });
});
