import type { CompanyProfile } from '@pondwright/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A contracting business: the tenant every other row belongs to. */
@Entity({ name: 'companies' })
export class Company {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'text' })
  name: string;

  /** The units new estimates and takeoffs start in; each estimate may still choose its own. */
  @Column({ name: 'unit_system', type: 'text', default: 'us' })
  unitSystem: CompanyProfile['unitSystem'];

  /** The owner's quote terms; null while the company uses `DEFAULT_QUOTE_TERMS`. */
  @Column({ name: 'quote_terms', type: 'text', nullable: true })
  quoteTerms: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
