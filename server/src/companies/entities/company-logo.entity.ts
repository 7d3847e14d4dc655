import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The owner's logo for quotes and PDFs; at most 512 KB, PNG or JPEG (checked by its bytes). */
@Entity({ name: 'company_logos' })
export class CompanyLogo {
  @PrimaryColumn({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'content_type', type: 'text' })
  contentType: 'image/png' | 'image/jpeg';

  @Column({ type: 'bytea' })
  bytes: Buffer;

  /** Serves as the ETag. */
  @Column({ type: 'text' })
  sha256: string;

  @Column({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
