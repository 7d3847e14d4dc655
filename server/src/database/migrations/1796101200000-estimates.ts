import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Estimates: one row per estimate (numbered per company without gaps), its single working draft (with a
 * revision for optimistic concurrency), its finalised versions (immutable: a trigger refuses UPDATE and
 * DELETE, except when the estimate itself is gone) and an append-only audit log of every action.
 */
export class Estimates1796101200000 implements MigrationInterface {
  name = 'Estimates1796101200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE estimates (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        number integer NOT NULL CHECK (number >= 1),
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 160),
        customer_id uuid NOT NULL REFERENCES customers(id) ON DELETE RESTRICT,
        site_id uuid REFERENCES sites(id) ON DELETE SET NULL,
        status text NOT NULL DEFAULT 'draft' CHECK (status IN (
          'draft', 'awaiting_approval', 'approved', 'sent', 'viewed', 'accepted', 'declined', 'expired')),
        created_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX estimates_company_number_key ON estimates (company_id, number)`,
    );
    await queryRunner.query(
      `CREATE INDEX estimates_company_status_updated_idx ON estimates (company_id, status, updated_at DESC)`,
    );
    await queryRunner.query(`CREATE INDEX estimates_customer_idx ON estimates (customer_id)`);
    await queryRunner.query(`CREATE INDEX estimates_site_idx ON estimates (site_id)`);
    await queryRunner.query(`CREATE INDEX estimates_created_by_idx ON estimates (created_by)`);

    await queryRunner.query(`
      CREATE TABLE estimate_drafts (
        estimate_id uuid PRIMARY KEY REFERENCES estimates(id) ON DELETE CASCADE,
        revision integer NOT NULL CHECK (revision >= 1),
        content jsonb NOT NULL CHECK (jsonb_typeof(content) = 'object'),
        computed jsonb NOT NULL CHECK (jsonb_typeof(computed) = 'object'),
        price_book_version_id uuid NOT NULL REFERENCES price_book_versions(id),
        updated_by uuid NOT NULL REFERENCES users(id),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX estimate_drafts_price_book_version_idx ON estimate_drafts (price_book_version_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX estimate_drafts_updated_by_idx ON estimate_drafts (updated_by)`,
    );

    await queryRunner.query(`
      CREATE TABLE estimate_versions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        version_number integer NOT NULL CHECK (version_number >= 1),
        content jsonb NOT NULL CHECK (jsonb_typeof(content) = 'object'),
        computed jsonb NOT NULL CHECK (jsonb_typeof(computed) = 'object'),
        content_sha256 text NOT NULL CHECK (content_sha256 ~ '^[0-9a-f]{64}$'),
        price_book_version_id uuid NOT NULL REFERENCES price_book_versions(id),
        finalised_by uuid NOT NULL REFERENCES users(id),
        finalised_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX estimate_versions_estimate_number_key ON estimate_versions (estimate_id, version_number)`,
    );
    await queryRunner.query(
      `CREATE INDEX estimate_versions_price_book_version_idx ON estimate_versions (price_book_version_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX estimate_versions_finalised_by_idx ON estimate_versions (finalised_by)`,
    );
    await queryRunner.query(`
      CREATE FUNCTION estimate_versions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        -- Deleting the estimate (or its company) cascades here; by then its row is gone.
        IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM estimates WHERE id = OLD.estimate_id) THEN
          RETURN OLD;
        END IF;
        RAISE EXCEPTION 'estimate versions are immutable: edit the draft and finalise a new version';
      END
      $$`);
    await queryRunner.query(`
      CREATE TRIGGER estimate_versions_immutable
        BEFORE UPDATE OR DELETE ON estimate_versions
        FOR EACH ROW EXECUTE FUNCTION estimate_versions_immutable()`);

    await queryRunner.query(`
      CREATE TABLE estimate_events (
        id bigserial PRIMARY KEY,
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        actor_id uuid NOT NULL REFERENCES users(id),
        action text NOT NULL,
        detail jsonb NOT NULL DEFAULT '{}'::jsonb,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX estimate_events_estimate_idx ON estimate_events (estimate_id, id)`,
    );
    await queryRunner.query(
      `CREATE INDEX estimate_events_company_idx ON estimate_events (company_id)`,
    );
    await queryRunner.query(`CREATE INDEX estimate_events_actor_idx ON estimate_events (actor_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE estimate_events`);
    await queryRunner.query(`DROP TABLE estimate_versions`);
    await queryRunner.query(`DROP FUNCTION estimate_versions_immutable()`);
    await queryRunner.query(`DROP TABLE estimate_drafts`);
    await queryRunner.query(`DROP TABLE estimates`);
  }
}
