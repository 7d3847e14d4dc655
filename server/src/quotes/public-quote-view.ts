import type { QuoteView } from '@pondwright/shared';
import type { EntityManager } from 'typeorm';
import { ChangeOrder } from '../change-orders/entities/change-order.entity';
import { CompanyLogo } from '../companies/entities/company-logo.entity';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { invoiceView } from '../invoices/invoice-view';
import { User } from '../users/entities/user.entity';
import type { QuoteLink } from './entities/quote-link.entity';
import { renderQuotePdf } from './quote-pdf/render-quote-pdf';
import { acceptanceView, loadQuoteRecords, paymentView } from './quote-records';
import { termsOfLink } from './quote-terms';
import { buildQuoteView } from './quote-view';

/**
 * The page a homeowner's link shows, whatever its kind: the quote's version, with the change order or
 * the final invoice when the link carries one.
 */
export async function loadPublicQuoteView(
  manager: EntityManager,
  link: QuoteLink,
): Promise<QuoteView> {
  const [version, estimate, company, hasLogo, records] = await Promise.all([
    manager.findOneByOrFail(EstimateVersion, { id: link.versionId }),
    manager.findOneByOrFail(Estimate, { id: link.estimateId }),
    manager.findOneByOrFail(Company, { id: link.companyId }),
    manager.existsBy(CompanyLogo, { companyId: link.companyId }),
    loadQuoteRecords(manager, link.estimateId),
  ]);
  const [customer, site, sender] = await Promise.all([
    manager.findOneByOrFail(Customer, { id: estimate.customerId }),
    version.content.siteId ? manager.findOneBy(Site, { id: version.content.siteId }) : null,
    manager.findOneByOrFail(User, { id: link.createdById }),
  ]);
  // An invoice link comes after the acceptance (made through the quote's own link) and shows it.
  const acceptance =
    records.acceptance?.linkId === link.id || link.invoiceId || link.changeOrderId
      ? records.acceptance
      : null;
  const changeOrder = link.changeOrderId
    ? await manager.findOneByOrFail(ChangeOrder, { id: link.changeOrderId })
    : null;
  const invoice = link.invoiceId
    ? await manager.findOneByOrFail(Invoice, { id: link.invoiceId })
    : null;
  const decline = records.decline?.linkId === link.id ? records.decline : null;
  const companyTerms = await termsOfLink(manager, link, records.acceptance?.linkId ?? null);
  return buildQuoteView({
    companyName: company.name,
    hasLogo,
    replyToEmail: sender.email,
    estimateNumber: estimate.number,
    customerName: customer.name,
    siteAddress: site
      ? [site.addressLine, site.city, site.region, site.postalCode].filter(Boolean).join(', ')
      : null,
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
 * The link's page as a PDF. Also used for the e-mail attachment and staff's download: the same
 * document everywhere.
 */
export async function renderPublicQuotePdf(
  manager: EntityManager,
  link: QuoteLink,
): Promise<{ filename: string; bytes: Buffer }> {
  const [view, logo, estimate] = await Promise.all([
    loadPublicQuoteView(manager, link),
    manager.findOneBy(CompanyLogo, { companyId: link.companyId }),
    manager.findOneByOrFail(Estimate, { id: link.estimateId }),
  ]);
  const bytes = await renderQuotePdf(view, {
    logo: logo ? { bytes: logo.bytes, contentType: logo.contentType } : null,
  });
  return { filename: `quote-${estimate.number}.pdf`, bytes };
}
