import { describe, expect, it } from 'vitest';
import {
  DEFAULT_QUOTE_TERMS,
  QUOTE_TERMS_MAX_LENGTH,
  quoteTermsParagraphs,
  updateQuoteTermsSchema,
} from './quote-terms';

const messages = (value: unknown) => {
  const result = updateQuoteTermsSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((issue) => issue.message);
};

describe('updateQuoteTermsSchema', () => {
  it('keeps the text, trimmed, with Windows line breaks made plain', () => {
    expect(
      updateQuoteTermsSchema.parse({ terms: '  Net 14 days.\r\n\r\nPermits by us.  ' }),
    ).toEqual({
      terms: 'Net 14 days.\n\nPermits by us.',
    });
  });

  it('takes null as "use the default terms"', () => {
    expect(updateQuoteTermsSchema.parse({ terms: null })).toEqual({ terms: null });
  });

  it('allows exactly the limit and refuses one character more, saying how many', () => {
    expect(messages({ terms: 'a'.repeat(QUOTE_TERMS_MAX_LENGTH) })).toEqual([]);
    expect(messages({ terms: 'a'.repeat(QUOTE_TERMS_MAX_LENGTH + 1) })).toEqual([
      'Use at most 4,000 characters',
    ]);
  });

  it('refuses empty terms, control characters and unknown fields', () => {
    expect(messages({ terms: ' \n ' })).toEqual(['Write your terms, or restore the default terms']);
    expect(messages({ terms: 'Net 14\u0000 days' })).toEqual([
      'Use plain text without control characters',
    ]);
    expect(messages({ terms: 'Net 14 days', html: '<b>' })).toHaveLength(1);
  });
});

describe('quoteTermsParagraphs', () => {
  it('splits at blank lines and keeps single line breaks inside a paragraph', () => {
    expect(
      quoteTermsParagraphs('Payment:\n- 30 % deposit\n- balance\n \n\n\nWarranty: 2 years.\n'),
    ).toEqual(['Payment:\n- 30 % deposit\n- balance', 'Warranty: 2 years.']);
  });

  it('gives the default terms as their three sentences', () => {
    expect(quoteTermsParagraphs(DEFAULT_QUOTE_TERMS)).toHaveLength(3);
  });
});
