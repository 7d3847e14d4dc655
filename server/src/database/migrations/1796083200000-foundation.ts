import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Companies, their users and roles, invites, refresh-token families and sign-in failures. */
export class Foundation1796083200000 implements MigrationInterface {
  name = 'Foundation1796083200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE companies (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        email text NOT NULL CHECK (email = lower(email)),
        name text NOT NULL,
        role text NOT NULL CHECK (role IN ('owner', 'estimator', 'crew_lead')),
        password_hash text NOT NULL,
        active boolean NOT NULL DEFAULT true,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX users_email_key ON users (email)`);
    await queryRunner.query(`CREATE INDEX users_company_idx ON users (company_id)`);
    await queryRunner.query(`
      CREATE TABLE invites (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        email text NOT NULL CHECK (email = lower(email)),
        role text NOT NULL CHECK (role IN ('owner', 'estimator', 'crew_lead')),
        token_hash text NOT NULL,
        expires_at timestamptz NOT NULL,
        accepted_at timestamptz,
        revoked_at timestamptz,
        invited_by_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX invites_token_hash_key ON invites (token_hash)`);
    await queryRunner.query(`CREATE INDEX invites_company_idx ON invites (company_id)`);
    await queryRunner.query(`
      CREATE TABLE refresh_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
        family_id uuid NOT NULL,
        token_hash text NOT NULL,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        revoked_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX refresh_tokens_hash_key ON refresh_tokens (token_hash)`,
    );
    await queryRunner.query(`CREATE INDEX refresh_tokens_family_idx ON refresh_tokens (family_id)`);
    await queryRunner.query(`CREATE INDEX refresh_tokens_user_idx ON refresh_tokens (user_id)`);
    await queryRunner.query(`
      CREATE TABLE login_failures (
        id bigserial PRIMARY KEY,
        email_key text NOT NULL,
        ip text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX login_failures_email_idx ON login_failures (email_key, created_at)`,
    );
    await queryRunner.query(
      `CREATE INDEX login_failures_ip_idx ON login_failures (ip, created_at)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE login_failures`);
    await queryRunner.query(`DROP TABLE refresh_tokens`);
    await queryRunner.query(`DROP TABLE invites`);
    await queryRunner.query(`DROP TABLE users`);
    await queryRunner.query(`DROP TABLE companies`);
  }
}
