import type {
  EstimateQuoteStatus,
  QuoteAcceptanceView,
  QuotePaymentView,
} from '@pondwright/shared';
import type { EntityManager } from 'typeorm';
import { Payment } from '../payments/entities/payment.entity';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { QuoteDecline } from './entities/quote-decline.entity';
import { lookUpTogether } from '../database/look-up-together';

/** The homeowner's answers and the deposit of one estimate, as stored. */
export type QuoteRecords = {
  acceptance: QuoteAcceptance | null;
  decline: QuoteDecline | null;
  payment: Payment | null;
};

export async function loadQuoteRecords(
  manager: EntityManager,
  estimateId: string,
): Promise<QuoteRecords> {
  const [acceptance, decline, payments] = await lookUpTogether(manager, [
    () => manager.findOneBy(QuoteAcceptance, { estimateId }),
    () => manager.findOne(QuoteDecline, { where: { estimateId }, order: { declinedAt: 'DESC' } }),
    () =>
      manager.find(Payment, {
        where: { estimateId, purpose: 'deposit' },
        order: { createdAt: 'DESC' },
      }),
  ]);
  // A paid deposit wins over later unpaid attempts (a homeowner may open checkout twice).
  const payment = payments.find((p) => p.status === 'paid') ?? payments[0] ?? null;
  return { acceptance, decline, payment };
}

export function acceptanceView(acceptance: QuoteAcceptance): QuoteAcceptanceView {
  return {
    fullName: acceptance.fullName,
    acceptedAt: acceptance.acceptedAt.toISOString(),
    optionIds: acceptance.optionIds,
    total: acceptance.total,
    deposit: acceptance.deposit,
  };
}

export function paymentView(payment: Payment): QuotePaymentView {
  return {
    status: payment.status,
    amount: payment.amount,
    paidAt: payment.paidAt?.toISOString() ?? null,
  };
}

export function staffPaymentView(payment: Payment): NonNullable<EstimateQuoteStatus['payment']> {
  return {
    ...paymentView(payment),
    provider: payment.provider,
    reference: payment.providerPaymentRef ?? payment.checkoutSessionId,
  };
}
