import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The estimates list's own order, newest change first (`ORDER BY updated_at DESC, number DESC` within a
 * company). `estimates_company_status_updated_idx` leads with the status, so an unfiltered list had to
 * read and sort every estimate of the company; with this index a page walks the index and stops after
 * `offset + limit` rows (npm run bench: page 1..20 of 10,000 estimates went from seconds to
 * milliseconds, together with joining the drafts after the page is chosen).
 */
export class EstimatesListOrder1796137200000 implements MigrationInterface {
  name = 'EstimatesListOrder1796137200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE INDEX estimates_company_updated_idx ON estimates (company_id, updated_at DESC, number DESC)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX estimates_company_updated_idx`);
  }
}
