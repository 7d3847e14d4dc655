import type { JobBudget, JobStatus } from '@pondwright/shared';
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
import { Crew } from '../../crews/entities/crew.entity';
import { Estimate } from '../../estimates/entities/estimate.entity';

/** The work of an accepted estimate, with the budget it was sold on. */
@Entity({ name: 'jobs' })
export class Job implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @ManyToOne(() => Estimate)
  @JoinColumn({ name: 'estimate_id' })
  estimate?: Estimate;

  @Column({ name: 'acceptance_id', type: 'uuid' })
  acceptanceId: string;

  @Column({ type: 'text' })
  status: JobStatus;

  @Column({ name: 'crew_id', type: 'uuid', nullable: true })
  crewId: string | null;

  @ManyToOne(() => Crew)
  @JoinColumn({ name: 'crew_id' })
  crew?: Crew | null;

  /** A calendar date (YYYY-MM-DD): pg's date type comes back as a string. */
  @Column({ name: 'planned_start', type: 'date', nullable: true })
  plannedStart: string | null;

  @Column({ name: 'planned_crew_days', type: 'numeric', precision: 6, scale: 1 })
  plannedCrewDays: string;

  @Column({ type: 'jsonb' })
  budget: JobBudget;

  @Column({ name: 'started_on', type: 'date', nullable: true })
  startedOn: string | null;

  @Column({ name: 'completed_on', type: 'date', nullable: true })
  completedOn: string | null;

  @Column({ name: 'closed_at', type: 'timestamptz', nullable: true })
  closedAt: Date | null;

  @Column({ name: 'created_by', type: 'uuid' })
  createdById: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
