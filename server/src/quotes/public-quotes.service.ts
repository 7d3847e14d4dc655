import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  acceptQuoteRequestSchema,
  declineQuoteRequestSchema,
  quoteSelectionTotals,
  type QuoteView,
} from '@pondwright/shared';
import { DataSource, IsNull, Not, type EntityManager } from 'typeorm';
import { hashToken } from '../auth/secure-token';
import { AppError } from '../common/errors/app-error';
import { parseBody } from '../common/validation/parse-body';
import { AppConfig } from '../config/app-config';
import { CompanyLogo } from '../companies/entities/company-logo.entity';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Site } from '../customers/entities/site.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { fieldErrors } from '../estimates/field-errors';
import { OutboxService } from '../mail/outbox.service';
import { ChangeOrderAnswers } from '../change-orders/change-order-answers';
import { ChangeOrder } from '../change-orders/entities/change-order.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { invoiceView } from '../invoices/invoice-view';
import { PaymentsService } from '../payments/payments.service';
import { User } from '../users/entities/user.entity';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { QuoteDecline } from './entities/quote-decline.entity';
import { QuoteLink } from './entities/quote-link.entity';
import { HOMEOWNER, recordEstimateEvent } from './estimate-events';
import { expireLapsedQuotes } from './quote-expiry';
import { renderQuotePdf } from './quote-pdf/render-quote-pdf';
import { quoteAcceptedHomeownerMail, quoteAnsweredStaffMail, money } from './quote-mail';
import { acceptanceView, loadQuoteRecords, paymentView } from './quote-records';
import { buildQuoteView, CONSENT_TEXT } from './quote-view';

/** Who is on the other end of a public request, for the acceptance record. */
export type RequestMeta = { ip: string; userAgent: string };

/** A token as `newSecureToken` makes them: 32 random bytes in base64url. */
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/**
 * The homeowner's side, reached by the token alone. Unknown tokens answer 404 and dead ones 410 with a
 * friendly message; the token is looked up by its SHA-256, so the database never holds a usable link.
 */
