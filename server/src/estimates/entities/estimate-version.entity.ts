import type { EstimateComputed, EstimateContent } from '@pondwright/shared';
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity';
import { Estimate } from './estimate.entity';

/** A finalised, immutable version of an estimate (a trigger refuses UPDATE and DELETE). */
@Entity({ name: 'estimate_versions' })
export class EstimateVersion {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @ManyToOne(() => Estimate, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'estimate_id' })
  estimate?: Estimate;

  @Column({ name: 'version_number', type: 'integer' })
  versionNumber: number;

  @Column({ type: 'jsonb' })
  content: EstimateContent;

  @Column({ type: 'jsonb' })
  computed: EstimateComputed;

  @Column({ name: 'content_sha256', type: 'text' })
  contentSha256: string;

  @Column({ name: 'price_book_version_id', type: 'uuid' })
  priceBookVersionId: string;

  @Column({ name: 'finalised_by', type: 'uuid' })
  finalisedById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'finalised_by' })
  finalisedBy?: User;

  @Column({ name: 'finalised_at', type: 'timestamptz' })
  finalisedAt: Date;
}
