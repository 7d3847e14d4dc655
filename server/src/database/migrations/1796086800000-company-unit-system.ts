import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Each company chooses the units its estimates start in: US customary or metric. */
export class CompanyUnitSystem1796086800000 implements MigrationInterface {
  name = 'CompanyUnitSystem1796086800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE companies ADD COLUMN unit_system text NOT NULL DEFAULT 'us' CHECK (unit_system IN ('us', 'metric'))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE companies DROP COLUMN unit_system`);
  }
}
