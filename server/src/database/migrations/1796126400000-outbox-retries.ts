import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Staff may send a given-up e-mail again: the row goes back to `pending` with its attempts reset, and
 * who asked and when is kept on it (the last request only; the Message-ID never changes, so a copy
 * delivered twice is still recognisable as one message).
 */
export class OutboxRetries1796126400000 implements MigrationInterface {
  name = 'OutboxRetries1796126400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE outbox_messages
        ADD COLUMN retried_at timestamptz,
        ADD COLUMN retried_by uuid REFERENCES users(id),
        ADD CONSTRAINT outbox_messages_retried_check
          CHECK ((retried_at IS NULL) = (retried_by IS NULL))`);
    await queryRunner.query(
      `CREATE INDEX outbox_messages_retried_by_idx ON outbox_messages (retried_by)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE outbox_messages DROP COLUMN retried_at, DROP COLUMN retried_by`,
    );
  }
}
