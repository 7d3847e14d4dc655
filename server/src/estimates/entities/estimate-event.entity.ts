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

/** One line of an estimate's audit log: who did what, when. Only ever inserted. */
@Entity({ name: 'estimate_events' })
export class EstimateEvent implements CompanyOwned {
  /** bigserial: pg hands it back as a string. */
  @PrimaryGeneratedColumn({ type: 'bigint' })
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  /** Null when the homeowner or the payment provider acted; `actorLabel` names them. */
  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  @Column({ name: 'actor_label', type: 'text', nullable: true })
  actorLabel: string | null;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'actor_id' })
  actor?: User;

  @Column({ type: 'text' })
  action: string;

  @Column({ type: 'jsonb' })
  detail: Record<string, unknown>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
