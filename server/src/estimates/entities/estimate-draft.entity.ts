import type { EstimateComputed, EstimateContent } from '@pondwright/shared';
import { Column, Entity, JoinColumn, ManyToOne, OneToOne, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity';
import { Estimate } from './estimate.entity';

/** The one working draft of an estimate; `revision` goes up by one on every save. */
@Entity({ name: 'estimate_drafts' })
export class EstimateDraft {
  @PrimaryColumn({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @OneToOne(() => Estimate, (estimate) => estimate.draft, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'estimate_id' })
  estimate?: Estimate;

  @Column({ type: 'integer' })
  revision: number;

  @Column({ type: 'jsonb' })
  content: EstimateContent;

  @Column({ type: 'jsonb' })
  computed: EstimateComputed;

  @Column({ name: 'price_book_version_id', type: 'uuid' })
  priceBookVersionId: string;

  @Column({ name: 'updated_by', type: 'uuid' })
  updatedById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'updated_by' })
  updatedBy?: User;

  @Column({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
