import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';

/** A deposit asked for through a hosted checkout; `paid` only once the provider's signed webhook says so. */
@Entity({ name: 'payments' })
export class Payment implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @Column({ name: 'acceptance_id', type: 'uuid' })
  acceptanceId: string;

  @Column({ type: 'text' })
  purpose: 'deposit' | 'balance';

  /** The final invoice a balance payment settles; null for the deposit. */
  @Column({ name: 'invoice_id', type: 'uuid', nullable: true })
  invoiceId: string | null;

  @Column({ type: 'text' })
  provider: string;

  @Column({ name: 'checkout_session_id', type: 'text' })
  checkoutSessionId: string;

  @Column({ type: 'numeric', precision: 14, scale: 2 })
  amount: string;

  /** ISO 4217, upper case. */
  @Column({ type: 'text' })
  currency: string;

  @Column({ type: 'text', default: 'pending' })
  status: 'pending' | 'paid';

  @Column({ name: 'provider_payment_ref', type: 'text', nullable: true })
  providerPaymentRef: string | null;

  @Column({ name: 'paid_at', type: 'timestamptz', nullable: true })
  paidAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
