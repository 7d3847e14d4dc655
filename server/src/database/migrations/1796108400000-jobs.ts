import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Jobs: crews; a job per accepted estimate with its budget (a snapshot of the accepted lines, so later
 * price-book changes never move it); every move of its schedule with the reason; and the crew lead's
 * daily logs, whose ids are made on the phone so an offline retry is the same log.
 */
export class Jobs1796108400000 implements MigrationInterface {
  name = 'Jobs1796108400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE crews (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80),
        lead_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX crews_company_name_key ON crews (company_id, lower(name))`,
    );
    await queryRunner.query(`CREATE INDEX crews_lead_user_idx ON crews (lead_user_id)`);

    await queryRunner.query(`
      CREATE TABLE jobs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        estimate_id uuid NOT NULL UNIQUE REFERENCES estimates(id) ON DELETE CASCADE,
        acceptance_id uuid NOT NULL REFERENCES quote_acceptances(id) ON DELETE CASCADE,
        status text NOT NULL DEFAULT 'scheduled'
          CHECK (status IN ('scheduled', 'in_progress', 'completed', 'closed')),
        crew_id uuid REFERENCES crews(id) ON DELETE SET NULL,
        planned_start date,
        planned_crew_days numeric(6, 1) NOT NULL CHECK (planned_crew_days >= 0),
        budget jsonb NOT NULL CHECK (jsonb_typeof(budget) = 'object'),
        started_on date,
        completed_on date,
        closed_at timestamptz,
        created_by uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX jobs_company_start_idx ON jobs (company_id, planned_start)`,
    );
    await queryRunner.query(`CREATE INDEX jobs_crew_idx ON jobs (crew_id)`);
    await queryRunner.query(`CREATE INDEX jobs_acceptance_idx ON jobs (acceptance_id)`);
    await queryRunner.query(`CREATE INDEX jobs_created_by_idx ON jobs (created_by)`);

    await queryRunner.query(`
      CREATE TABLE job_schedule_changes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        from_start date,
        to_start date NOT NULL,
        from_crew_id uuid REFERENCES crews(id) ON DELETE SET NULL,
        to_crew_id uuid REFERENCES crews(id) ON DELETE SET NULL,
        reason text CHECK (reason IN ('weather', 'access', 'materials', 'crew', 'homeowner', 'other')),
        note text CHECK (note IS NULL OR length(note) <= 500),
        actor_id uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE INDEX job_schedule_changes_job_idx ON job_schedule_changes (job_id, created_at)`,
    );
    await queryRunner.query(
      `CREATE INDEX job_schedule_changes_company_idx ON job_schedule_changes (company_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX job_schedule_changes_from_crew_idx ON job_schedule_changes (from_crew_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX job_schedule_changes_to_crew_idx ON job_schedule_changes (to_crew_id)`,
    );
    await queryRunner.query(
      `CREATE INDEX job_schedule_changes_actor_idx ON job_schedule_changes (actor_id)`,
    );

    await queryRunner.query(`
      CREATE TABLE job_logs (
        id uuid PRIMARY KEY,
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
        log_date date NOT NULL,
        notes text NOT NULL DEFAULT '' CHECK (length(notes) <= 4000),
        entries jsonb NOT NULL CHECK (jsonb_typeof(entries) = 'array'),
        content_sha256 text NOT NULL CHECK (content_sha256 ~ '^[0-9a-f]{64}$'),
        revision integer NOT NULL CHECK (revision >= 1),
        author_id uuid NOT NULL REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX job_logs_job_date_idx ON job_logs (job_id, log_date)`);
    await queryRunner.query(`CREATE INDEX job_logs_company_idx ON job_logs (company_id)`);
    await queryRunner.query(`CREATE INDEX job_logs_author_idx ON job_logs (author_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE job_logs`);
    await queryRunner.query(`DROP TABLE job_schedule_changes`);
    await queryRunner.query(`DROP TABLE jobs`);
    await queryRunner.query(`DROP TABLE crews`);
  }
}
