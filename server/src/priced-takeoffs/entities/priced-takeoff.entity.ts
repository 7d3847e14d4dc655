import type { TakeoffInput, Takeoff } from '@pondwright/shared/engine';
import type { PricedEstimate } from '@pondwright/shared/pricing';
import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import { Company } from '../../companies/entities/company.entity';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { PriceBookVersion } from '../../price-book/entities/price-book-version.entity';
import { User } from '../../users/entities/user.entity';

/**
 * A saved takeoff priced against one price-book version. It keeps that version's prices until someone
 * re-prices it on purpose; until estimates exist it stands in for one.
 */
@Entity({ name: 'priced_takeoffs' })
@Index('priced_takeoffs_company_created_idx', ['companyId', 'createdAt'])
export class PricedTakeoff implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @ManyToOne(() => Company, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'company_id' })
  company?: Company;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'jsonb' })
  input: TakeoffInput;

  @Column({ type: 'jsonb' })
  takeoff: Takeoff;

  @Column({ type: 'jsonb' })
  priced: PricedEstimate;

  @Column({ name: 'price_book_version_id', type: 'uuid' })
  priceBookVersionId: string;

  @ManyToOne(() => PriceBookVersion)
  @JoinColumn({ name: 'price_book_version_id' })
  priceBookVersion?: PriceBookVersion;

  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'repriced_at', type: 'timestamptz', nullable: true })
  repricedAt: Date | null;
}
