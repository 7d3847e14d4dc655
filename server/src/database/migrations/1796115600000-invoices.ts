import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The final invoice of a job: its total (the accepted budget), the deposit already paid and the balance
 * due, sent to the homeowner through a link with the quote link's token rules and paid through the same
 * payment provider. Payments learn a second purpose, the balance.
 */
export class Invoices1796115600000 implements MigrationInterface {
  name = 'Invoices1796115600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE invoices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL UNIQUE REFERENCES jobs(id) ON DELETE CASCADE,
        total numeric(14, 2) NOT NULL CHECK (total >= 0),
        deposit_paid numeric(14, 2) NOT NULL CHECK (deposit_paid >= 0),
        balance numeric(14, 2) NOT NULL,
        status text NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'paid')),
        issued_at timestamptz NOT NULL DEFAULT now(),
        paid_at timestamptz,
        created_by uuid NOT NULL REFERENCES users(id)
      )`);
    await queryRunner.query(`CREATE INDEX invoices_company_idx ON invoices (company_id)`);
    await queryRunner.query(`CREATE INDEX invoices_created_by_idx ON invoices (created_by)`);
    await queryRunner.query(
      `ALTER TABLE quote_links ADD COLUMN invoice_id uuid REFERENCES invoices(id) ON DELETE CASCADE`,
    );
    await queryRunner.query(`CREATE INDEX quote_links_invoice_idx ON quote_links (invoice_id)`);
    await queryRunner.query(`ALTER TABLE payments DROP CONSTRAINT payments_purpose_check`);
    await queryRunner.query(
      `ALTER TABLE payments ADD CONSTRAINT payments_purpose_check CHECK (purpose IN ('deposit', 'balance'))`,
    );
    await queryRunner.query(
      `ALTER TABLE payments ADD COLUMN invoice_id uuid REFERENCES invoices(id) ON DELETE CASCADE`,
    );
    await queryRunner.query(`CREATE INDEX payments_invoice_idx ON payments (invoice_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM payments WHERE purpose = 'balance'`);
    await queryRunner.query(`ALTER TABLE payments DROP COLUMN invoice_id`);
    await queryRunner.query(`ALTER TABLE payments DROP CONSTRAINT payments_purpose_check`);
    await queryRunner.query(
      `ALTER TABLE payments ADD CONSTRAINT payments_purpose_check CHECK (purpose IN ('deposit'))`,
    );
    await queryRunner.query(`ALTER TABLE quote_links DROP COLUMN invoice_id`);
    await queryRunner.query(`DROP TABLE invoices`);
  }
}
