import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { Customer } from './customer.entity';

/** Where a feature is built, with what the crew will meet there: access, carry, slope, soil, utilities. */
@Entity({ name: 'sites' })
export class Site implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @ManyToOne(() => Customer, (customer) => customer.sites, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'customer_id' })
  customer?: Customer;

  @Column({ type: 'text', default: '' })
  label: string;

  @Column({ name: 'address_line', type: 'text' })
  addressLine: string;

  @Column({ type: 'text', default: '' })
  city: string;

  @Column({ type: 'text', default: '' })
  region: string;

  @Column({ name: 'postal_code', type: 'text', default: '' })
  postalCode: string;

  /** numeric columns arrive as strings from pg; kept as strings here and converted at the edge. */
  @Column({ name: 'access_width_in', type: 'numeric', precision: 7, scale: 2, nullable: true })
  accessWidthIn: string | null;

  @Column({ name: 'carry_distance_ft', type: 'numeric', precision: 8, scale: 2, nullable: true })
  carryDistanceFt: string | null;

  @Column({ name: 'slope_pct', type: 'numeric', precision: 5, scale: 2, nullable: true })
  slopePct: string | null;

  @Column({ type: 'text', nullable: true })
  soil: 'sand-gravel' | 'loam' | 'clay' | null;

  @Column({ name: 'water_available', type: 'boolean', nullable: true })
  waterAvailable: boolean | null;

  @Column({ name: 'power_available', type: 'boolean', nullable: true })
  powerAvailable: boolean | null;

  @Column({ name: 'utilities_located', type: 'boolean', default: false })
  utilitiesLocated: boolean;

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
