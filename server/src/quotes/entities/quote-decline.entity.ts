import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';

/** The homeowner's "no, thanks" to one link's version, with their reason if they gave one. */
@Entity({ name: 'quote_declines' })
export class QuoteDecline implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  @Column({ name: 'link_id', type: 'uuid' })
  linkId: string;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Column({ type: 'text' })
  ip: string;

  @Column({ name: 'user_agent', type: 'text' })
  userAgent: string;

  @Column({ name: 'declined_at', type: 'timestamptz' })
  declinedAt: Date;
}
