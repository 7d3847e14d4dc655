import type { PhotoKind } from '@pondwright/shared';
import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { CompanyOwned } from '../../common/tenancy/company-owned';
import { User } from '../../users/entities/user.entity';

/** A photo of a job; the image and thumbnail are objects in the S3-compatible store. */
@Entity({ name: 'job_photos' })
export class JobPhoto implements CompanyOwned {
  @PrimaryColumn({ type: 'uuid' })
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ name: 'log_id', type: 'uuid', nullable: true })
  logId: string | null;

  @Column({ type: 'text' })
  kind: PhotoKind;

  @Column({ type: 'text' })
  caption: string;

  @Column({ name: 'content_type', type: 'text' })
  contentType: 'image/jpeg' | 'image/png' | 'image/webp';

  @Column({ name: 'byte_size', type: 'integer' })
  byteSize: number;

  @Column({ name: 'width_px', type: 'integer' })
  widthPx: number;

  @Column({ name: 'height_px', type: 'integer' })
  heightPx: number;

  /** SHA-256 of the bytes as uploaded: a retried upload of the same photo is recognised. */
  @Column({ name: 'upload_sha256', type: 'text' })
  uploadSha256: string;

  @Column({ name: 'image_key', type: 'text' })
  imageKey: string;

  @Column({ name: 'thumbnail_key', type: 'text' })
  thumbnailKey: string;

  @Column({ name: 'uploaded_by', type: 'uuid' })
  uploadedById: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'uploaded_by' })
  uploadedBy?: User;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
