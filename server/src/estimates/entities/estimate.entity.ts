import type { EstimateStatus } from '@pondwright/shared';
import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  OneToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { Customer } from '../../customers/entities/customer.entity';
import { Site } from '../../customers/entities/site.entity';
import { User } from '../../users/entities/user.entity';
import { EstimateDraft } from './estimate-draft.entity';

/** An estimate for a customer: numbered per company without gaps; its figures live in its draft and versions. */
@Entity({ name: 'estimates' })
export class Estimate implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'text' })
  title: string;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @ManyToOne(() => Customer)
  @JoinColumn({ name: 'customer_id' })
  customer?: Customer;

  @Column({ name: 'site_id', type: 'uuid', nullable: true })
  siteId: string | null;

  @ManyToOne(() => Site)
  @JoinColumn({ name: 'site_id' })
  site?: Site;

  @Column({ type: 'text' })
  status: EstimateStatus;

  @Column({ name: 'created_by', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'created_by' })
  createdBy?: User;

  @OneToOne(() => EstimateDraft, (draft) => draft.estimate)
  draft?: EstimateDraft;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