@Injectable()
export class PublicQuotesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly outbox: OutboxService,
    private readonly payments: PaymentsService,
    private readonly changeOrders: ChangeOrderAnswers,
    private readonly config: AppConfig,
  ) {}

  /** The quote; the first open marks the link viewed and a sent estimate `viewed`. */
  async view(token: string, meta: RequestMeta): Promise<QuoteView> {
    const link = await this.usableLink(this.dataSource.manager, token);
    if (!link.firstViewedAt) {
      await this.dataSource.transaction(async (manager) => {
        const marked = (await manager.query(
          `UPDATE quote_links SET first_viewed_at = now() WHERE id = $1 AND first_viewed_at IS NULL RETURNING id`,
          [link.id],
        )) as [unknown[], number];
        if (marked[0].length === 0) return;
        await manager.query(
          `UPDATE estimates SET status = 'viewed', updated_at = now() WHERE id = $1 AND status = 'sent'`,
          [link.estimateId],
        );
        await recordEstimateEvent(manager, {
          companyId: link.companyId,
          estimateId: link.estimateId,
          actorLabel: HOMEOWNER,
          action: 'quote-viewed',
          detail: { linkId: link.id, ip: meta.ip, userAgent: meta.userAgent.slice(0, 300) },
        });
      });
    }
    return this.quoteView(this.dataSource.manager, link);
  }

  /**
   * Accepts the version the page showed: refused if it is no longer the link's version (409), or the
   * estimate was already answered (409). Records who, when, from where, with which options and the
   * version's SHA-256; the estimate becomes `accepted` (locked) and its other links are revoked.
   */
  async accept(token: string, body: unknown, meta: RequestMeta): Promise<QuoteView> {
    const request = parseBody(acceptQuoteRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const link = await this.usableLink(manager, token);
      if (link.changeOrderId) {
        await this.changeOrders.answer(manager, link, { accepted: true, request, meta });
        return;
      }
      const estimate = await this.lockAnswerable(manager, link);
      const version = await manager.findOneByOrFail(EstimateVersion, { id: link.versionId });
      if (request.contentSha256 !== version.contentSha256) {
        throw new AppError(
          'QUOTE_VERSION_CHANGED',
          'This quote has changed since you opened it. Reload the page to see the current version.',
        );
      }
      const options = version.computed.priced.options;
      const unknown = request.optionIds.filter((id) => !options.some((o) => o.id === id));
      if (unknown.length > 0) {
        throw fieldErrors([
          { field: 'optionIds', message: `Unknown option: ${unknown.join(', ')}` },
        ]);
      }
      const totals = quoteSelectionTotals({
        baseTotal: version.computed.priced.totals.total,
        depositPct: version.computed.priced.totals.depositPct,
        options,
        chosenIds: request.optionIds,
      });
      const acceptedAt = new Date();
      await manager.save(
        manager.create(QuoteAcceptance, {
          companyId: link.companyId,
          estimateId: link.estimateId,
          versionId: version.id,
          linkId: link.id,
          fullName: request.fullName,
          consentText: CONSENT_TEXT,
          ip: meta.ip,
          userAgent: meta.userAgent.slice(0, 1000),
          optionIds: totals.optionIds,
          contentSha256: version.contentSha256,
          total: totals.total,
          deposit: totals.deposit,
          acceptedAt,
        }),
      );
      await manager.update(Estimate, { id: estimate.id }, { status: 'accepted' });
      await manager.update(
        QuoteLink,
        { estimateId: estimate.id, id: Not(link.id), revokedAt: IsNull() },
        { revokedAt: acceptedAt },
      );
      await recordEstimateEvent(manager, {
        companyId: link.companyId,
        estimateId: estimate.id,
        actorLabel: HOMEOWNER,
        action: 'quote-accepted',
        detail: {
          versionNumber: version.versionNumber,
          sha256: version.contentSha256,
          fullName: request.fullName,
          optionIds: totals.optionIds,
          total: totals.total,
          deposit: totals.deposit,
          ip: meta.ip,
        },
      });
      const currency = version.computed.priced.currency;
      const { company, sender } = await this.companyAndSender(manager, link);
      await this.outbox.enqueue(manager, {
        companyId: link.companyId,
        kind: 'quote-accepted-homeowner',
        to: link.recipientEmail,
        replyTo: sender.email,
        ...quoteAcceptedHomeownerMail({
          companyName: company.name,
          fullName: request.fullName,
          title: version.content.title,
          total: totals.total,
          deposit: totals.deposit,
          currency,
          url: `${this.config.publicAppUrl}/q/${token}`,
        }),
      });
      await this.outbox.enqueue(manager, {
        companyId: link.companyId,
        kind: 'quote-accepted-staff',
        to: sender.email,
        ...quoteAnsweredStaffMail({
          answer: 'accepted',
          estimateNumber: estimate.number,
          title: version.content.title,
          customerName: request.fullName,
          detail: `Total ${money(totals.total, currency)} with ${totals.optionIds.length} option(s); deposit ${money(totals.deposit, currency)}.`,
          url: `${this.config.publicAppUrl}/estimates/${estimate.id}`,
        }),
      });
    });
    return this.view(token, meta);
  }

  async decline(token: string, body: unknown, meta: RequestMeta): Promise<QuoteView> {
    const request = parseBody(declineQuoteRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const link = await this.usableLink(manager, token);
      if (link.changeOrderId) {
        await this.changeOrders.answer(manager, link, {
          accepted: false,
          reason: request.reason,
          meta,
        });
        return;
      }
      const estimate = await this.lockAnswerable(manager, link);
      const reason = request.reason || null;
      await manager.save(
        manager.create(QuoteDecline, {
          companyId: link.companyId,
          estimateId: estimate.id,
          versionId: link.versionId,
          linkId: link.id,
          reason,
          ip: meta.ip,
          userAgent: meta.userAgent.slice(0, 1000),
          declinedAt: new Date(),
        }),
      );
      await manager.update(Estimate, { id: estimate.id }, { status: 'declined' });
      await recordEstimateEvent(manager, {
        companyId: link.companyId,
        estimateId: estimate.id,
        actorLabel: HOMEOWNER,
        action: 'quote-declined',
        detail: { linkId: link.id, reason, ip: meta.ip },
      });
      const { sender } = await this.companyAndSender(manager, link);
      const customer = await manager.findOneByOrFail(Customer, { id: estimate.customerId });
      await this.outbox.enqueue(manager, {
        companyId: link.companyId,
        kind: 'quote-declined-staff',
        to: sender.email,
        ...quoteAnsweredStaffMail({
          answer: 'declined',
          estimateNumber: estimate.number,
          title: estimate.title,
          customerName: customer.name,
          detail: reason ? `Their reason: ${reason}` : 'They gave no reason.',
          url: `${this.config.publicAppUrl}/estimates/${estimate.id}`,
        }),
      });
    });
    return this.view(token, meta);
  }

  /**
   * The hosted checkout: for the deposit once accepted through this link, or for the balance when the
   * link carries the final invoice.
   */
  async checkout(token: string): Promise<{ url: string }> {
    const manager = this.dataSource.manager;
    const link = await this.usableLink(manager, token);
    const acceptance = await manager.findOneBy(QuoteAcceptance, { estimateId: link.estimateId });
    if (acceptance && link.invoiceId) return this.balanceCheckout(token, link, acceptance);
    if (!acceptance || acceptance.linkId !== link.id) {
      throw new AppError('QUOTE_NOT_ACCEPTED', 'Accept the quote first; the deposit follows.');
    }
    const [estimate, version, company] = await Promise.all([
      manager.findOneByOrFail(Estimate, { id: link.estimateId }),
      manager.findOneByOrFail(EstimateVersion, { id: link.versionId }),
      manager.findOneByOrFail(Company, { id: link.companyId }),
    ]);
    const url = await this.payments.createDepositCheckout({
      acceptance,
      currency: version.computed.priced.currency,
      description: `Deposit for quote No. ${estimate.number} from ${company.name}`,
      customerEmail: link.recipientEmail,
      returnUrl: `${this.config.publicAppUrl}/q/${token}`,
    });
    return { url };
  }

  /**
   * The HTTP status the quote page itself is served with: 200 for a usable link, else the API's 404 or
   * 410, so a dead link is a dead page to browsers and crawlers too (the page still explains it).
   */
  async pageStatus(token: string): Promise<200 | 404 | 410> {
    try {
      await this.usableLink(this.dataSource.manager, token);
      return 200;
    } catch (error) {
      if (error instanceof AppError && (error.status === 404 || error.status === 410)) {
        return error.status;
      }
      throw error;
    }
  }

  private async balanceCheckout(
    token: string,
    link: QuoteLink,
    acceptance: QuoteAcceptance,
  ): Promise<{ url: string }> {
    const manager = this.dataSource.manager;
    const [invoice, estimate, version, company] = await Promise.all([
      manager.findOneByOrFail(Invoice, { id: link.invoiceId! }),
      manager.findOneByOrFail(Estimate, { id: link.estimateId }),
      manager.findOneByOrFail(EstimateVersion, { id: link.versionId }),
      manager.findOneByOrFail(Company, { id: link.companyId }),
    ]);
    const url = await this.payments.createBalanceCheckout({
      acceptance,
      invoice,
      currency: version.computed.priced.currency,
      description: `Balance for job No. ${estimate.number} from ${company.name}`,
      customerEmail: link.recipientEmail,
      returnUrl: `${this.config.publicAppUrl}/q/${token}`,
    });
    return { url };
  }

  async pdf(token: string): Promise<{ filename: string; bytes: Buffer }> {
    const link = await this.usableLink(this.dataSource.manager, token);
    return this.pdfForLink(link);
  }

  /** Also used for the e-mail attachment and staff's download: the same document everywhere. */
  async pdfForLink(link: QuoteLink): Promise<{ filename: string; bytes: Buffer }> {
    const manager = this.dataSource.manager;
    const [view, logo, estimate] = await Promise.all([
      this.quoteView(manager, link),
      manager.findOneBy(CompanyLogo, { companyId: link.companyId }),
      manager.findOneByOrFail(Estimate, { id: link.estimateId }),
    ]);
    const bytes = await renderQuotePdf(view, {
      logo: logo ? { bytes: logo.bytes, contentType: logo.contentType } : null,
    });
    return { filename: `quote-${estimate.number}.pdf`, bytes };
  }

  async logo(token: string): Promise<CompanyLogo> {
    const link = await this.usableLink(this.dataSource.manager, token);
    const logo = await this.dataSource.manager.findOneBy(CompanyLogo, {
      companyId: link.companyId,
    });
    if (!logo) throw new AppError('LOGO_NOT_FOUND', 'This company has no logo.');
    return logo;
  }

  /**
   * The link for a token: 404 when unknown; 410 when revoked or expired, except that a link the
   * homeowner accepted through keeps working past its expiry (for the deposit, the PDF and the record).
   */
  private async usableLink(manager: EntityManager, token: string): Promise<QuoteLink> {
    const link = TOKEN_PATTERN.test(token)
      ? await manager.findOneBy(QuoteLink, { tokenHash: hashToken(token) })
      : null;
    if (!link) {
      throw new AppError(
        'QUOTE_NOT_FOUND',
        'We could not find this quote. Check that the whole link was copied from the e-mail.',
      );
    }
    // The company is named only in the refusals: a usable link (every poll of the page) skips the read.
    const companyName = async () =>
      (await manager.findOneByOrFail(Company, { id: link.companyId })).name;
    if (link.revokedAt) {
      throw new AppError(
        'QUOTE_LINK_REVOKED',
        `This link was withdrawn by ${await companyName()}, usually because the quote was updated. Ask them for the current one.`,
      );
    }
    if (link.expiresAt.getTime() <= Date.now()) {
      const acceptedHere = await manager.existsBy(QuoteAcceptance, { linkId: link.id });
      if (!acceptedHere) {
        await expireLapsedQuotes(manager, link.estimateId);
        throw new AppError(
          'QUOTE_LINK_EXPIRED',
          `This quote expired on ${link.expiresAt.toISOString().slice(0, 10)}. Ask ${await companyName()} for an updated one.`,
        );
      }
    }
    return link;
  }

  /** Locks the estimate; it must still be waiting for the homeowner's answer on this link's version. */
  private async lockAnswerable(manager: EntityManager, link: QuoteLink): Promise<Estimate> {
    const estimate = await manager.findOneOrFail(Estimate, {
      where: { id: link.estimateId },
      lock: { mode: 'pessimistic_write' },
    });
    if (estimate.status === 'accepted' || estimate.status === 'declined') {
      throw new AppError(
        'QUOTE_ALREADY_ANSWERED',
        `This quote was already ${estimate.status}. Contact the company if you want to change your answer.`,
      );
    }
    // Re-read under the lock: staff may have revoked the link a moment ago.
    const fresh = await manager.findOneByOrFail(QuoteLink, { id: link.id });
    if (fresh.revokedAt) {
      throw new AppError(
        'QUOTE_LINK_REVOKED',
        'This link was withdrawn a moment ago. Ask for the current quote.',
      );
    }
    return estimate;
  }

  private async companyAndSender(manager: EntityManager, link: QuoteLink) {
    const [company, sender] = await Promise.all([
      manager.findOneByOrFail(Company, { id: link.companyId }),
      manager.findOneByOrFail(User, { id: link.createdById }),
    ]);
    return { company, sender };
  }

  private async quoteView(manager: EntityManager, link: QuoteLink): Promise<QuoteView> {
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
}
