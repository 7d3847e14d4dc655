import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  quoteSelectionTotals,
  type AcceptQuoteRequest,
  type DeclineQuoteRequest,
} from '@pondwright/shared';
import { DataSource, IsNull, Not, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { fieldErrors } from '../estimates/field-errors';
import { OutboxService } from '../mail/outbox.service';
import { PaymentsService } from '../payments/payments.service';
import { User } from '../users/entities/user.entity';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { QuoteDecline } from './entities/quote-decline.entity';
import { QuoteLink } from './entities/quote-link.entity';
import { HOMEOWNER, recordEstimateEvent } from './estimate-events';
import type { RequestMeta } from './public-link';
import { quoteAcceptedHomeownerMail, quoteAnsweredStaffMail, money } from './quote-mail';
import { termsOfLink } from './quote-terms';
import { CONSENT_TEXT, quoteTermsShown } from './quote-view';
import { lookUpTogether } from '../database/look-up-together';

/**
 * What the homeowner does through the quote's own link: accept or decline the estimate's version, then
 * pay the deposit. Answers run in the caller's transaction, after the link was found usable in it.
 */
@Injectable()
export class PublicQuoteLinkService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly outbox: OutboxService,
    private readonly payments: PaymentsService,
    private readonly config: AppConfig,
  ) {}

  /**
   * Accepts the version the page showed: refused if it is no longer the link's version (409), or the
   * estimate was already answered (409). Records who, when, from where, with which options and the
   * version's SHA-256; the estimate becomes `accepted` (locked) and its other links are revoked.
   */
  async accept(
    manager: EntityManager,
    link: QuoteLink,
    answer: { token: string; request: AcceptQuoteRequest; meta: RequestMeta },
  ): Promise<void> {
    const { token, request, meta } = answer;
    const estimate = await lockAnswerable(manager, link);
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
      throw fieldErrors([{ field: 'optionIds', message: `Unknown option: ${unknown.join(', ')}` }]);
    }
    const totals = quoteSelectionTotals({
      baseTotal: version.computed.priced.totals.total,
      depositPct: version.computed.priced.totals.depositPct,
      options,
      chosenIds: request.optionIds,
    });
    const acceptedAt = new Date();
    // The terms the page listed above the checkbox, recorded with the consent words that point to them.
    const termsShown = quoteTermsShown({
      computed: version.computed,
      expiresAt: link.expiresAt,
      companyTerms: await termsOfLink(manager, link, null),
    });
    await manager.save(
      manager.create(QuoteAcceptance, {
        companyId: link.companyId,
        estimateId: link.estimateId,
        versionId: version.id,
        linkId: link.id,
        fullName: request.fullName,
        consentText: CONSENT_TEXT,
        termsShown,
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
    const { company, sender } = await companyAndSender(manager, link);
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
  }

  async decline(
    manager: EntityManager,
    link: QuoteLink,
    answer: { request: DeclineQuoteRequest; meta: RequestMeta },
  ): Promise<void> {
    const { request, meta } = answer;
    const estimate = await lockAnswerable(manager, link);
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
    const { sender } = await companyAndSender(manager, link);
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
  }

  /** The hosted checkout for the deposit, once the quote was accepted through this very link. */
  async depositCheckout(
    token: string,
    link: QuoteLink,
    acceptance: QuoteAcceptance | null,
  ): Promise<{ url: string }> {
    if (!acceptance || acceptance.linkId !== link.id) {
      throw new AppError('QUOTE_NOT_ACCEPTED', 'Accept the quote first; the deposit follows.');
    }
    const manager = this.dataSource.manager;
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
}

/** Locks the estimate; it must still be waiting for the homeowner's answer on this link's version. */
async function lockAnswerable(manager: EntityManager, link: QuoteLink): Promise<Estimate> {
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

async function companyAndSender(manager: EntityManager, link: QuoteLink) {
  const [company, sender] = await lookUpTogether(manager, [
    () => manager.findOneByOrFail(Company, { id: link.companyId }),
    () => manager.findOneByOrFail(User, { id: link.createdById }),
  ]);
  return { company, sender };
}
