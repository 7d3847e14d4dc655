import { PricingDecimal, toDecimal } from '@pondwright/shared/pricing';
import type { EntityManager } from 'typeorm';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import type { Job } from '../jobs/entities/job.entity';
import { Payment } from '../payments/entities/payment.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { ChangeOrder } from './entities/change-order.entity';

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

/**
 * The accepted change order a change was not priced on: one accepted since the change was priced, so
 * the change's figures no longer stand on the job's version in force. Null when it still stands (and
 * for change orders from before the base version was kept).
 */
export async function supersedingChange(
  manager: EntityManager,
  job: Job,
  order: ChangeOrder,
): Promise<ChangeOrder | null> {
  if (order.baseVersionId === null) return null;
  const inForce = await versionInForce(manager, job);
  if (inForce.id === order.baseVersionId) return null;
  return manager.findOneBy(ChangeOrder, { versionId: inForce.id });
}

/** Everything the homeowner has paid on the job so far (the deposit, and the balance once paid). */
export async function amountPaid(
  manager: EntityManager,
  job: Job,
): Promise<ReturnType<typeof toDecimal>> {
  const payments = await manager.findBy(Payment, { estimateId: job.estimateId, status: 'paid' });
  return payments.reduce(
    (sum, payment) => sum.plus(toDecimal(payment.amount)),
    new PricingDecimal(0),
  );
}

/** Whether the job's final invoice is issued: its total is fixed from then on. */
export function isInvoiced(manager: EntityManager, job: Job): Promise<boolean> {
  return manager.existsBy(Invoice, { jobId: job.id });
}
