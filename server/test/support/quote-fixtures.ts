import type { EstimateView, QuoteView } from '@pondwright/shared';
import { bearer, type TestApp } from './test-app';

type Session = { accessToken: string };

/** A customer inserted directly: quote tests are about quotes, not the customer screens. */
export async function addCustomer(
  testApp: TestApp,
  companyId: string,
  name: string,
): Promise<string> {
  const [row] = (await testApp.dataSource.query(
    `INSERT INTO customers (company_id, name, email) VALUES ($1, $2, $3) RETURNING id`,
    [companyId, name, 'homeowner@example.test'],
  )) as [{ id: string }];
  return row.id;
}

/**
 * An estimate taken to `approved`: created with the typical pond, one manual add-on so the quote has
 * an option, finalised, and approved by the owner when the margin check asks for it.
 */
export async function approvedEstimate(
  testApp: TestApp,
  owner: Session & { companyId: string },
  customerName = 'Wren Halloway',
): Promise<EstimateView> {
  const customerId = await addCustomer(testApp, owner.companyId, customerName);
  const created = (
    await testApp
      .http()
      .post('/api/estimates')
      .set(...bearer(owner))
      .send({ title: 'Courtyard pond with waterfall', customerId })
      .expect(201)
  ).body as EstimateView;
  const saved = (
    await testApp
      .http()
      .put(`/api/estimates/${created.id}/draft`)
      .set(...bearer(owner))
      .send({
        ...created.draft.content,
        revision: created.draft.revision,
        scope: 'Dig and build a lined pond with a stream and waterfall.',
        manualLines: [
          {
            id: 'bench',
            category: 'materials',
            description: 'Flagstone bench beside the pond',
            quantity: '1',
            unit: 'ea',
            unitCost: '400.00',
            taxable: true,
            kind: 'add-on',
          },
        ],
      })
      .expect(200)
  ).body as EstimateView;
  let estimate = (
    await testApp
      .http()
      .post(`/api/estimates/${created.id}/finalise`)
      .set(...bearer(owner))
      .send({ revision: saved.draft.revision })
      .expect(201)
  ).body as EstimateView;
  if (estimate.status === 'awaiting_approval') {
    estimate = (
      await testApp
        .http()
        .post(`/api/estimates/${created.id}/approve`)
        .set(...bearer(owner))
        .expect(201)
    ).body as EstimateView;
  }
  return estimate;
}

/** The quote link's token from a captured e-mail's text body. */
export function tokenFromMail(text: string): string {
  const match = /\/q\/([A-Za-z0-9_-]{43})/.exec(text);
  if (!match) throw new Error(`No quote link in:\n${text}`);
  return match[1]!;
}

/**
 * Sends the estimate's latest version and reads the link's token out of the queued e-mail, so no SMTP
 * server is needed.
 */
export async function sendQuote(
  testApp: TestApp,
  owner: Session & { companyId: string },
  estimateId: string,
  recipientEmail = 'homeowner@example.test',
): Promise<string> {
  await testApp
    .http()
    .post(`/api/estimates/${estimateId}/send`)
    .set(...bearer(owner))
    .send({ recipientEmail })
    .expect(201);
  const [mail] = (await testApp.dataSource.query(
    `SELECT text_body FROM outbox_messages WHERE company_id = $1 AND kind = 'quote-sent'
     ORDER BY created_at DESC LIMIT 1`,
    [owner.companyId],
  )) as Array<{ text_body: string }>;
  return tokenFromMail(mail!.text_body);
}

/**
 * An estimate sent and accepted by the homeowner with the given options (all of them by default). The
 * link's token is read from the queued e-mail, so no SMTP server is needed.
 */
export async function acceptedEstimate(
  testApp: TestApp,
  owner: Session & { companyId: string },
  optionIds?: string[],
): Promise<{ estimate: EstimateView; token: string; acceptance: QuoteView['acceptance'] }> {
  const estimate = await approvedEstimate(testApp, owner);
  const token = await sendQuote(testApp, owner, estimate.id);
  const quote = (await testApp.http().get(`/api/quotes/${token}`).expect(200)).body as QuoteView;
  const accepted = (
    await testApp
      .http()
      .post(`/api/quotes/${token}/accept`)
      .send({
        fullName: 'Wren Halloway',
        consent: true,
        optionIds: optionIds ?? quote.options.map((option) => option.id),
        contentSha256: quote.estimate.contentSha256,
      })
      .expect(200)
  ).body as QuoteView;
  return { estimate, token, acceptance: accepted.acceptance };
}
