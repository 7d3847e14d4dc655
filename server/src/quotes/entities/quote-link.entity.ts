import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { EstimateVersion } from '../../estimates/entities/estimate-version.entity';
import { User } from '../../users/entities/user.entity';

/** A link e-mailed to the homeowner for one version; its token is stored only as a SHA-256 hash. */
@Entity({ name: 'quote_links' })
export class QuoteLink implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  @ManyToOne(() => EstimateVersion)
  @JoinColumn({ name: 'version_id' })
  version?: EstimateVersion;

  @Column({ name: 'token_hash', type: 'text', select: false })
  tokenHash: string;

  @Column({ name: 'recipient_email', type: 'text' })
  recipientEmail: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;

  @Column({ name: 'first_viewed_at', type: 'timestamptz', nullable: true })
  firstViewedAt: Date | null;

  /** Set when the link carries the job's final invoice rather than the quote. */
  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  /** Set when the link carries a change order for the homeowner to accept. */
  @Column({ name: 'change_order_id', type: 'uuid', nullable: true })
  changeOrderId: string | null;

  /**
   * The company's terms as they were when the link was sent, never changed after (a trigger keeps
   * them). Null on a change-order or invoice link, which shows the terms of the accepted quote.
   */
  @Column({ name: 'quote_terms', type: 'text', nullable: true })
  quoteTerms: string | null;

  @Column({ name: 'created_by', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'created_by' })
  createdBy?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
