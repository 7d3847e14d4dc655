import { DEFAULT_QUOTE_TERMS } from '@pondwright/shared';
import type { EntityManager } from 'typeorm';
import type { Company } from '../companies/entities/company.entity';
import { QuoteLink } from './entities/quote-link.entity';

/** The terms a quote sent today gets: the owner's, or the built-in default while they wrote none. */
export function currentQuoteTerms(company: Pick<Company, 'quoteTerms'>): string {
  return company.quoteTerms ?? DEFAULT_QUOTE_TERMS;
}

/**
 * The company terms a link shows: the copy frozen into it when it was sent. A change-order or invoice
 * link carries none: it shows the terms of the quote the homeowner accepted (through `acceptedLinkId`).
 * The built-in default only where nothing was recorded (demo data).
 */
export async function termsOfLink(
  manager: EntityManager,
  link: Pick<QuoteLink, 'quoteTerms'>,
  acceptedLinkId: string | null,
): Promise<string> {
  if (link.quoteTerms !== null && link.quoteTerms !== undefined) return link.quoteTerms;
  if (acceptedLinkId) {
    const accepted = await manager.findOne(QuoteLink, {
      where: { id: acceptedLinkId },
      select: { id: true, quoteTerms: true },
    });
    if (accepted?.quoteTerms) return accepted.quoteTerms;
  }
  return DEFAULT_QUOTE_TERMS;
}
