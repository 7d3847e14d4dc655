import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Change orders: a scope change on a job, frozen as the estimate's next version and sent to the
 * homeowner through a link with the quote link's token rules; the job's budget grows only once the
 * homeowner accepts. The answer is kept like a quote's (who, when, from where, which version).
 */
export class ChangeOrders1796119200000 implements MigrationInterface {
  name = 'ChangeOrders1796119200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE change_orders (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        number integer NOT NULL CHECK (number >= 1),
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 160),
        reason text NOT NULL DEFAULT '' CHECK (length(reason) <= 2000),
        version_id uuid NOT NULL UNIQUE REFERENCES estimate_versions(id) ON DELETE CASCADE,
        summary jsonb NOT NULL CHECK (jsonb_typeof(summary) = 'object'),
        budget_lines jsonb NOT NULL CHECK (jsonb_typeof(budget_lines) = 'array'),
        status text NOT NULL DEFAULT 'ready' CHECK (status IN ('ready', 'sent', 'accepted', 'declined')),
        accepted_name text,
        accepted_ip text,
        accepted_user_agent text,
        accepted_at timestamptz,
        declined_at timestamptz,
        created_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX change_orders_job_number_key ON change_orders (job_id, number)`,
    );
    await queryRunner.query(`CREATE INDEX change_orders_company_idx ON change_orders (company_id)`);
    await queryRunner.query(
      `CREATE INDEX change_orders_created_by_idx ON change_orders (created_by)`,
    );
    await queryRunner.query(
      `ALTER TABLE quote_links ADD COLUMN change_order_id uuid REFERENCES change_orders(id) ON DELETE CASCADE`,
    );
    await queryRunner.query(
      `CREATE INDEX quote_links_change_order_idx ON quote_links (change_order_id)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE quote_links DROP COLUMN change_order_id`);
    await queryRunner.query(`DROP TABLE change_orders`);
  }
}
