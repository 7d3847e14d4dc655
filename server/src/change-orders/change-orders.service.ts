import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  changeOrderDifference,
  createChangeOrderRequestSchema,
  sendInvoiceRequestSchema,
  type BudgetLine,
  type ChangeOrderView,
  type CreateChangeOrderRequest,
} from '@pondwright/shared';
import {
  formatMoney,
  sumDecimals,
  toDecimal,
  type LineReduction,
  type PricedLine,
} from '@pondwright/shared/pricing';
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
import { fieldErrors } from '../estimates/field-errors';
import { priceEstimateContent, type UncheckedContent } from '../estimates/price-estimate';
import { Job } from '../jobs/entities/job.entity';
import { findCompanyJob } from '../jobs/find-job';
import { OutboxService } from '../mail/outbox.service';
import { PriceBookVersion } from '../price-book/entities/price-book-version.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { recordEstimateEvent } from '../quotes/estimate-events';
import { money } from '../quotes/quote-mail';
import { User } from '../users/entities/user.entity';
import { changeOrderMail } from './change-order-mail';
import { ChangeOrder } from './entities/change-order.entity';
import { amountPaid, isInvoiced, supersedingChange, versionInForce } from './job-contract';
import { lookUpTogether } from '../database/look-up-together';

const LINK_DAYS = 30;

/**
 * Change orders on a job. Each is priced with the accepted version's price book on top of the version
 * in force (the accepted quote and the change orders accepted since), frozen as the estimate's next
 * version, and sent to the homeowner; the job's budget changes only when the homeowner accepts. A
 * change adds work (manual lines), takes work off lines of the job (a credit, priced at the rates the
 * lines were sold at), or both.
 */
