import type { RescheduleReason } from '@pondwright/shared';
import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { Crew } from '../../crews/entities/crew.entity';
import { User } from '../../users/entities/user.entity';

/** One move of a job on the schedule, and why; only ever inserted. */
@Entity({ name: 'job_schedule_changes' })
export class JobScheduleChange implements CompanyOwned {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ name: 'from_start', type: 'date', nullable: true })
  fromStart: string | null;

  @Column({ name: 'to_start', type: 'date' })
  toStart: string;

  @Column({ name: 'from_crew_id', type: 'uuid', nullable: true })
  fromCrewId: string | null;

  @ManyToOne(() => Crew)
  @JoinColumn({ name: 'from_crew_id' })
  fromCrew?: Crew | null;

  @Column({ name: 'to_crew_id', type: 'uuid', nullable: true })
  toCrewId: string | null;

  @ManyToOne(() => Crew)
  @JoinColumn({ name: 'to_crew_id' })
  toCrew?: Crew | null;

  @Column({ type: 'text', nullable: true })
  reason: RescheduleReason | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'actor_id', type: 'uuid' })
  actorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'actor_id' })
  actor?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
