import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The homeowner's quote:
 * - `outbox_messages`: e-mails written in the same transaction as the change that causes them and sent
 *   by a worker with retries; `message_id` is fixed at insert so every retry carries the same Message-ID.
 * - `quote_links`: the link's token is stored only as its SHA-256; expiry and revocation per link.
 * - `quote_acceptances` and `quote_declines`: the homeowner's answer, immutable (trigger) like versions.
 * - `payments` and `payment_events`: deposits, and the provider's event ids so a replayed webhook is
 *   recorded once.
 * - `company_logos`: the owner's logo, kept apart so companies load without the image.
 * - `estimate_events.actor_id` becomes optional: the homeowner and the payment provider act without a
 *   user; `actor_label` names them.
 */
export class QuotesPaymentsOutbox1796104800000 implements MigrationInterface {
  name = 'QuotesPaymentsOutbox1796104800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE outbox_messages (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid REFERENCES companies(id) ON DELETE CASCADE,
        kind text NOT NULL,
        message_id text NOT NULL UNIQUE,
        to_address text NOT NULL,
        reply_to text,
        subject text NOT NULL,
        text_body text NOT NULL,
        html_body text,
        attachments jsonb NOT NULL DEFAULT '[]'::jsonb CHECK (jsonb_typeof(attachments) = 'array'),
        status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sent', 'failed')),
        attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
        next_attempt_at timestamptz NOT NULL DEFAULT now(),
        locked_until timestamptz,
        last_error text,
        sent_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX outbox_messages_due_idx ON outbox_messages (next_attempt_at) WHERE status = 'pending'`,
    );
    await queryRunner.query(
      `CREATE INDEX outbox_messages_company_idx ON outbox_messages (company_id, created_at DESC)`,
    );

    await queryRunner.query(`
      CREATE TABLE quote_links (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        version_id uuid NOT NULL REFERENCES estimate_versions(id) ON DELETE CASCADE,
        token_hash text NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
        recipient_email text NOT NULL,
        expires_at timestamptz NOT NULL,
        revoked_at timestamptz,
        first_viewed_at timestamptz,
        created_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX quote_links_estimate_idx ON quote_links (estimate_id, created_at DESC)`,
    );
    await queryRunner.query(`CREATE INDEX quote_links_company_idx ON quote_links (company_id)`);
    await queryRunner.query(`CREATE INDEX quote_links_version_idx ON quote_links (version_id)`);
    await queryRunner.query(`CREATE INDEX quote_links_created_by_idx ON quote_links (created_by)`);

    await queryRunner.query(`
      CREATE TABLE quote_acceptances (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL UNIQUE REFERENCES estimates(id) ON DELETE CASCADE,
        version_id uuid NOT NULL REFERENCES estimate_versions(id) ON DELETE CASCADE,
        link_id uuid NOT NULL REFERENCES quote_links(id) ON DELETE CASCADE,
        full_name text NOT NULL CHECK (length(full_name) BETWEEN 2 AND 120),
        consent_text text NOT NULL,
        ip text NOT NULL,
        user_agent text NOT NULL,
        option_ids jsonb NOT NULL CHECK (jsonb_typeof(option_ids) = 'array'),
        content_sha256 text NOT NULL CHECK (content_sha256 ~ '^[0-9a-f]{64}$'),
        total numeric(14, 2) NOT NULL CHECK (total >= 0),
        deposit numeric(14, 2) NOT NULL CHECK (deposit >= 0),
        accepted_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX quote_acceptances_company_idx ON quote_acceptances (company_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX quote_acceptances_version_idx ON quote_acceptances (version_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX quote_acceptances_link_idx ON quote_acceptances (link_id)`,
    );

    await queryRunner.query(`
      CREATE TABLE quote_declines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        version_id uuid NOT NULL REFERENCES estimate_versions(id) ON DELETE CASCADE,
        link_id uuid NOT NULL UNIQUE REFERENCES quote_links(id) ON DELETE CASCADE,
        reason text CHECK (reason IS NULL OR length(reason) <= 2000),
        ip text NOT NULL,
        user_agent text NOT NULL,
        declined_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX quote_declines_estimate_idx ON quote_declines (estimate_id, declined_at DESC)`,
    );
    await queryRunner.query(
      `CREATE INDEX quote_declines_company_idx ON quote_declines (company_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX quote_declines_version_idx ON quote_declines (version_id)`,
    );

    // The homeowner's answers are evidence: never changed or removed (except with the estimate).
    await queryRunner.query(`
      CREATE FUNCTION refuse_quote_answer_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP = 'DELETE' AND NOT EXISTS (SELECT 1 FROM estimates WHERE id = OLD.estimate_id) THEN
          RETURN OLD;
        END IF;
        RAISE EXCEPTION 'the homeowner''s answer to a quote cannot be changed'
          USING ERRCODE = 'integrity_constraint_violation';
      END $$`);
    for (const table of ['quote_acceptances', 'quote_declines']) {
      await queryRunner.query(`
        CREATE TRIGGER ${table}_immutable BEFORE UPDATE OR DELETE ON ${table}
        FOR EACH ROW EXECUTE FUNCTION refuse_quote_answer_change()`);
    }

    await queryRunner.query(`
      CREATE TABLE payments (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL REFERENCES estimates(id) ON DELETE CASCADE,
        acceptance_id uuid NOT NULL REFERENCES quote_acceptances(id) ON DELETE CASCADE,
        purpose text NOT NULL CHECK (purpose IN ('deposit')),
        provider text NOT NULL,
        checkout_session_id text NOT NULL UNIQUE,
        amount numeric(14, 2) NOT NULL CHECK (amount > 0),
        currency text NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
        status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'paid')),
        provider_payment_ref text,
        paid_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    // One paid deposit per estimate, whatever the provider sends.
    await queryRunner.query(
      `CREATE UNIQUE INDEX payments_one_paid_deposit_key ON payments (estimate_id, purpose) WHERE status = 'paid'`,
    );
    await queryRunner.query(
      `CREATE INDEX payments_estimate_idx ON payments (estimate_id, created_at DESC)`,
    );
    await queryRunner.query(`CREATE INDEX payments_company_idx ON payments (company_id)`);
    await queryRunner.query(`CREATE INDEX payments_acceptance_idx ON payments (acceptance_id)`);

    await queryRunner.query(`
      CREATE TABLE payment_events (
        provider text NOT NULL,
        event_id text NOT NULL,
        type text NOT NULL,
        payment_id uuid REFERENCES payments(id) ON DELETE CASCADE,
        received_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (provider, event_id)
      )`);
    await queryRunner.query(
      `CREATE INDEX payment_events_payment_idx ON payment_events (payment_id)`,
    );

    await queryRunner.query(`
      CREATE TABLE company_logos (
        company_id uuid PRIMARY KEY REFERENCES companies(id) ON DELETE CASCADE,
        content_type text NOT NULL CHECK (content_type IN ('image/png', 'image/jpeg')),
        bytes bytea NOT NULL CHECK (octet_length(bytes) BETWEEN 1 AND 524288),
        sha256 text NOT NULL,
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);

    await queryRunner.query(`ALTER TABLE estimate_events ALTER COLUMN actor_id DROP NOT NULL`);
    await queryRunner.query(`ALTER TABLE estimate_events ADD COLUMN actor_label text`);
    await queryRunner.query(`
      ALTER TABLE estimate_events ADD CONSTRAINT estimate_events_actor_check
      CHECK (actor_id IS NOT NULL OR actor_label IS NOT NULL)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM estimate_events WHERE actor_id IS NULL`);
    await queryRunner.query(
      `ALTER TABLE estimate_events DROP CONSTRAINT estimate_events_actor_check`,
    );
    await queryRunner.query(`ALTER TABLE estimate_events DROP COLUMN actor_label`);
    await queryRunner.query(`ALTER TABLE estimate_events ALTER COLUMN actor_id SET NOT NULL`);
    await queryRunner.query(`DROP TABLE company_logos`);
    await queryRunner.query(`DROP TABLE payment_events`);
    await queryRunner.query(`DROP TABLE payments`);
    await queryRunner.query(`DROP TABLE quote_declines`);
    await queryRunner.query(`DROP TABLE quote_acceptances`);
    await queryRunner.query(`DROP FUNCTION refuse_quote_answer_change()`);
    await queryRunner.query(`DROP TABLE quote_links`);
    await queryRunner.query(`DROP TABLE outbox_messages`);
  }
}
