import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Credits: a change order may take work off lines of the job's budget as well as add new ones. The
 * lines it reduces are kept apart from those it adds, with their figures before and after, and the
 * version it was priced on is kept so it cannot be accepted once another change has moved the job
 * on (null for the change orders written before, which are not checked). The lines the homeowner
 * reads say whether each was added, reduced or removed; the summaries written before (which only
 * added) are marked `added`.
 */
export class ChangeOrderCredits1796122800000 implements MigrationInterface {
  name = 'ChangeOrderCredits1796122800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE change_orders
        ADD COLUMN budget_reductions jsonb NOT NULL DEFAULT '[]'
          CHECK (jsonb_typeof(budget_reductions) = 'array'),
        ADD COLUMN base_version_id uuid REFERENCES estimate_versions(id) ON DELETE CASCADE`);
    await queryRunner.query(
      `CREATE INDEX change_orders_base_version_idx ON change_orders (base_version_id)`,
    );
    await queryRunner.query(`
      UPDATE change_orders SET summary = jsonb_set(summary, '{lines}', (
        SELECT coalesce(
          jsonb_agg(
            line || '{"change": "added", "fromQuantity": null, "toQuantity": null}'::jsonb
            ORDER BY position
          ),
          '[]'::jsonb
        )
        FROM jsonb_array_elements(summary->'lines') WITH ORDINALITY AS lines(line, position)
      ))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      UPDATE change_orders SET summary = jsonb_set(summary, '{lines}', (
        SELECT coalesce(
          jsonb_agg(line - 'change' - 'fromQuantity' - 'toQuantity' ORDER BY position),
          '[]'::jsonb
        )
        FROM jsonb_array_elements(summary->'lines') WITH ORDINALITY AS lines(line, position)
      ))`);
    await queryRunner.query(
      `ALTER TABLE change_orders DROP COLUMN budget_reductions, DROP COLUMN base_version_id`,
    );
  }
}
