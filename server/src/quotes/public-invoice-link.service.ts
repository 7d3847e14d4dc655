import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { Company } from '../companies/entities/company.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { Estimate } from '../estimates/entities/estimate.entity';
import { Invoice } from '../invoices/entities/invoice.entity';
import { PaymentsService } from '../payments/payments.service';
import type { QuoteAcceptance } from './entities/quote-acceptance.entity';
import type { QuoteLink } from './entities/quote-link.entity';

/** What the homeowner does through the final invoice's link: pay the balance. */
@Injectable()
export class PublicInvoiceLinkService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly payments: PaymentsService,
    private readonly config: AppConfig,
  ) {}

  /** The hosted checkout for the balance of the invoice the link carries, after the acceptance. */
  async balanceCheckout(
    token: string,
    link: QuoteLink,
    acceptance: QuoteAcceptance,
  ): Promise<{ url: string }> {
    const manager = this.dataSource.manager;
    const [invoice, estimate, version, company] = await Promise.all([
      manager.findOneByOrFail(Invoice, { id: link.invoiceId! }),
      manager.findOneByOrFail(Estimate, { id: link.estimateId }),
      manager.findOneByOrFail(EstimateVersion, { id: link.versionId }),
      manager.findOneByOrFail(Company, { id: link.companyId }),
    ]);
    const url = await this.payments.createBalanceCheckout({
      acceptance,
      invoice,
      currency: version.computed.priced.currency,
      description: `Balance for job No. ${estimate.number} from ${company.name}`,
      customerEmail: link.recipientEmail,
      returnUrl: `${this.config.publicAppUrl}/q/${token}`,
    });
    return { url };
  }
}
