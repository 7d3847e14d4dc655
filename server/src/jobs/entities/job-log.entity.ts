import type { LogEntry } from '@pondwright/shared';
import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { User } from '../../users/entities/user.entity';

/** A crew lead's log of one day on one job. Its id is made on the phone, so a retry is the same log. */
@Entity({ name: 'job_logs' })
export class JobLog implements CompanyOwned {
  @PrimaryColumn({ type: 'uuid' })
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ name: 'log_date', type: 'date' })
  logDate: string;

  @Column({ type: 'text' })
  notes: string;

  @Column({ type: 'jsonb' })
  entries: LogEntry[];

  /** SHA-256 of the date, notes and entries: a resend of the same content is recognised. */
  @Column({ name: 'content_sha256', type: 'text' })
  contentSha256: string;

  @Column({ type: 'integer' })
  revision: number;

  @Column({ name: 'author_id', type: 'uuid' })
  authorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'author_id' })
  author?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
