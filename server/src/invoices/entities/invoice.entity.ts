import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';

/** A job's final invoice: its total, the deposit already paid and the balance due. */
@Entity({ name: 'invoices' })
export class Invoice implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ type: 'numeric', precision: 14, scale: 2 })
  total: string;

  @Column({ name: 'deposit_paid', type: 'numeric', precision: 14, scale: 2 })
  depositPaid: string;

  @Column({ type: 'numeric', precision: 14, scale: 2 })
  balance: string;

  @Column({ type: 'text', default: 'open' })
  status: 'open' | 'paid';

  @Column({ name: 'issued_at', type: 'timestamptz' })
  issuedAt: Date;

  @Column({ name: 'paid_at', type: 'timestamptz', nullable: true })
  paidAt: Date | null;

  @Column({ name: 'created_by', type: 'uuid' })
  createdById: string;
}
