import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Wrong quote-link tokens per address, so guessing links is slowed on every server instance alike. */
export class QuoteTokenFailures1796133600000 implements MigrationInterface {
  name = 'QuoteTokenFailures1796133600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE quote_token_failures (
        id bigserial PRIMARY KEY,
        ip text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX quote_token_failures_ip_idx ON quote_token_failures (ip, created_at)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE quote_token_failures`);
  }
}
