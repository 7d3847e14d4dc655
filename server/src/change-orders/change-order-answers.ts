import { Injectable } from '@nestjs/common';
import { budgetAfterChangeOrder, type AcceptQuoteRequest } from '@pondwright/shared';
import { formatMoney, toDecimal } from '@pondwright/shared/pricing';
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
import { amountPaid, isInvoiced, supersedingChange } from './job-contract';
import { lookUpTogether } from '../database/look-up-together';

type Answer =
  | {
      accepted: true;
      request: AcceptQuoteRequest;
      meta: { ip: string; userAgent: string };
    }
  | { accepted: false; reason: string | undefined; meta: { ip: string; userAgent: string } };

/**
 * The homeowner's answer to a change order, in the caller's transaction. Accepting checks the version
 * shown and that the change still stands (no other change accepted since it was priced, no final
 * invoice yet, a credit not below what they have paid), records who, when and from where, and only
 * then applies the change to the job's budget: new lines added, work taken off, totals moved.
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
      await refuseIfNoLongerStanding(manager, job, order);
      const budget = budgetAfterChangeOrder(job.budget, {
        versionNumber: version.versionNumber,
        contentSha256: version.contentSha256,
        added: order.budgetLines,
        reductions: order.budgetReductions,
        priceBeforeTax: order.summary.priceBeforeTax,
        tax: order.summary.tax,
        total: order.summary.total,
      });
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
      await manager.update(Job, { id: job.id }, { budget });
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
    const [estimate, sender] = await lookUpTogether(manager, [
      () => manager.findOneByOrFail(Estimate, { id: job.estimateId }),
      () => manager.findOneByOrFail(User, { id: link.createdById }),
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
          ? `${changeWords(order.summary.total, job.budget.currency)}; the job's budget now totals ${money(order.summary.newJobTotal, job.budget.currency)}.`
          : answer.reason
            ? `Their reason: ${answer.reason}`
            : 'They gave no reason.',
        url: `${this.config.publicAppUrl}/jobs/${job.id}`,
      }),
    });
  }
}

/** "It adds $540.00" for new work, "It credits $1,200.00" for a change that takes work off. */
function changeWords(total: string, currency: string): string {
  const amount = toDecimal(total);
  return amount.isNegative()
    ? `It credits ${money(formatMoney(amount.negated()), currency)}`
    : `It adds ${money(total, currency)}`;
}

/**
 * Refuses (409, nothing written) a change that no longer stands: the job's final invoice is issued,
 * another change was accepted since this one was priced, or a credit would take the job's total
 * below what the homeowner has paid since it was priced.
 */
async function refuseIfNoLongerStanding(
  manager: EntityManager,
  job: Job,
  order: ChangeOrder,
): Promise<void> {
  if (await isInvoiced(manager, job)) {
    throw new AppError(
      'JOB_INVOICED',
      'Your final invoice for this project is already issued, so this change can no longer be accepted. Contact the company to talk it over.',
    );
  }
  if (await supersedingChange(manager, job, order)) {
    throw new AppError(
      'CHANGE_ORDER_SUPERSEDED',
      'This change was priced before another change you accepted, so its figures no longer hold. Ask the company to send it again.',
    );
  }
  const newTotal = toDecimal(job.budget.total).plus(toDecimal(order.summary.total));
  if (toDecimal(order.summary.total).isNegative()) {
    const paid = await amountPaid(manager, job);
    if (newTotal.lessThan(paid)) {
      throw new AppError(
        'CREDIT_EXCEEDS_PAID',
        `This credit would bring your project total below the ${money(formatMoney(paid), job.budget.currency)} you have already paid. Contact the company to settle it.`,
      );
    }
  }
}
