import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Saved, priced takeoffs (standing in for estimates until they exist): the input, the engine's takeoff and
 * the priced result, tied to the price-book version they were priced with until re-priced on purpose.
 */
export class PricedTakeoffs1796094000000 implements MigrationInterface {
  name = 'PricedTakeoffs1796094000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE priced_takeoffs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
        input jsonb NOT NULL,
        takeoff jsonb NOT NULL,
        priced jsonb NOT NULL,
        price_book_version_id uuid NOT NULL REFERENCES price_book_versions(id),
        created_by_id uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        repriced_at timestamptz
      )`);
    await queryRunner.query(
      `CREATE INDEX priced_takeoffs_company_created_idx ON priced_takeoffs (company_id, created_at)`,
    );
    await queryRunner.query(
      `CREATE INDEX priced_takeoffs_version_idx ON priced_takeoffs (price_book_version_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX priced_takeoffs_created_by_idx ON priced_takeoffs (created_by_id)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE priced_takeoffs`);
  }
}
