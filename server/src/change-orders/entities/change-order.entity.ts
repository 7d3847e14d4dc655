import type {
  BudgetLine,
  BudgetLineReduction,
  ChangeOrderStatus,
  ChangeOrderSummary,
} from '@pondwright/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';

/** A scope change on a job: the estimate's next version, in force once the homeowner accepts it. */
@Entity({ name: 'change_orders' })
export class ChangeOrder implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'text' })
  title: string;

  @Column({ type: 'text' })
  reason: string;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  /** The version in force it was priced on; null for change orders made before it was kept. */
  @Column({ name: 'base_version_id', type: 'uuid', nullable: true })
  baseVersionId: string | null;

  /** What the homeowner is shown and accepts (money as decimal strings). */
  @Column({ type: 'jsonb' })
  summary: ChangeOrderSummary;

  /** The lines added to the job's budget when accepted, with their costs. */
  @Column({ name: 'budget_lines', type: 'jsonb' })
  budgetLines: BudgetLine[];

  /** The budget lines it takes work off, with their figures before and after (a credit). */
  @Column({ name: 'budget_reductions', type: 'jsonb', default: () => `'[]'::jsonb` })
  budgetReductions: BudgetLineReduction[];

  @Column({ type: 'text' })
  status: ChangeOrderStatus;

  @Column({ name: 'accepted_name', type: 'text', nullable: true })
  acceptedName: string | null;

  @Column({ name: 'accepted_ip', type: 'text', nullable: true })
  acceptedIp: string | null;

  @Column({ name: 'accepted_user_agent', type: 'text', nullable: true })
  acceptedUserAgent: string | null;

  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'declined_at', type: 'timestamptz', nullable: true })
  declinedAt: Date | null;

  @Column({ name: 'created_by', type: 'uuid' })
  createdById: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
