import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { sendInvoiceRequestSchema, type InvoiceView } from '@pondwright/shared';
import { formatMoney, PricingDecimal, toDecimal } from '@pondwright/shared/pricing';
import { DataSource, IsNull, Not, type EntityManager } from 'typeorm';
import { hashToken, newSecureToken } from '../auth/secure-token';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { parseBody } from '../common/validation/parse-body';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Job } from '../jobs/entities/job.entity';
import { findCompanyJob } from '../jobs/find-job';
import { OutboxService } from '../mail/outbox.service';
import { Payment } from '../payments/entities/payment.entity';
import { QuoteAcceptance } from '../quotes/entities/quote-acceptance.entity';
import { QuoteLink } from '../quotes/entities/quote-link.entity';
import { recordEstimateEvent } from '../quotes/estimate-events';
import { User } from '../users/entities/user.entity';
import { Invoice } from './entities/invoice.entity';
import { invoiceMail } from './invoice-mail';
import { lookUpTogether } from '../database/look-up-together';

/** How long the homeowner's invoice link works. */
const INVOICE_LINK_DAYS = 60;

/**
 * The job's final invoice: the accepted total, less the deposit paid, is the balance due. It goes to
 * the homeowner as a link with the quote link's token rules, and is paid through the same provider.
 */
@Injectable()
export class InvoicesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly outbox: OutboxService,
    private readonly config: AppConfig,
  ) {}

  async get(jobId: string): Promise<InvoiceView> {
    const job = await this.findJob(this.dataSource.manager, jobId);
    const invoice = await this.dataSource.manager.findOneBy(Invoice, { jobId: job.id });
    if (!invoice) throw new AppError('NOT_FOUND', 'This job has no invoice yet.');
    return this.view(this.dataSource.manager, invoice);
  }

  /** Issues the invoice (or sends it again with a fresh link, the old one withdrawn). */
  async send(jobId: string, body: unknown, actorId: string): Promise<InvoiceView> {
    const request = parseBody(sendInvoiceRequestSchema, body);
    const invoiceId = await this.dataSource.transaction(async (manager) => {
      const job = await this.findJob(manager, jobId, true);
      if (job.status !== 'completed' && job.status !== 'closed') {
        throw new AppError('JOB_NOT_COMPLETE', 'Mark the job completed before invoicing it.');
      }
      const acceptance = await manager.findOneByOrFail(QuoteAcceptance, { id: job.acceptanceId });
      const acceptedLink = await manager.findOneByOrFail(QuoteLink, { id: acceptance.linkId });
      let invoice = await manager.findOneBy(Invoice, { jobId: job.id });
      if (invoice?.status === 'paid') {
        throw new AppError('INVOICE_PAID', 'This invoice is paid; there is nothing more to send.');
      }
      if (!invoice) {
        const deposits = await manager.findBy(Payment, {
          estimateId: job.estimateId,
          purpose: 'deposit',
          status: 'paid',
        });
        const depositPaid = deposits.reduce(
          (sum, payment) => sum.plus(toDecimal(payment.amount)),
          new PricingDecimal(0),
        );
        const total = toDecimal(job.budget.total);
        invoice = await manager.save(
          manager.create(Invoice, {
            companyId: job.companyId,
            jobId: job.id,
            total: formatMoney(total),
            depositPaid: formatMoney(depositPaid),
            balance: formatMoney(total.minus(depositPaid)),
            status: 'open',
            issuedAt: new Date(),
            createdById: actorId,
          }),
        );
      }
      await manager.update(
        QuoteLink,
        { invoiceId: invoice.id, revokedAt: IsNull(), id: Not(acceptedLink.id) },
        { revokedAt: new Date() },
      );
      const token = newSecureToken();
      const recipient = request.recipientEmail ?? acceptedLink.recipientEmail;
      await manager.insert(QuoteLink, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        versionId: acceptance.versionId,
        tokenHash: hashToken(token),
        recipientEmail: recipient,
        expiresAt: new Date(Date.now() + INVOICE_LINK_DAYS * 86_400_000),
        revokedAt: null,
        firstViewedAt: null,
        invoiceId: invoice.id,
        createdById: actorId,
      });
      const [estimate, company, sender] = await lookUpTogether(manager, [
        () => manager.findOneByOrFail(Estimate, { id: job.estimateId }),
        () => manager.findOneByOrFail(Company, { id: job.companyId }),
        () => manager.findOneByOrFail(User, { id: actorId }),
      ]);
      await this.outbox.enqueue(manager, {
        companyId: job.companyId,
        kind: 'invoice-sent',
        to: recipient,
        replyTo: sender.email,
        ...invoiceMail({
          companyName: company.name,
          customerName: acceptance.fullName,
          title: estimate.title,
          number: estimate.number,
          total: invoice.total,
          depositPaid: invoice.depositPaid,
          balance: invoice.balance,
          currency: job.budget.currency,
          url: `${this.config.publicAppUrl}/q/${token}`,
        }),
      });
      await recordEstimateEvent(manager, {
        companyId: job.companyId,
        estimateId: job.estimateId,
        actorId,
        action: 'invoice-sent',
        detail: { invoiceId: invoice.id, balance: invoice.balance, recipientEmail: recipient },
      });
      return invoice.id;
    });
    const manager = this.dataSource.manager;
    return this.view(manager, await manager.findOneByOrFail(Invoice, { id: invoiceId }));
  }

  private async view(manager: EntityManager, invoice: Invoice): Promise<InvoiceView> {
    const link = await manager.findOne(QuoteLink, {
      where: { invoiceId: invoice.id },
      order: { createdAt: 'DESC' },
    });
    return {
      id: invoice.id,
      total: invoice.total,
      depositPaid: invoice.depositPaid,
      balance: invoice.balance,
      status: invoice.status,
      issuedAt: invoice.issuedAt.toISOString(),
      paidAt: invoice.paidAt?.toISOString() ?? null,
      recipientEmail: link?.recipientEmail ?? '',
    };
  }

  private findJob(manager: EntityManager, id: string, lock = false): Promise<Job> {
    return findCompanyJob(manager, id, this.tenant.companyId, lock);
  }
}
