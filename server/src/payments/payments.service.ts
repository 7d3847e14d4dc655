import { Inject, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type Stripe from 'stripe';
import { DataSource, type EntityManager } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { Customer } from '../customers/entities/customer.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { OutboxService } from '../mail/outbox.service';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { PAYMENT_PROVIDER, recordEstimateEvent } from '../quotes/estimate-events';
import { depositReceiptMail } from '../quotes/quote-mail';
import { User } from '../users/entities/user.entity';
import { PaymentEvent } from './entities/payment-event.entity';
import { Payment } from './entities/payment.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { STRIPE_CLIENT } from './stripe-client';
import { moneyToMinorUnits } from './minor-units';
import { lookUpTogether } from '../database/look-up-together';

const PROVIDER = 'stripe';

export type DepositCheckout = {
  acceptance: QuoteAcceptance;
  currency: string;
  description: string;
  customerEmail: string;
  returnUrl: string;
};

export type WebhookOutcome = { received: true; duplicate: boolean };

/** Deposits through the provider's hosted checkout; a payment counts only once its signed webhook arrives. */
@Injectable()
export class PaymentsService {
  private readonly logger = new Logger(PaymentsService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  /** Creates a checkout session for the accepted quote's deposit and records it as pending. */
  async createDepositCheckout(checkout: DepositCheckout): Promise<string> {
    const { acceptance } = checkout;
    await this.refuseIfPaid(
      acceptance.estimateId,
      'deposit',
      'The deposit for this quote is already paid.',
    );
    return this.createCheckout({
      ...checkout,
      purpose: 'deposit',
      amount: acceptance.deposit,
      invoice: null,
    });
  }

  /** Creates a checkout session for the final invoice's balance. */
  async createBalanceCheckout(checkout: DepositCheckout & { invoice: Invoice }): Promise<string> {
    await this.refuseIfPaid(
      checkout.acceptance.estimateId,
      'balance',
      'This invoice is already paid. Thank you!',
    );
    return this.createCheckout({
      ...checkout,
      purpose: 'balance',
      amount: checkout.invoice.balance,
    });
  }

  private async refuseIfPaid(estimateId: string, purpose: Payment['purpose'], message: string) {
    const paid = await this.dataSource.manager.existsBy(Payment, {
      estimateId,
      purpose,
      status: 'paid',
    });
    if (paid) throw new AppError('DEPOSIT_ALREADY_PAID', message);
  }

  private async createCheckout(
    checkout: DepositCheckout & {
      purpose: Payment['purpose'];
      amount: string;
      invoice: Invoice | null;
    },
  ): Promise<string> {
    const { acceptance } = checkout;
    const amountMinor = moneyToMinorUnits(checkout.amount);
    if (amountMinor <= 0) {
      throw new AppError('DEPOSIT_ALREADY_PAID', 'Nothing is due on this quote.');
    }
    let session: Stripe.Checkout.Session;
    try {
      session = await this.stripe.checkout.sessions.create({
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: checkout.currency.toLowerCase(),
              unit_amount: amountMinor,
              product_data: { name: checkout.description },
            },
          },
        ],
        customer_email: checkout.customerEmail,
        client_reference_id: acceptance.estimateId,
        metadata: {
          estimateId: acceptance.estimateId,
          acceptanceId: acceptance.id,
          purpose: checkout.purpose,
        },
        success_url: `${checkout.returnUrl}?payment=success`,
        cancel_url: `${checkout.returnUrl}?payment=cancelled`,
      });
    } catch (error) {
      this.logger.error(
        `Checkout session failed: ${error instanceof Error ? error.message : error}`,
      );
      throw new AppError(
        'PAYMENT_PROVIDER_UNAVAILABLE',
        'We could not reach the payment service. Please try again in a minute.',
      );
    }
    if (!session.url) {
      throw new AppError(
        'PAYMENT_PROVIDER_UNAVAILABLE',
        'The payment service gave no checkout page.',
      );
    }
    await this.dataSource.manager.insert(Payment, {
      companyId: acceptance.companyId,
      estimateId: acceptance.estimateId,
      acceptanceId: acceptance.id,
      purpose: checkout.purpose,
      invoiceId: checkout.invoice?.id ?? null,
      provider: PROVIDER,
      checkoutSessionId: session.id,
      amount: checkout.amount,
      currency: checkout.currency.toUpperCase(),
      status: 'pending',
    });
    return session.url;
  }

  /**
   * Verifies the signature over the raw body (the provider's scheme, through its SDK), then records the
   * event id first: a replayed or duplicated event finds its id taken and changes nothing. A completed
   * checkout marks its payment paid, logs it on the estimate and queues both receipts, all in one
   * transaction with the event id.
   */
  async handleWebhook(
    rawBody: Buffer | undefined,
    signature: string | undefined,
  ): Promise<WebhookOutcome> {
    if (!rawBody || !signature) {
      throw new AppError('WEBHOOK_SIGNATURE_INVALID', 'Missing webhook body or signature.');
    }
    let event: Stripe.Event;
    try {
      event = this.stripe.webhooks.constructEvent(
        rawBody,
        signature,
        this.config.stripe.webhookSecret,
      );
    } catch {
      throw new AppError('WEBHOOK_SIGNATURE_INVALID', 'The webhook signature does not verify.');
    }
    return this.dataSource.transaction(async (manager) => {
      const inserted = (await manager.query(
        `INSERT INTO payment_events (provider, event_id, type) VALUES ($1, $2, $3)
         ON CONFLICT DO NOTHING RETURNING event_id`,
        [PROVIDER, event.id, event.type],
      )) as unknown[];
      if (inserted.length === 0) return { received: true, duplicate: true };
      if (event.type === 'checkout.session.completed') {
        const paymentId = await this.completeCheckout(manager, event.data.object);
        if (paymentId) {
          await manager.update(
            PaymentEvent,
            { provider: PROVIDER, eventId: event.id },
            { paymentId },
          );
        }
      }
      return { received: true, duplicate: false };
    });
  }

  private async completeCheckout(
    manager: EntityManager,
    session: Stripe.Checkout.Session,
  ): Promise<string | null> {
    if (session.payment_status !== 'paid') return null;
    const payment = await manager.findOne(Payment, {
      where: { provider: PROVIDER, checkoutSessionId: session.id },
      lock: { mode: 'pessimistic_write' },
    });
    if (!payment) {
      this.logger.warn(`Checkout ${session.id} completed but no payment asked for it`);
      return null;
    }
    if (payment.status === 'paid') return payment.id;
    const estimate = await manager.findOneByOrFail(Estimate, { id: payment.estimateId });
    const received = session.amount_total ?? -1;
    // An amount is its currency too: 5,000 in yen's minor units is not $50.00 (security review: a
    // session reporting the right number in another currency was credited as paid).
    const receivedCurrency = (session.currency ?? '').toUpperCase();
    const alreadyPaid = await manager.existsBy(Payment, {
      estimateId: payment.estimateId,
      purpose: payment.purpose,
      status: 'paid',
    });
    const asAsked =
      received === moneyToMinorUnits(payment.amount) && receivedCurrency === payment.currency;
    if (!asAsked || alreadyPaid) {
      // Paid, but not as asked (a changed amount, or a second checkout paid as well): a person must
      // look, and perhaps refund. Recorded on the estimate instead of silently counted.
      await recordEstimateEvent(manager, {
        companyId: payment.companyId,
        estimateId: payment.estimateId,
        actorLabel: PAYMENT_PROVIDER,
        action: `${payment.purpose}-needs-review`,
        detail: {
          checkoutSessionId: session.id,
          amountReceivedMinor: received,
          currencyReceived: receivedCurrency,
          reason: alreadyPaid
            ? 'a deposit was already paid'
            : 'amount differs from the deposit asked',
        },
      });
      return payment.id;
    }
    const paidAt = new Date();
    const reference =
      typeof session.payment_intent === 'string' ? session.payment_intent : session.id;
    await manager.update(
      Payment,
      { id: payment.id },
      { status: 'paid', paidAt, providerPaymentRef: reference },
    );
    if (payment.invoiceId) {
      await manager.update(Invoice, { id: payment.invoiceId }, { status: 'paid', paidAt });
    }
    await recordEstimateEvent(manager, {
      companyId: payment.companyId,
      estimateId: payment.estimateId,
      actorLabel: PAYMENT_PROVIDER,
      action: `${payment.purpose}-paid`,
      detail: { amount: payment.amount, currency: payment.currency, reference },
    });
    await this.queueReceipts(manager, estimate, payment, paidAt, reference);
    return payment.id;
  }

  private async queueReceipts(
    manager: EntityManager,
    estimate: Estimate,
    payment: Payment,
    paidAt: Date,
    reference: string,
  ): Promise<void> {
    const acceptance = await manager.findOneByOrFail(QuoteAcceptance, { id: payment.acceptanceId });
    const [company, customer, link] = await lookUpTogether(manager, [
      () => manager.findOneByOrFail(Company, { id: estimate.companyId }),
      () => manager.findOneByOrFail(Customer, { id: estimate.customerId }),
      () => manager.findOneByOrFail(QuoteLink, { id: acceptance.linkId }),
    ]);
    const sender = await manager.findOneByOrFail(User, { id: link.createdById });
    const common = {
      purpose: payment.purpose,
      companyName: company.name,
      customerName: acceptance.fullName,
      estimateNumber: estimate.number,
      title: estimate.title,
      amount: payment.amount,
      currency: payment.currency,
      paidAt,
      reference,
    };
    await this.outbox.enqueue(manager, {
      companyId: estimate.companyId,
      kind: `${payment.purpose}-receipt`,
      to: link.recipientEmail,
      replyTo: sender.email,
      ...depositReceiptMail({
        ...common,
        audience: 'homeowner',
        customerName: acceptance.fullName || customer.name,
      }),
    });
    await this.outbox.enqueue(manager, {
      companyId: estimate.companyId,
      kind: `${payment.purpose}-receipt-company`,
      to: sender.email,
      ...depositReceiptMail({
        ...common,
        audience: 'company',
        url: `${this.config.publicAppUrl}/estimates/${estimate.id}`,
      }),
    });
  }
}
