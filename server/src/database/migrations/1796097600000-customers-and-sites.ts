import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Customers and the sites where their water features are built. */
export class CustomersAndSites1796097600000 implements MigrationInterface {
  name = 'CustomersAndSites1796097600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Trigram indexes keep "contains" search fast on name, e-mail and phone as the list grows.
    await queryRunner.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);
    await queryRunner.query(`
      CREATE TABLE customers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name text NOT NULL CHECK (length(name) BETWEEN 1 AND 160),
        phone text NOT NULL DEFAULT '',
        email text NOT NULL DEFAULT '',
        notes text NOT NULL DEFAULT '',
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX customers_company_name_idx ON customers (company_id, lower(name))`,
    );
    await queryRunner.query(
      `CREATE INDEX customers_company_created_idx ON customers (company_id, created_at DESC)`,
    );
    await queryRunner.query(
      `CREATE INDEX customers_search_trgm_idx ON customers USING gin ((lower(name || ' ' || email || ' ' || phone)) gin_trgm_ops)`,
    );
    await queryRunner.query(`
      CREATE TABLE sites (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        customer_id uuid NOT NULL REFERENCES customers(id) ON DELETE CASCADE,
        label text NOT NULL DEFAULT '',
        address_line text NOT NULL,
        city text NOT NULL DEFAULT '',
        region text NOT NULL DEFAULT '',
        postal_code text NOT NULL DEFAULT '',
        access_width_in numeric(7,2),
        carry_distance_ft numeric(8,2),
        slope_pct numeric(5,2),
        soil text CHECK (soil IN ('sand-gravel', 'loam', 'clay')),
        water_available boolean,
        power_available boolean,
        utilities_located boolean NOT NULL DEFAULT false,
        notes text NOT NULL DEFAULT '',
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX sites_customer_idx ON sites (customer_id)`);
    await queryRunner.query(`CREATE INDEX sites_company_idx ON sites (company_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE sites`);
    await queryRunner.query(`DROP TABLE customers`);
  }
}
