import { z } from 'zod';

/**
 * The company's own quote terms: plain text, paragraphs split by blank lines, shown under "Terms" on
 * every quote sent after they are saved. The price validity date, the deposit and the sales tax come
 * from the quote itself and are always listed first; these terms follow them.
 */

/** The most characters (UTF-16 code units, as a text box counts them) the terms may have. */
export const QUOTE_TERMS_MAX_LENGTH = 4000;

/** The terms a company uses until its owner writes its own (and after "Restore the default terms"). */
export const DEFAULT_QUOTE_TERMS = [
  'Changes to the work after acceptance are agreed in writing, with their price, before they are made.',
  'Buried obstructions we could not see when measuring (ledge rock, old footings, large roots) are priced as a change if they add work.',
  'Plants and fish are not included unless they are listed.',
].join('\n\n');

/** Control characters other than tab and line breaks: invisible in a text box, refused by PostgreSQL (NUL). */
function hasControlCharacters(text: string): boolean {
  for (const character of text) {
    const code = character.charCodeAt(0);
    if ((code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0d) || code === 0x7f) {
      return true;
    }
  }
  return false;
}

/** The terms as the owner writes them: line breaks normalised to `\n`, trimmed, 1 to 4,000 characters. */
export const quoteTermsTextSchema = z
  .string({ error: 'Write your terms, or restore the default terms' })
  .transform((text) => text.replace(/\r\n?/g, '\n'))
  .pipe(
    z
      .string()
      .trim()
      .min(1, 'Write your terms, or restore the default terms')
      .max(
        QUOTE_TERMS_MAX_LENGTH,
        `Use at most ${QUOTE_TERMS_MAX_LENGTH.toLocaleString('en-US')} characters`,
      )
      .refine((text) => !hasControlCharacters(text), 'Use plain text without control characters'),
  );

/** `PUT /api/company/quote-terms` (owner): the company's terms, or null for the built-in default. */
export const updateQuoteTermsSchema = z.object({ terms: quoteTermsTextSchema.nullable() }).strict();
export type UpdateQuoteTermsInput = z.input<typeof updateQuoteTermsSchema>;

/** `GET /api/company/quote-terms`: the terms new quotes are sent with. */
export type CompanyQuoteTerms = {
  terms: string;
  /** True while the company uses the built-in default (`DEFAULT_QUOTE_TERMS`). */
  isDefault: boolean;
};

/** The terms as paragraphs: split at blank lines, each trimmed, empty ones dropped. */
export function quoteTermsParagraphs(text: string): string[] {
  return text
    .replace(/\r\n?/g, '\n')
    .split(/\n[^\S\n]*\n/)
    .map((paragraph) => paragraph.trim())
    .filter((paragraph) => paragraph !== '');
}
