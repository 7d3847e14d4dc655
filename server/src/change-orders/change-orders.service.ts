import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  createChangeOrderRequestSchema,
  sendInvoiceRequestSchema,
  type BudgetLine,
  type ChangeOrderView,
  type Role,
} from '@pondwright/shared';
import { formatMoney, toDecimal } from '@pondwright/shared/pricing';
import { DataSource, IsNull, type EntityManager } from 'typeorm';
import { hashToken, newSecureToken } from '../auth/secure-token';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { isUuid } from '../common/tenancy/tenant-repository';
import { parseBody } from '../common/validation/parse-body';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { versionSha256 } from '../estimates/content-hash';
import { priceEstimateContent, type UncheckedContent } from '../estimates/price-estimate';
import { Job } from '../jobs/entities/job.entity';
import { findCompanyJob } from '../jobs/find-job';
import { OutboxService } from '../mail/outbox.service';
import { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { recordEstimateEvent } from '../quotes/estimate-events';
import { User } from '../users/entities/user.entity';
import { changeOrderMail } from './change-order-mail';
import { ChangeOrder } from './entities/change-order.entity';

const LINK_DAYS = 30;

/**
 * Change orders on a job. Each is priced with the accepted version's price book on top of the version
 * in force (the accepted quote and the change orders accepted since), frozen as the estimate's next
 * version, and sent to the homeowner; the job's budget grows only when the homeowner accepts.
 */
@Injectable()
export class ChangeOrdersService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async list(jobId: string, role: Role): Promise<ChangeOrderView[]> {
    const manager = this.dataSource.manager;
    const job = await this.findJob(manager, jobId);
    const orders = await manager.find(ChangeOrder, {
      where: { jobId: job.id, companyId: job.companyId },
      order: { number: 'ASC' },
    });
    return Promise.all(orders.map((order) => this.view(manager, order, role)));
  }

  async create(
    jobId: string,
    body: unknown,
    actorId: string,
    role: Role,
  ): Promise<ChangeOrderView> {
    const request = parseBody(createChangeOrderRequestSchema, body);
    const id = await this.dataSource.transaction(async (manager) => {
      const job = await this.findJob(manager, jobId, true);
      if (job.status === 'closed') throw new AppError('JOB_CLOSED', 'This job is closed.');
      const base = await versionInForce(manager, job);
      const [{ next }] = (await manager.query(
        'SELECT coalesce(max(number), 0) + 1 AS next FROM change_orders WHERE job_id = $1',
        [job.id],
      )) as [{ next: number }];
      const number = Number(next);
      const prefix = `co${number}-`;
      const book = await manager.findOneByOrFail(PriceBookVersion, { id: base.priceBookVersionId });
      const { content, computed } = priceEstimateContent(
        {
          ...base.content,
          manualLines: [
            ...base.content.manualLines,
            ...request.lines.map((line, index) => ({ ...line, id: `${prefix}${index + 1}` })),
          ],
        } as UncheckedContent,
        book.content,
      );
      const changeLines = computed.priced.lines.filter((line) =>
        line.id.startsWith(`manual:${prefix}`),
      );
      const before = base.computed.priced.totals;
      const after = computed.priced.totals;
      const total = toDecimal(after.total).minus(toDecimal(before.total));
      const tax = toDecimal(after.tax).minus(toDecimal(before.tax));
      const [{ versionNumber }] = (await manager.query(
        'SELECT max(version_number) + 1 AS "versionNumber" FROM estimate_versions WHERE estimate_id = $1',
        [job.estimateId],
      )) as [{ versionNumber: number }];
      const version = await manager.save(
        manager.create(EstimateVersion, {
          estimateId: job.estimateId,
          versionNumber: Number(versionNumber),
          content,
          computed,
          contentSha256: versionSha256(content, computed),
          priceBookVersionId: base.priceBookVersionId,
          finalisedById: actorId,
          finalisedAt: new Date(),
        }),
      );
      const order = await manager.save(
        manager.create(ChangeOrder, {
          companyId: job.companyId,
          jobId: job.id,
          number,
          title: request.title,
          reason: request.reason,
          versionId: version.id,
          summary: {
            number,
            title: request.title,
            reason: request.reason,
            lines: changeLines.map((line) => ({
              description: line.description,
              quantity: line.quantity,
              unit: line.unit,
              price: line.price,
            })),
            priceBeforeTax: formatMoney(total.minus(tax)),
            tax: formatMoney(tax),
            total: formatMoney(total),
            previousJobTotal: job.budget.total,
            newJobTotal: formatMoney(toDecimal(job.budget.total).plus(total)),
          },
          budgetLines: changeLines.map((line): BudgetLine => ({
            id: line.id,
            category: line.category,
            description: line.description,
            code: line.code,
            source: line.source,
            // Hand-written lines name no labor task; the cost report lists them apart.
            task: null,
            quantity: line.quantity,
            unit: line.unit,
            unitCost: line.unitCost,
            extendedCost: line.extendedCost,
            price: line.price,
          })),
          status: 'ready',
          createdById: actorId,
        }),
      );
      await recordEstimateEvent(manager, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        actorId,
        action: 'change-order-created',
        detail: { number, versionNumber: version.versionNumber, total: formatMoney(total) },
      });
      return order.id;
    });
    const manager = this.dataSource.manager;
    return this.view(manager, await manager.findOneByOrFail(ChangeOrder, { id }), role);
  }

  /** Sends (or sends again) the change order to the homeowner as a link. */
  async send(
    jobId: string,
    orderId: string,
    body: unknown,
    actorId: string,
    role: Role,
  ): Promise<ChangeOrderView> {
    const request = parseBody(sendInvoiceRequestSchema, body);
    await this.dataSource.transaction(async (manager) => {
      const job = await this.findJob(manager, jobId, true);
      const order = isUuid(orderId)
        ? await manager.findOneBy(ChangeOrder, { id: orderId, jobId: job.id })
        : null;
      if (!order) throw new AppError('NOT_FOUND', 'Change order not found');
      if (order.status === 'accepted' || order.status === 'declined') {
        throw new AppError(
          'QUOTE_ALREADY_ANSWERED',
          `This change order was already ${order.status}.`,
        );
      }
      const acceptance = await manager.findOneByOrFail(QuoteAcceptance, { id: job.acceptanceId });
      const acceptedLink = await manager.findOneByOrFail(QuoteLink, { id: acceptance.linkId });
      await manager.update(
        QuoteLink,
        { changeOrderId: order.id, revokedAt: IsNull() },
        { revokedAt: new Date() },
      );
      const token = newSecureToken();
      const recipient = request.recipientEmail ?? acceptedLink.recipientEmail;
      await manager.insert(QuoteLink, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        versionId: order.versionId,
        tokenHash: hashToken(token),
        recipientEmail: recipient,
        expiresAt: new Date(Date.now() + LINK_DAYS * 86_400_000),
        revokedAt: null,
        firstViewedAt: null,
        changeOrderId: order.id,
        createdById: actorId,
      });
      await manager.update(ChangeOrder, { id: order.id }, { status: 'sent' });
      const [estimate, company, sender] = await Promise.all([
        manager.findOneByOrFail(Estimate, { id: job.estimateId }),
        manager.findOneByOrFail(Company, { id: job.companyId }),
        manager.findOneByOrFail(User, { id: actorId }),
      ]);
      await this.outbox.enqueue(manager, {
        companyId: job.companyId,
        kind: 'change-order-sent',
        to: recipient,
        replyTo: sender.email,
        ...changeOrderMail({
          companyName: company.name,
          customerName: acceptance.fullName,
          jobTitle: estimate.title,
          summary: order.summary,
          currency: job.budget.currency,
          url: `${this.config.publicAppUrl}/q/${token}`,
        }),
      });
      await recordEstimateEvent(manager, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        actorId,
        action: 'change-order-sent',
        detail: { number: order.number, recipientEmail: recipient },
      });
    });
    const manager = this.dataSource.manager;
    return this.view(manager, await manager.findOneByOrFail(ChangeOrder, { id: orderId }), role);
  }

  private async view(
    manager: EntityManager,
    order: ChangeOrder,
    role: Role,
  ): Promise<ChangeOrderView> {
    const [version, link] = await Promise.all([
      manager.findOneByOrFail(EstimateVersion, { id: order.versionId }),
      manager.findOne(QuoteLink, {
        where: { changeOrderId: order.id },
        order: { createdAt: 'DESC' },
      }),
    ]);
    const cost = order.budgetLines.reduce(
      (sum, line) => sum.plus(toDecimal(line.extendedCost)),
      toDecimal('0'),
    );
    return {
      ...order.summary,
      id: order.id,
      jobId: order.jobId,
      status: order.status,
      versionNumber: version.versionNumber,
      contentSha256: version.contentSha256,
      cost: role === 'crew_lead' ? null : formatMoney(cost),
      sentTo: link?.recipientEmail ?? null,
      acceptedByName: order.acceptedName,
      acceptedAt: order.acceptedAt?.toISOString() ?? null,
      declinedAt: order.declinedAt?.toISOString() ?? null,
      createdAt: order.createdAt.toISOString(),
    };
  }

  private findJob(manager: EntityManager, id: string, lock = false): Promise<Job> {
    return findCompanyJob(manager, id, this.tenant.companyId, lock);
  }
}

/**
 * The version the job stands on: the last accepted change order's, or the accepted quote's. A change
 * order is priced on top of it, so declined or unanswered changes never leak into the next one.
 */
export async function versionInForce(manager: EntityManager, job: Job): Promise<EstimateVersion> {
  const latest = await manager.findOne(ChangeOrder, {
    where: { jobId: job.id, status: 'accepted' },
    order: { number: 'DESC' },
  });
  if (latest) return manager.findOneByOrFail(EstimateVersion, { id: latest.versionId });
  const acceptance = await manager.findOneByOrFail(QuoteAcceptance, { id: job.acceptanceId });
  return manager.findOneByOrFail(EstimateVersion, { id: acceptance.versionId });
}
