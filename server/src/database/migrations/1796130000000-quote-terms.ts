import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The built-in terms as they stood when this migration was written (`DEFAULT_QUOTE_TERMS`). */
const TERMS_BEFORE = [
  'Changes to the work after acceptance are agreed in writing, with their price, before they are made.',
  'Buried obstructions we could not see when measuring (ledge rock, old footings, large roots) are priced as a change if they add work.',
  'Plants and fish are not included unless they are listed.',
].join('\n\n');

/**
 * The company's own quote terms, frozen into what is sent:
 * - `companies.quote_terms`: the owner's text; null means the built-in default.
 * - `quote_links.quote_terms`: the terms the link was sent with, copied from the company at send time.
 *   The links sent before are filled with the built-in terms they were shown. Null on a change-order or
 *   invoice link: those show the terms of the quote the homeowner accepted. A trigger keeps the text
 *   once written.
 * - `quote_acceptances.terms_shown`: the terms lines the homeowner agreed to, recorded beside the
 *   consent words (null for acceptances recorded before; their link holds the terms).
 */
export class QuoteTerms1796130000000 implements MigrationInterface {
  name = 'QuoteTerms1796130000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE companies
        ADD COLUMN quote_terms text CHECK (quote_terms IS NULL OR char_length(quote_terms) BETWEEN 1 AND 4000)`);
    await queryRunner.query(`ALTER TABLE quote_links ADD COLUMN quote_terms text`);
    await queryRunner.query(
      `UPDATE quote_links SET quote_terms = $1 WHERE change_order_id IS NULL AND invoice_id IS NULL`,
      [TERMS_BEFORE],
    );
    await queryRunner.query(`
      CREATE FUNCTION quote_links_terms_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF OLD.quote_terms IS NOT NULL AND NEW.quote_terms IS DISTINCT FROM OLD.quote_terms THEN
          RAISE EXCEPTION 'the terms a quote was sent with cannot be changed'
            USING ERRCODE = 'integrity_constraint_violation';
        END IF;
        RETURN NEW;
      END $$`);
    await queryRunner.query(`
      CREATE TRIGGER quote_links_terms_fixed BEFORE UPDATE OF quote_terms ON quote_links
      FOR EACH ROW EXECUTE FUNCTION quote_links_terms_fixed()`);
    await queryRunner.query(`
      ALTER TABLE quote_acceptances
        ADD COLUMN terms_shown jsonb CHECK (terms_shown IS NULL OR jsonb_typeof(terms_shown) = 'array')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE quote_acceptances DROP COLUMN terms_shown`);
    await queryRunner.query(`DROP TRIGGER quote_links_terms_fixed ON quote_links`);
    await queryRunner.query(`DROP FUNCTION quote_links_terms_fixed()`);
    await queryRunner.query(`ALTER TABLE quote_links DROP COLUMN quote_terms`);
    await queryRunner.query(`ALTER TABLE companies DROP COLUMN quote_terms`);
  }
}
