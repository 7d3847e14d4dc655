import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { Company } from '../companies/entities/company.entity';
import { EstimateVersion } from '../estimates/entities/estimate-version.entity';
import { findEstimate } from '../estimates/lock-estimate';
import { QuoteAcceptance } from './entities/quote-acceptance.entity';
import { QuoteLink } from './entities/quote-link.entity';
import { renderPublicQuotePdf } from './public-quote-view';
import { currentQuoteTerms } from './quote-terms';

/** Days a preview PDF (of a version not sent yet) says it is good for, as a new link would. */
const PREVIEW_VALID_DAYS = 30;

/**
 * The PDF staff download: the accepted link's document when accepted, else the latest link's, else a
 * preview of the latest version as it would be sent today. The same renderer as the homeowner's.
 */
@Injectable()
export class StaffQuotePdfService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
  ) {}

  async forEstimate(
    estimateId: string,
    actorId: string,
  ): Promise<{ filename: string; bytes: Buffer }> {
    const manager = this.dataSource.manager;
    const estimate = await findEstimate(manager, estimateId, this.tenant.companyId);
    const acceptance = await manager.findOneBy(QuoteAcceptance, { estimateId: estimate.id });
    const link = acceptance
      ? await manager.findOneByOrFail(QuoteLink, { id: acceptance.linkId })
      : await manager.findOne(QuoteLink, {
          where: { estimateId: estimate.id },
          order: { createdAt: 'DESC' },
        });
    if (link) return renderPublicQuotePdf(manager, link);
    const version = await manager.findOne(EstimateVersion, {
      where: { estimateId: estimate.id },
      order: { versionNumber: 'DESC' },
    });
    if (!version) {
      throw new AppError('ESTIMATE_NOT_SENDABLE', 'Finalise the estimate to make its quote PDF.');
    }
    const company = await manager.findOneByOrFail(Company, { id: estimate.companyId });
    const now = new Date();
    const preview = Object.assign(new QuoteLink(), {
      id: '00000000-0000-0000-0000-000000000000',
      companyId: estimate.companyId,
      estimateId: estimate.id,
      versionId: version.id,
      createdById: actorId,
      createdAt: now,
      expiresAt: new Date(now.getTime() + PREVIEW_VALID_DAYS * 86_400_000),
      quoteTerms: currentQuoteTerms(company),
    });
    return renderPublicQuotePdf(manager, preview);
  }
}
