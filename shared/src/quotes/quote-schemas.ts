import { z } from 'zod';
import type { CrossSection, PlanDrawing } from '../drawings';
import type { ChangeOrderSummary } from '../jobs/job-schemas';

/**
 * The homeowner's quote: what staff send, what the public quote page shows and what the homeowner
 * sends back. Zod rules and response types only (the drawings are imported as types), so the quote
 * page's bundle stays small.
 */

/** `POST /api/estimates/:id/send` and `/resend`: who gets the link, and for how long it works. */
export const sendQuoteRequestSchema = z
  .object({
    recipientEmail: z
      .email({ error: 'Enter the homeowner’s e-mail address' })
      .max(254, 'Use at most 254 characters'),
    message: z.string().trim().max(2000, 'Use at most 2000 characters').optional(),
    expiresInDays: z
      .number({ error: 'Give the number of days the link works' })
      .int('Give a whole number of days')
      .min(1, 'Give at least 1 day')
      .max(90, 'Give at most 90 days')
      .default(30),
  })
  .strict();
export type SendQuoteRequest = z.infer<typeof sendQuoteRequestSchema>;

/** `POST /api/quotes/:token/accept`. `contentSha256` is the version the page showed. */
export const acceptQuoteRequestSchema = z
  .object({
    fullName: z
      .string({ error: 'Type your full name' })
      .trim()
      .min(2, 'Type your full name')
      .max(120, 'Use at most 120 characters'),
    consent: z.literal(true, { error: 'Tick the box to agree to the quote and its terms' }),
    optionIds: z
      .array(z.string().min(1).max(120), { error: 'Send the chosen options as a list' })
      .max(100, 'Choose at most 100 options')
      .refine((ids) => new Set(ids).size === ids.length, 'Choose each option once'),
    contentSha256: z
      .string({ error: 'Send the version you were shown' })
      .regex(/^[0-9a-f]{64}$/, 'Send the version you were shown'),
  })
  .strict();
export type AcceptQuoteRequest = z.infer<typeof acceptQuoteRequestSchema>;

/** `POST /api/quotes/:token/decline`: an optional reason. */
export const declineQuoteRequestSchema = z
  .object({ reason: z.string().trim().max(2000, 'Use at most 2000 characters').optional() })
  .strict();
export type DeclineQuoteRequest = z.infer<typeof declineQuoteRequestSchema>;

/** `POST /api/quotes/:token/checkout`: no body; answers where to send the homeowner to pay. */
export type CheckoutRedirect = { url: string };

export type QuoteOption = {
  id: string;
  label: string;
  kind: 'add-on' | 'alternate';
  /** Price before tax, and the sales tax it adds if chosen (no discount applies to options). */
  price: string;
  tax: string;
};

export type QuoteHighlight = { label: string; value: string };

export type QuotePaymentView = {
  status: 'pending' | 'paid';
  amount: string;
  paidAt: string | null;
};

export type QuoteAcceptanceView = {
  fullName: string;
  acceptedAt: string;
  optionIds: string[];
  total: string;
  deposit: string;
};

/** What the public page (and the PDF) shows. Money is decimal strings with 2 decimals. */
export type QuoteView = {
  state: 'open' | 'accepted' | 'declined';
  currency: string;
  company: { name: string; hasLogo: boolean; replyToEmail: string | null };
  estimate: {
    number: number;
    title: string;
    customerName: string;
    siteAddress: string | null;
    versionNumber: number;
    contentSha256: string;
    issuedAt: string;
    expiresAt: string;
  };
  /** The scope in the estimator's words (plain text, paragraphs split by blank lines). */
  scope: string;
  /** Size, water volume, depth and features in the estimate's units, e.g. "Water volume" → "1,480 US gal". */
  highlights: QuoteHighlight[];
  /** What the base price includes, one plain line per item (no costs or markups). */
  included: string[];
  drawings: { plan: PlanDrawing | null; sections: CrossSection[] };
  /** The base price: discount and any minimum job charge already applied; tax shown apart. */
  base: { priceBeforeTax: string; discount: string; tax: string; total: string };
  options: QuoteOption[];
  depositPct: string;
  terms: string[];
  cautions: string[];
  acceptance: QuoteAcceptanceView | null;
  payment: QuotePaymentView | null;
  declinedAt: string | null;
  /** Set when the link was sent with the job's final invoice: the balance is paid from the page. */
  invoice: QuoteInvoiceView | null;
  /**
   * Set when the link carries a change order: the homeowner accepts or declines the change (with
   * `contentSha256` of its version); the rest of the view is the whole job after the change.
   */
  changeOrder:
    | (ChangeOrderSummary & { state: 'open' | 'accepted' | 'declined'; acceptedAt: string | null })
    | null;
};

/** The job's final invoice as the homeowner sees it. */
export type QuoteInvoiceView = {
  issuedAt: string;
  /** The accepted total (with options and accepted change orders). */
  total: string;
  depositPaid: string;
  balance: string;
  status: 'open' | 'paid';
  paidAt: string | null;
};

/** A quote link as staff see it (never the token itself, which is only ever e-mailed). */
export type QuoteLinkView = {
  id: string;
  versionNumber: number;
  recipientEmail: string;
  status: 'active' | 'expired' | 'revoked' | 'used';
  createdAt: string;
  expiresAt: string;
  revokedAt: string | null;
  firstViewedAt: string | null;
  createdByName: string;
  /** The quote e-mail's delivery through the outbox: waiting (with retries), sent, or given up. */
  email: EmailDeliveryView | null;
};

/**
 * One e-mail's delivery through the outbox, as staff see it: `pending` (queued, or waiting to retry
 * after `lastError`), `sent`, or `failed` (given up; staff may send it again with
 * `POST /api/outbox/:id/retry`, which answers this shape).
 */
export type EmailDeliveryView = {
  /** The outbox message's id. */
  id: string;
  status: 'pending' | 'sent' | 'failed';
  /** Attempts since it was queued, or since staff last sent it again. */
  attempts: number;
  lastError: string | null;
  sentAt: string | null;
  /** When staff last sent it again after it gave up; null if never. */
  retriedAt: string | null;
};

/** Staff's view of an estimate's quote: links, the acceptance and the deposit. */
export type EstimateQuoteStatus = {
  links: QuoteLinkView[];
  acceptance:
    | (QuoteAcceptanceView & {
        versionNumber: number;
        contentSha256: string;
        ip: string;
        userAgent: string;
      })
    | null;
  declined: { at: string; reason: string | null } | null;
  payment: (QuotePaymentView & { provider: string; reference: string }) | null;
};

/** One captured message on the developer mailbox (the local fake SMTP server). */
export type MailboxMessage = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: Array<{ filename: string; contentType: string; size: number }>;
};
