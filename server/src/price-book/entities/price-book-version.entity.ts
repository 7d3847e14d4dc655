import type { PriceBook } from '@pondwright/shared/pricing';
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
import { User } from '../../users/entities/user.entity';

/**
 * One immutable version of a company's price book: the whole book as validated JSON, numbered without gaps
 * per company. A database trigger refuses updates and deletes; a change is always a new row.
 */
@Entity({ name: 'price_book_versions' })
@Index('price_book_versions_company_number_key', ['companyId', 'versionNumber'], { unique: true })
export class PriceBookVersion implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @ManyToOne(() => Company, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'company_id' })
  company?: Company;

  @Column({ name: 'version_number', type: 'integer' })
  versionNumber: number;

  /** ISO date (YYYY-MM-DD) from which this version prices new work. */
  @Column({ name: 'effective_date', type: 'date' })
  effectiveDate: string;

  @Column({ name: 'author_id', type: 'uuid' })
  authorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'author_id' })
  author?: User;

  @Column({ type: 'text', default: '' })
  note: string;

  @Column({ type: 'jsonb' })
  content: PriceBook;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