@Injectable()
export class ChangeOrdersService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async list(jobId: string): Promise<ChangeOrderView[]> {
    const manager = this.dataSource.manager;
    const job = await this.findJob(manager, jobId);
    const orders = await manager.find(ChangeOrder, {
      where: { jobId: job.id, companyId: job.companyId },
      order: { number: 'ASC' },
    });
    return Promise.all(orders.map((order) => this.view(manager, order)));
  }

  /**
   * Prices the change on the version in force and freezes it as the estimate's next version. Work
   * taken off must be on a line of the job and leave less of it; a credit may not take the job's
   * total below what the homeowner has paid (409 `CREDIT_EXCEEDS_PAID`), and an invoiced job takes
   * no more changes (409 `JOB_INVOICED`). Nothing is saved when any of it is refused.
   */
  async create(jobId: string, body: unknown, actorId: string): Promise<ChangeOrderView> {
    const request = parseBody(createChangeOrderRequestSchema, body);
    const id = await this.dataSource.transaction(async (manager) => {
      const job = await this.findJob(manager, jobId, true);
      if (job.status === 'closed') throw new AppError('JOB_CLOSED', 'This job is closed.');
      if (await isInvoiced(manager, job)) {
        throw new AppError(
          'JOB_INVOICED',
          'The final invoice for this job is issued, so its total can no longer change.',
        );
      }
      const base = await versionInForce(manager, job);
      const acceptance = await manager.findOneByOrFail(QuoteAcceptance, { id: job.acceptanceId });
      checkReductions(request, jobLines(base, acceptance.optionIds));
      const [{ next }] = (await manager.query(
        'SELECT coalesce(max(number), 0) + 1 AS next FROM change_orders WHERE job_id = $1',
        [job.id],
      )) as [{ next: number }];
      const number = Number(next);
      const prefix = `co${number}-`;
      const book = await manager.findOneByOrFail(PriceBookVersion, { id: base.priceBookVersionId });
      const lineReductions = mergeReductions(base.content.lineReductions ?? [], request);
      const { content, computed } = priceEstimateContent(
        {
          ...base.content,
          manualLines: [
            ...base.content.manualLines,
            ...request.lines.map((line, index) => ({ ...line, id: `${prefix}${index + 1}` })),
          ],
          ...(lineReductions.length > 0 ? { lineReductions } : {}),
        } as UncheckedContent,
        book.content,
      );
      const difference = changeOrderDifference({
        before: base.computed.priced,
        after: computed.priced,
        chosenOptionIds: acceptance.optionIds,
        addedLineIds: request.lines.map((_, index) => `manual:${prefix}${index + 1}`),
        reducedLineIds: request.reductions.map((reduction) => reduction.lineId),
      });
      const total = toDecimal(difference.total);
      const newJobTotal = toDecimal(job.budget.total).plus(total);
      if (total.isNegative()) {
        const paid = await amountPaid(manager, job);
        if (newJobTotal.lessThan(paid)) {
          const currency = job.budget.currency;
          throw new AppError(
            'CREDIT_EXCEEDS_PAID',
            `This credit would bring the job's total to ${money(formatMoney(newJobTotal), currency)}, below the ${money(formatMoney(paid), currency)} the homeowner has already paid. Take off at most ${money(formatMoney(toDecimal(job.budget.total).minus(paid)), currency)}, tax included.`,
          );
        }
      }
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
          baseVersionId: base.id,
          summary: {
            number,
            title: request.title,
            reason: request.reason,
            lines: difference.lines,
            priceBeforeTax: difference.priceBeforeTax,
            tax: difference.tax,
            total: difference.total,
            previousJobTotal: job.budget.total,
            newJobTotal: formatMoney(newJobTotal),
          },
          budgetLines: difference.added.map(budgetLine),
          budgetReductions: difference.reductions,
          status: 'ready',
          createdById: actorId,
        }),
      );
      await recordEstimateEvent(manager, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        actorId,
        action: 'change-order-created',
        detail: { number, versionNumber: version.versionNumber, total: difference.total },
      });
      return order.id;
    });
    const manager = this.dataSource.manager;
    return this.view(manager, await manager.findOneByOrFail(ChangeOrder, { id }));
  }

  /** Sends (or sends again) the change order to the homeowner as a link. */
  async send(
    jobId: string,
    orderId: string,
    body: unknown,
    actorId: string,
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
      if (await isInvoiced(manager, job)) {
        throw new AppError(
          'JOB_INVOICED',
          'The final invoice for this job is issued, so its total can no longer change.',
        );
      }
      const superseding = await supersedingChange(manager, job, order);
      if (superseding) {
        throw new AppError(
          'CHANGE_ORDER_SUPERSEDED',
          `Change order ${superseding.number} was accepted after this one was priced, so its figures no longer hold. Make a new change order for it.`,
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
      const [estimate, company, sender] = await lookUpTogether(manager, [
        () => manager.findOneByOrFail(Estimate, { id: job.estimateId }),
        () => manager.findOneByOrFail(Company, { id: job.companyId }),
        () => manager.findOneByOrFail(User, { id: actorId }),
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
    return this.view(manager, await manager.findOneByOrFail(ChangeOrder, { id: orderId }));
  }

  private async view(manager: EntityManager, order: ChangeOrder): Promise<ChangeOrderView> {
    const [version, link] = await lookUpTogether(manager, [
      () => manager.findOneByOrFail(EstimateVersion, { id: order.versionId }),
      () =>
        manager.findOne(QuoteLink, {
          where: { changeOrderId: order.id },
          order: { createdAt: 'DESC' },
        }),
    ]);
    const cost = sumDecimals([
      ...order.budgetLines.map((line) => toDecimal(line.extendedCost)),
      ...order.budgetReductions.map((reduction) =>
        toDecimal(reduction.extendedCost).minus(toDecimal(reduction.previous.extendedCost)),
      ),
    ]);
    return {
      ...order.summary,
      id: order.id,
      jobId: order.jobId,
      status: order.status,
      versionNumber: version.versionNumber,
      contentSha256: version.contentSha256,
      cost: formatMoney(cost),
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
 * The job's priced lines in a version: its base lines and those of the options the homeowner chose
 * (the lines of the job's budget, by the same ids).
 */
function jobLines(
  version: EstimateVersion,
  chosenOptionIds: ReadonlyArray<string>,
): Map<string, PricedLine> {
  const priced = version.computed.priced;
  return new Map(
    [
      ...priced.lines,
      ...priced.options
        .filter((option) => chosenOptionIds.includes(option.id))
        .flatMap((option) => option.lines),
    ].map((line) => [line.id, line]),
  );
}

/** Each line work is taken off must be one of the job's, and keep less than it has (400 otherwise). */
function checkReductions(request: CreateChangeOrderRequest, lines: Map<string, PricedLine>): void {
  const details = request.reductions.flatMap((reduction, index) => {
    const line = lines.get(reduction.lineId);
    if (!line) {
      return [
        {
          field: `reductions.${index}.lineId`,
          message: 'Choose a line of the job’s budget: this one is not in the work agreed',
        },
      ];
    }
    if (!toDecimal(reduction.newQuantity).lessThan(toDecimal(line.quantity))) {
      return [
        {
          field: `reductions.${index}.newQuantity`,
          message: `Enter less than ${line.quantity} ${line.unit}: a credit takes work off (add new work as a line)`,
        },
      ];
    }
    return [];
  });
  if (details.length > 0) throw fieldErrors(details);
}

/**
 * The version's reductions with the change's: a line reduced again keeps the change's quantity, which
 * is what the job keeps of the line as first priced.
 */
function mergeReductions(
  previous: ReadonlyArray<LineReduction>,
  request: CreateChangeOrderRequest,
): LineReduction[] {
  const merged = new Map(previous.map((reduction) => [reduction.lineId, reduction]));
  for (const reduction of request.reductions) {
    merged.set(reduction.lineId, {
      lineId: reduction.lineId,
      newQuantity: toDecimal(reduction.newQuantity).toFixed(),
    });
  }
  return [...merged.values()];
}

function budgetLine(line: PricedLine): BudgetLine {
  return {
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
  };
}
