import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  sendQuoteRequestSchema,
  type EstimateQuoteStatus,
  type EstimateStatus,
  type QuoteLinkView,
} from '@pondwright/shared';
import { DataSource, IsNull, MoreThan, type EntityManager } from 'typeorm';
import { hashToken, newSecureToken } from '../auth/secure-token';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { isUuid } from '../common/tenancy/tenant-repository';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { findEstimate, lockEstimate } from '../estimates/lock-estimate';
import { parseBody } from '../common/validation/parse-body';
import { emailDeliveryView, type EmailDeliveryRow } from '../mail/email-delivery';
import { OutboxService } from '../mail/outbox.service';
import { User } from '../users/entities/user.entity';
import { QuoteLink } from './entities/quote-link.entity';
import { recordEstimateEvent } from './estimate-events';
import { quoteSentMail } from './quote-mail';
import { acceptanceView, loadQuoteRecords, staffPaymentView } from './quote-records';
import { currentQuoteTerms } from './quote-terms';
import { lookUpTogether } from '../database/look-up-together';

/** Statuses from which the latest version may be sent (again). */
const SENDABLE: ReadonlyArray<EstimateStatus> = [
  'approved',
  'sent',
  'viewed',
  'declined',
  'expired',
];

/** Staff's side of the quote: send (and resend) a link for the latest version, list and revoke links. */
@Injectable()
export class QuoteLinksService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  /**
   * In one transaction: revokes the estimate's other open links, creates a link for the latest version,
   * queues the e-mail (with the PDF built at send time) and marks the estimate sent. The token exists
   * only in the queued e-mail; the database keeps its SHA-256.
   */
  async send(estimateId: string, body: unknown, actorId: string): Promise<EstimateQuoteStatus> {
    const request = parseBody(sendQuoteRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const estimate = await this.lockEstimate(manager, estimateId);
      if (estimate.status === 'accepted') {
        throw new AppError('ESTIMATE_LOCKED', 'This quote was accepted; it cannot be sent again.');
      }
      if (!SENDABLE.includes(estimate.status)) {
        throw new AppError(
          'ESTIMATE_NOT_SENDABLE',
          'Only an approved version can be sent. Finalise the draft (and have it approved if it needs it) first.',
        );
      }
      const version = await manager.findOneOrFail(EstimateVersion, {
        where: { estimateId },
        order: { versionNumber: 'DESC' },
      });
      const now = new Date();
      await manager.update(
        QuoteLink,
        { estimateId, revokedAt: IsNull(), expiresAt: MoreThan(now) },
        { revokedAt: now },
      );
      const token = newSecureToken();
      const expiresAt = new Date(now.getTime() + request.expiresInDays * 86_400_000);
      const [company, customer, sender] = await lookUpTogether(manager, [
        () => manager.findOneByOrFail(Company, { id: estimate.companyId }),
        () => manager.findOneByOrFail(Customer, { id: estimate.customerId }),
        () => manager.findOneByOrFail(User, { id: actorId }),
      ]);
      const link = await manager.save(
        manager.create(QuoteLink, {
          companyId: estimate.companyId,
          estimateId,
          versionId: version.id,
          tokenHash: hashToken(token),
          recipientEmail: request.recipientEmail,
          expiresAt,
          revokedAt: null,
          firstViewedAt: null,
          // Frozen here: editing the company's terms later changes only the quotes sent after.
          quoteTerms: currentQuoteTerms(company),
          createdById: actorId,
        }),
      );
      const mail = quoteSentMail({
        companyName: company.name,
        customerName: customer.name,
        estimateNumber: estimate.number,
        title: version.content.title,
        url: `${this.config.publicAppUrl}/q/${token}`,
        total: version.computed.priced.totals.total,
        currency: version.computed.priced.currency,
        expiresAt,
        message: request.message || undefined,
      });
      await this.outbox.enqueue(manager, {
        companyId: estimate.companyId,
        kind: 'quote-sent',
        to: request.recipientEmail,
        replyTo: sender.email,
        ...mail,
        attachments: [
          { kind: 'quote-pdf', linkId: link.id, filename: `quote-${estimate.number}.pdf` },
        ],
      });
      await manager.update(Estimate, { id: estimateId }, { status: 'sent' });
      await recordEstimateEvent(manager, {
        companyId: estimate.companyId,
        estimateId,
        actorId,
        action: 'quote-sent',
        detail: {
          versionNumber: version.versionNumber,
          recipientEmail: request.recipientEmail,
          linkId: link.id,
          expiresAt: expiresAt.toISOString(),
          statusBefore: estimate.status,
        },
      });
    });
    return this.status(estimateId);
  }

  async revoke(estimateId: string, linkId: string, actorId: string): Promise<EstimateQuoteStatus> {
    await this.dataSource.transaction(async (manager) => {
      const estimate = await this.lockEstimate(manager, estimateId);
      const link = isUuid(linkId)
        ? await manager.findOneBy(QuoteLink, {
            id: linkId,
            estimateId,
            companyId: estimate.companyId,
          })
        : null;
      if (!link) throw new AppError('NOT_FOUND', 'Quote link not found');
      if (link.revokedAt) return;
      await manager.update(QuoteLink, { id: link.id }, { revokedAt: new Date() });
      await recordEstimateEvent(manager, {
        companyId: estimate.companyId,
        estimateId,
        actorId,
        action: 'quote-link-revoked',
        detail: { linkId: link.id, recipientEmail: link.recipientEmail },
      });
    });
    return this.status(estimateId);
  }

  async status(estimateId: string): Promise<EstimateQuoteStatus> {
    const manager = this.dataSource.manager;
    const estimate = await findEstimate(manager, estimateId, this.tenant.companyId);
    const [links, records] = await lookUpTogether(manager, [
      () =>
        manager.find(QuoteLink, {
          where: { estimateId: estimate.id, companyId: estimate.companyId },
          relations: { version: true, createdBy: true },
          order: { createdAt: 'DESC' },
        }),
      () => loadQuoteRecords(manager, estimate.id),
    ]);
    const emails = await this.quoteEmails(
      manager,
      links.map((link) => link.id),
    );
    const acceptedVersion = records.acceptance
      ? await manager.findOneByOrFail(EstimateVersion, { id: records.acceptance.versionId })
      : null;
    return {
      links: links.map((link) =>
        linkView(link, records.acceptance?.linkId ?? null, emails.get(link.id) ?? null),
      ),
      acceptance:
        records.acceptance && acceptedVersion
          ? {
              ...acceptanceView(records.acceptance),
              versionNumber: acceptedVersion.versionNumber,
              contentSha256: records.acceptance.contentSha256,
              ip: records.acceptance.ip,
              userAgent: records.acceptance.userAgent,
            }
          : null,
      declined: records.decline
        ? { at: records.decline.declinedAt.toISOString(), reason: records.decline.reason }
        : null,
      payment: records.payment ? staffPaymentView(records.payment) : null,
    };
  }

  /** The quote e-mail queued with each link (its PDF attachment names the link). */
  private async quoteEmails(
    manager: EntityManager,
    linkIds: string[],
  ): Promise<Map<string, QuoteLinkView['email']>> {
    if (linkIds.length === 0) return new Map();
    const rows = (await manager.query(
      `SELECT a."linkId" AS link_id, m.id, m.status, m.attempts, m.last_error, m.sent_at, m.retried_at
       FROM outbox_messages m
       CROSS JOIN LATERAL jsonb_to_recordset(m.attachments) AS a("linkId" text)
       WHERE m.kind = 'quote-sent' AND m.company_id = $1 AND a."linkId" = ANY($2::text[])`,
      [this.tenant.companyId, linkIds],
    )) as Array<EmailDeliveryRow & { link_id: string }>;
    return new Map(rows.map((row) => [row.link_id, emailDeliveryView(row)]));
  }

  private lockEstimate(manager: EntityManager, id: string): Promise<Estimate> {
    return lockEstimate(manager, id, this.tenant.companyId);
  }
}

function linkView(
  link: QuoteLink,
  acceptedLinkId: string | null,
  email: QuoteLinkView['email'],
): QuoteLinkView {
  const now = Date.now();
  const status: QuoteLinkView['status'] =
    link.id === acceptedLinkId
      ? 'used'
      : link.revokedAt
        ? 'revoked'
        : link.expiresAt.getTime() <= now
          ? 'expired'
          : 'active';
  return {
    id: link.id,
    versionNumber: link.version?.versionNumber ?? 0,
    recipientEmail: link.recipientEmail,
    status,
    createdAt: link.createdAt.toISOString(),
    expiresAt: link.expiresAt.toISOString(),
    revokedAt: link.revokedAt?.toISOString() ?? null,
    firstViewedAt: link.firstViewedAt?.toISOString() ?? null,
    createdByName: link.createdBy?.name ?? '',
    email,
  };
}
