import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Price-book versions: each change to a company's price book is a new, numbered, immutable row holding the
 * whole book. A trigger refuses UPDATE and DELETE so an estimate's version can never change under it; only
 * deleting the company itself takes its versions along.
 */
export class PriceBookVersions1796090400000 implements MigrationInterface {
  name = 'PriceBookVersions1796090400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE price_book_versions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        version_number integer NOT NULL CHECK (version_number >= 1),
        effective_date date NOT NULL,
        author_id uuid NOT NULL REFERENCES users(id),
        note text NOT NULL DEFAULT '' CHECK (length(note) <= 500),
        content jsonb NOT NULL CHECK (jsonb_typeof(content) = 'object'),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX price_book_versions_company_number_key ON price_book_versions (company_id, version_number)`,
    );
    await queryRunner.query(
      `CREATE INDEX price_book_versions_company_effective_idx ON price_book_versions (company_id, effective_date, version_number)`,
    );
    await queryRunner.query(
      `CREATE INDEX price_book_versions_author_idx ON price_book_versions (author_id)`,
    );
    await queryRunner.query(`
      CREATE FUNCTION price_book_versions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        -- The company's own deletion cascades here; by then its row is gone.
        IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM companies WHERE id = OLD.company_id) THEN
          RETURN OLD;
        END IF;
        RAISE EXCEPTION 'price book versions are immutable: save a new version instead';
      END
      $$`);
    await queryRunner.query(`
      CREATE TRIGGER price_book_versions_immutable
        BEFORE UPDATE OR DELETE ON price_book_versions
        FOR EACH ROW EXECUTE FUNCTION price_book_versions_immutable()`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE price_book_versions`);
    await queryRunner.query(`DROP FUNCTION price_book_versions_immutable()`);
  }
}
