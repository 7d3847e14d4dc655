import type { EmailDeliveryView, EstimateQuoteStatus, QuoteLinkView } from '@pondwright/shared';

/** A quote e-mail delivered on the first try unless told otherwise. */
export function buildEmailDelivery(overrides: Partial<EmailDeliveryView> = {}): EmailDeliveryView {
  return {
    id: 'mail-1',
    status: 'sent',
    attempts: 1,
    lastError: null,
    sentAt: '2026-12-03T09:00:05.000Z',
    retriedAt: null,
    ...overrides,
  };
}

export function buildQuoteLink(overrides: Partial<QuoteLinkView> = {}): QuoteLinkView {
  return {
    id: 'link-1',
    versionNumber: 1,
    recipientEmail: 'bram@example.test',
    status: 'active',
    createdAt: '2026-12-03T09:00:00.000Z',
    expiresAt: '2027-01-02T09:00:00.000Z',
    revokedAt: null,
    firstViewedAt: null,
    email: buildEmailDelivery(),
    createdByName: 'Olive Owner',
    ...overrides,
  };
}

/** Staff's view of an estimate's quote: no links, no answer, no payment unless given. */
export function buildQuoteStatus(
  overrides: Partial<EstimateQuoteStatus> = {},
): EstimateQuoteStatus {
  return { links: [], acceptance: null, declined: null, payment: null, ...overrides };
}

/** An accepted quote, its deposit paid unless `paid` is false. */
export function buildAcceptedQuote(paid = true): EstimateQuoteStatus {
  return buildQuoteStatus({
    links: [buildQuoteLink({ status: 'used', firstViewedAt: '2026-12-03T18:20:00.000Z' })],
    acceptance: {
      fullName: 'Bram Thistlewood',
      acceptedAt: '2026-12-04T10:15:00.000Z',
      optionIds: [],
      total: '10229.06',
      deposit: '3068.72',
      versionNumber: 1,
      contentSha256: 'ab12cd34ef56'.padEnd(64, '0'),
      ip: '203.0.113.7',
      userAgent: 'Mozilla/5.0 (X11; Linux x86_64) TestBrowser/1.0',
    },
    payment: paid
      ? {
          status: 'paid',
          amount: '3068.72',
          paidAt: '2026-12-04T10:30:00.000Z',
          provider: 'stripe',
          reference: 'cs_test_123',
        }
      : null,
  });
}
