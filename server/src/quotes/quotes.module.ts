import { Module, type OnModuleInit } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { MailAttachments } from '../mail/mail-attachments';
import { ChangeOrderAnswers } from '../change-orders/change-order-answers';
import { PaymentsModule } from '../payments/payments.module';
import { QuoteLink } from './entities/quote-link.entity';
import { EstimateQuoteController } from './estimate-quote.controller';
import { PublicQuotesController } from './public-quotes.controller';
import { PublicInvoiceLinkService } from './public-invoice-link.service';
import { PublicQuoteLinkService } from './public-quote-link.service';
import { renderPublicQuotePdf } from './public-quote-view';
import { PublicQuotesService } from './public-quotes.service';
import { QuoteExpiryService } from './quote-expiry.service';
import { QuoteLinksService } from './quote-links.service';
import { PublicLinkInterceptor } from './public-link.interceptor';
import { StaffQuotePdfService } from './staff-quote-pdf.service';
import { WrongTokenThrottle } from './wrong-token-throttle.service';

@Module({
  imports: [PaymentsModule],
  controllers: [EstimateQuoteController, PublicQuotesController],
  providers: [
    QuoteLinksService,
    PublicQuotesService,
    PublicQuoteLinkService,
    PublicInvoiceLinkService,
    StaffQuotePdfService,
    QuoteExpiryService,
    ChangeOrderAnswers,
    WrongTokenThrottle,
    PublicLinkInterceptor,
  ],
  exports: [PublicQuotesService, WrongTokenThrottle],
})
export class QuotesModule implements OnModuleInit {
  constructor(
    private readonly attachments: MailAttachments,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  /** The quote e-mail's PDF is rendered when the e-mail is sent, from the link it was queued with. */
  onModuleInit(): void {
    this.attachments.register('quote-pdf', async (attachment) => {
      const manager = this.dataSource.manager;
      const link = await manager.findOneByOrFail(QuoteLink, { id: attachment.linkId });
      const pdf = await renderPublicQuotePdf(manager, link);
      return { filename: attachment.filename, content: pdf.bytes, contentType: 'application/pdf' };
    });
  }
}
