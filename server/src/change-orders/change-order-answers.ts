import { Injectable } from '@nestjs/common';
import type { AcceptQuoteRequest, BudgetLine } from '@pondwright/shared';
import { formatMoney, PricingDecimal, toDecimal } from '@pondwright/shared/pricing';
import type { EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { AppConfig } from '../config/app-config';
import { Estimate } from '../estimates/entities/estimate.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Job } from '../jobs/entities/job.entity';
import { OutboxService } from '../mail/outbox.service';
import type { QuoteLink } from '../quotes/entities/quote-link.entity';
import { HOMEOWNER, recordEstimateEvent } from '../quotes/estimate-events';
import { money, quoteAnsweredStaffMail } from '../quotes/quote-mail';
import { User } from '../users/entities/user.entity';
import { ChangeOrder } from './entities/change-order.entity';

type Answer =
  | {
      accepted: true;
      request: AcceptQuoteRequest;
      meta: { ip: string; userAgent: string };
    }
  | { accepted: false; reason: string | undefined; meta: { ip: string; userAgent: string } };

/**
 * The homeowner's answer to a change order, in the caller's transaction. Accepting checks the version
 * shown, records who, when and from where, and only then adds the change to the job's budget.
 */
@Injectable()
export class ChangeOrderAnswers {
  constructor(
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async answer(manager: EntityManager, link: QuoteLink, answer: Answer): Promise<void> {
    const order = await manager.findOneOrFail(ChangeOrder, {
      where: { id: link.changeOrderId! },
      lock: { mode: 'pessimistic_write' },
    });
    if (order.status !== 'sent') {
      throw new AppError(
        'QUOTE_ALREADY_ANSWERED',
        `This change was already ${order.status}. Contact the company to change your answer.`,
      );
    }
    const version = await manager.findOneByOrFail(EstimateVersion, { id: order.versionId });
    const job = await manager.findOneOrFail(Job, {
      where: { id: order.jobId },
      lock: { mode: 'pessimistic_write' },
    });
    const now = new Date();
    if (answer.accepted) {
      if (answer.request.contentSha256 !== version.contentSha256) {
        throw new AppError(
          'QUOTE_VERSION_CHANGED',
          'This change has been updated since you opened it. Reload the page to see it.',
        );
      }
      await manager.update(
        ChangeOrder,
        { id: order.id },
        {
          status: 'accepted',
          acceptedName: answer.request.fullName,
          acceptedIp: answer.meta.ip,
          acceptedUserAgent: answer.meta.userAgent.slice(0, 1000),
          acceptedAt: now,
        },
      );
      await manager.update(Job, { id: job.id }, { budget: grownBudget(job, order, version) });
    } else {
      await manager.update(ChangeOrder, { id: order.id }, { status: 'declined', declinedAt: now });
    }
    const action = answer.accepted ? 'change-order-accepted' : 'change-order-declined';
    await recordEstimateEvent(manager, {
      companyId: job.companyId,
      estimateId: job.estimateId,
      actorLabel: HOMEOWNER,
      action,
      detail: {
        number: order.number,
        total: order.summary.total,
        ip: answer.meta.ip,
        ...(answer.accepted
          ? { fullName: answer.request.fullName, sha256: version.contentSha256 }
          : { reason: answer.reason ?? null }),
      },
    });
    const [estimate, sender] = await Promise.all([
      manager.findOneByOrFail(Estimate, { id: job.estimateId }),
      manager.findOneByOrFail(User, { id: link.createdById }),
    ]);
    await this.outbox.enqueue(manager, {
      companyId: job.companyId,
      kind: `${action}-staff`,
      to: sender.email,
      ...quoteAnsweredStaffMail({
        answer: answer.accepted ? 'accepted' : 'declined',
        estimateNumber: estimate.number,
        title: `change order ${order.number}: ${order.title}`,
        customerName: answer.accepted ? answer.request.fullName : 'The homeowner',
        detail: answer.accepted
          ? `It adds ${money(order.summary.total, job.budget.currency)}; the job's budget now totals ${money(order.summary.newJobTotal, job.budget.currency)}.`
          : answer.reason
            ? `Their reason: ${answer.reason}`
            : 'They gave no reason.',
        url: `${this.config.publicAppUrl}/jobs/${job.id}`,
      }),
    });
  }
}

/** The job's budget with an accepted change order's lines and price added. */
function grownBudget(job: Job, order: ChangeOrder, version: EstimateVersion): Job['budget'] {
  const budget = job.budget;
  const sum = (lines: BudgetLine[], pick: (line: BudgetLine) => string) =>
    lines.reduce((total, line) => total.plus(toDecimal(pick(line))), new PricingDecimal(0));
  const labor = order.budgetLines.filter((line) => line.category === 'labor');
  return {
    ...budget,
    versionNumber: version.versionNumber,
    contentSha256: version.contentSha256,
    lines: [...budget.lines, ...order.budgetLines],
    cost: formatMoney(toDecimal(budget.cost).plus(sum(order.budgetLines, (l) => l.extendedCost))),
    priceBeforeTax: formatMoney(
      toDecimal(budget.priceBeforeTax).plus(toDecimal(order.summary.priceBeforeTax)),
    ),
    tax: formatMoney(toDecimal(budget.tax).plus(toDecimal(order.summary.tax))),
    total: formatMoney(toDecimal(budget.total).plus(toDecimal(order.summary.total))),
    laborHours: toDecimal(budget.laborHours)
      .plus(sum(labor, (l) => l.quantity))
      .toFixed(2),
  };
}
