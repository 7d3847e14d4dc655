import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';

/** The homeowner's acceptance of one version: immutable evidence (a trigger refuses changes). */
@Entity({ name: 'quote_acceptances' })
export class QuoteAcceptance implements CompanyOwned {
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

  @Column({ name: 'full_name', type: 'text' })
  fullName: string;

  /** The exact words the homeowner agreed to beside the checkbox. */
  @Column({ name: 'consent_text', type: 'text' })
  consentText: string;

  /** The terms lines the page listed above the checkbox (null for acceptances recorded before). */
  @Column({ name: 'terms_shown', type: 'jsonb', nullable: true })
  termsShown: string[] | null;

  @Column({ type: 'text' })
  ip: string;

  @Column({ name: 'user_agent', type: 'text' })
  userAgent: string;

  @Column({ name: 'option_ids', type: 'jsonb' })
  optionIds: string[];

  @Column({ name: 'content_sha256', type: 'text' })
  contentSha256: string;

  /** numeric(14,2): pg hands it back as a string, which is how money travels here. */
  @Column({ type: 'numeric', precision: 14, scale: 2 })
  total: string;

  @Column({ type: 'numeric', precision: 14, scale: 2 })
  deposit: string;

  @Column({ name: 'accepted_at', type: 'timestamptz' })
  acceptedAt: Date;
}
