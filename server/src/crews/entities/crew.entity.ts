import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { User } from '../../users/entities/user.entity';

/** A crew the schedule is drawn by; its lead is usually the one who keeps the daily log. */
@Entity({ name: 'crews' })
export class Crew implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'text' })
  name: string;

  @Column({ name: 'lead_user_id', type: 'uuid', nullable: true })
  leadUserId: string | null;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'lead_user_id' })
  lead?: User | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
