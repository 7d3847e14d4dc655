import type { QuoteView } from '@pondwright/shared';
import type { EntityManager } from 'typeorm';
import { ChangeOrder } from '../change-orders/entities/change-order.entity';
import { CompanyLogo } from '../companies/entities/company-logo.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { invoiceView } from '../invoices/invoice-view';
import type { QuoteLink } from './entities/quote-link.entity';
import { renderQuotePdf } from './quote-pdf/render-quote-pdf';
import { acceptanceView, loadQuoteRecords, paymentView, type QuoteRecords } from './quote-records';
import { termsOfLink } from './quote-terms';
import { buildQuoteView } from './quote-view';
import { lookUpTogether } from '../database/look-up-together';

/**
 * The page a homeowner's link shows, whatever its kind: the quote's version, with the change order or
 * the final invoice when the link carries one.
 */
export async function loadPublicQuoteView(
  manager: EntityManager,
  link: QuoteLink,
): Promise<QuoteView> {
  // The names and the address come in one plain statement, with whether the homeowner has answered
  // at all: the page is polled while they decide, and the nine to eleven ORM look-ups in two to four
  // rounds it used to make each cost several times the CPU of a plain query (npm run bench). An open
  // quote now needs no more; the answers and the deposit are read once there are any.
  const [version, { answered, ...names }, changeOrder, invoice] = await lookUpTogether(manager, [
    () => manager.findOneByOrFail(EstimateVersion, { id: link.versionId }),
    () => quotePageNames(manager, link),
    () =>
      link.changeOrderId
        ? manager.findOneByOrFail(ChangeOrder, { id: link.changeOrderId })
        : Promise.resolve(null),
    () =>
      link.invoiceId
        ? manager.findOneByOrFail(Invoice, { id: link.invoiceId })
        : Promise.resolve(null),
  ]);
  const records: QuoteRecords = answered
    ? await loadQuoteRecords(manager, link.estimateId)
    : { acceptance: null, decline: null, payment: null };
  // An invoice link comes after the acceptance (made through the quote's own link) and shows it.
  const acceptance =
    records.acceptance?.linkId === link.id || link.invoiceId || link.changeOrderId
      ? records.acceptance
      : null;
  const decline = records.decline?.linkId === link.id ? records.decline : null;
  const companyTerms = await termsOfLink(manager, link, records.acceptance?.linkId ?? null);
  return buildQuoteView({
    ...names,
    version,
    link,
    companyTerms,
    acceptance: acceptance ? acceptanceView(acceptance) : null,
    payment: acceptance && records.payment ? paymentView(records.payment) : null,
    declinedAt: decline?.declinedAt ?? null,
    invoice: invoice ? invoiceView(invoice) : null,
    changeOrder: changeOrder
      ? {
          ...changeOrder.summary,
          state:
            changeOrder.status === 'accepted' || changeOrder.status === 'declined'
              ? changeOrder.status
              : 'open',
          acceptedAt: changeOrder.acceptedAt?.toISOString() ?? null,
        }
      : null,
  });
}

/**
 * The company, sender, estimate number, customer and site address a quote page names, in one query.
 * The site is the one the version was priced for (its content's `siteId`), if any. `answered`: the
 * estimate has an acceptance, a decline or a deposit payment (what `loadQuoteRecords` reads).
 */
async function quotePageNames(
  manager: EntityManager,
  link: QuoteLink,
): Promise<{
  companyName: string;
  hasLogo: boolean;
  replyToEmail: string;
  estimateNumber: number;
  customerName: string;
  siteAddress: string | null;
  answered: boolean;
}> {
  const [row] = (await manager.query(
    `SELECT co.name AS company_name, s.email AS sender_email, e.number, cu.name AS customer_name,
            EXISTS (SELECT 1 FROM company_logos g WHERE g.company_id = co.id) AS has_logo,
            (EXISTS (SELECT 1 FROM quote_acceptances a WHERE a.estimate_id = e.id)
              OR EXISTS (SELECT 1 FROM quote_declines d WHERE d.estimate_id = e.id)
              OR EXISTS (SELECT 1 FROM payments p WHERE p.estimate_id = e.id AND p.purpose = 'deposit'))
              AS answered,
            si.id AS site_id, si.address_line, si.city, si.region, si.postal_code
     FROM estimates e
     JOIN customers cu ON cu.id = e.customer_id
     JOIN companies co ON co.id = $2
     JOIN users s ON s.id = $3
     JOIN estimate_versions v ON v.id = $4
     LEFT JOIN sites si ON si.id = (v.content ->> 'siteId')::uuid
     WHERE e.id = $1`,
    [link.estimateId, link.companyId, link.createdById, link.versionId],
  )) as Array<{
    company_name: string;
    sender_email: string;
    number: number;
    customer_name: string;
    has_logo: boolean;
    answered: boolean;
    site_id: string | null;
    address_line: string;
    city: string;
    region: string;
    postal_code: string;
  }>;
  if (!row) {
    throw new Error(`Quote link ${link.id} names an estimate, company or user that is gone`);
  }
  return {
    companyName: row.company_name,
    hasLogo: row.has_logo,
    replyToEmail: row.sender_email,
    estimateNumber: row.number,
    customerName: row.customer_name,
    siteAddress: row.site_id
      ? [row.address_line, row.city, row.region, row.postal_code].filter(Boolean).join(', ')
      : null,
    answered: row.answered,
  };
}

/**
 * The link's page as a PDF. Also used for the e-mail attachment and staff's download: the same
 * document everywhere.
 */
export async function renderPublicQuotePdf(
  manager: EntityManager,
  link: QuoteLink,
): Promise<{ filename: string; bytes: Buffer }> {
  const [view, logo, estimate] = await lookUpTogether(manager, [
    () => loadPublicQuoteView(manager, link),
    () => manager.findOneBy(CompanyLogo, { companyId: link.companyId }),
    () => manager.findOneByOrFail(Estimate, { id: link.estimateId }),
  ]);
  const bytes = await renderQuotePdf(view, {
    logo: logo ? { bytes: logo.bytes, contentType: logo.contentType } : null,
  });
  return { filename: `quote-${estimate.number}.pdf`, bytes };
}
