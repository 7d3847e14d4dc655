import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Job photos: the image and its thumbnail live in the S3-compatible store; the row keeps where, what
 * and whose. The id is made on the phone, like a daily log's, so an upload retried after a lost
 * answer is the same photo.
 */
export class JobPhotos1796112000000 implements MigrationInterface {
  name = 'JobPhotos1796112000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE job_photos (
        id uuid PRIMARY KEY,
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        log_id uuid REFERENCES job_logs(id) ON DELETE SET NULL,
        kind text NOT NULL CHECK (kind IN ('before', 'progress', 'after', 'ticket')),
        caption text NOT NULL DEFAULT '' CHECK (length(caption) <= 200),
        content_type text NOT NULL CHECK (content_type IN ('image/jpeg', 'image/png', 'image/webp')),
        byte_size integer NOT NULL CHECK (byte_size > 0),
        width_px integer NOT NULL CHECK (width_px > 0),
        height_px integer NOT NULL CHECK (height_px > 0),
        upload_sha256 text NOT NULL CHECK (upload_sha256 ~ '^[0-9a-f]{64}$'),
        image_key text NOT NULL,
        thumbnail_key text NOT NULL,
        uploaded_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX job_photos_job_idx ON job_photos (job_id, kind, created_at)`,
    );
    await queryRunner.query(`CREATE INDEX job_photos_company_idx ON job_photos (company_id)`);
    await queryRunner.query(`CREATE INDEX job_photos_log_idx ON job_photos (log_id)`);
    await queryRunner.query(`CREATE INDEX job_photos_uploaded_by_idx ON job_photos (uploaded_by)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE job_photos`);
  }
}
