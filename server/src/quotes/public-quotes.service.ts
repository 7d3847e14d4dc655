import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  acceptQuoteRequestSchema,
  declineQuoteRequestSchema,
  type QuoteView,
} from '@pondwright/shared';
import { DataSource } from 'typeorm';
import { ChangeOrderAnswers } from '../change-orders/change-order-answers';
import { AppError } from '../common/errors/app-error';
import { parseBody } from '../common/validation/parse-body';
import { CompanyLogo } from '../companies/entities/company-logo.entity';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { HOMEOWNER, recordEstimateEvent } from './estimate-events';
import { linkPageStatus, usableLink, type RequestMeta } from './public-link';
import { PublicInvoiceLinkService } from './public-invoice-link.service';
import { PublicQuoteLinkService } from './public-quote-link.service';
import { loadPublicQuoteView, renderPublicQuotePdf } from './public-quote-view';

/**
 * The homeowner's side, reached by the token alone. Unknown tokens answer 404 and dead ones 410 with a
 * friendly message. One token may carry the quote, a change order or the final invoice: each request
 * finds the link, then hands it to what that kind of link does.
 */
@Injectable()
export class PublicQuotesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly quoteLink: PublicQuoteLinkService,
    private readonly invoiceLink: PublicInvoiceLinkService,
    private readonly changeOrders: ChangeOrderAnswers,
  ) {}

  /** The quote; the first open marks the link viewed and a sent estimate `viewed`. */
  async view(token: string, meta: RequestMeta): Promise<QuoteView> {
    const link = await usableLink(this.dataSource.manager, token);
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
    return loadPublicQuoteView(this.dataSource.manager, link);
  }

  /** Accepts the quote or the change order the link carries, in one transaction with the lookup. */
  async accept(token: string, body: unknown, meta: RequestMeta): Promise<QuoteView> {
    const request = parseBody(acceptQuoteRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const link = await usableLink(manager, token);
      if (link.changeOrderId) {
        await this.changeOrders.answer(manager, link, { accepted: true, request, meta });
      } else {
        await this.quoteLink.accept(manager, link, { token, request, meta });
      }
    });
    return this.view(token, meta);
  }

  /** Declines the quote or the change order the link carries, in one transaction with the lookup. */
  async decline(token: string, body: unknown, meta: RequestMeta): Promise<QuoteView> {
    const request = parseBody(declineQuoteRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const link = await usableLink(manager, token);
      if (link.changeOrderId) {
        await this.changeOrders.answer(manager, link, {
          accepted: false,
          reason: request.reason,
          meta,
        });
      } else {
        await this.quoteLink.decline(manager, link, { request, meta });
      }
    });
    return this.view(token, meta);
  }

  /**
   * The hosted checkout: for the deposit once accepted through this link, or for the balance when the
   * link carries the final invoice.
   */
  async checkout(token: string): Promise<{ url: string }> {
    const manager = this.dataSource.manager;
    const link = await usableLink(manager, token);
    const acceptance = await manager.findOneBy(QuoteAcceptance, { estimateId: link.estimateId });
    if (acceptance && link.invoiceId) {
      return this.invoiceLink.balanceCheckout(token, link, acceptance);
    }
    return this.quoteLink.depositCheckout(token, link, acceptance);
  }

  async pdf(token: string): Promise<{ filename: string; bytes: Buffer }> {
    const link = await usableLink(this.dataSource.manager, token);
    return renderPublicQuotePdf(this.dataSource.manager, link);
  }

  async logo(token: string): Promise<CompanyLogo> {
    const link = await usableLink(this.dataSource.manager, token);
    const logo = await this.dataSource.manager.findOneBy(CompanyLogo, {
      companyId: link.companyId,
    });
    if (!logo) throw new AppError('LOGO_NOT_FOUND', 'This company has no logo.');
    return logo;
  }

  /** For the quote page's own HTTP status (see QuotePageHostModule). */
  pageStatus(token: string): Promise<200 | 404 | 410> {
    return linkPageStatus(this.dataSource.manager, token);
  }
}
