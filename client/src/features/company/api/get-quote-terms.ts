import type { CompanyQuoteTerms } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { companyQueryKey } from './get-company';

/** Under the company's key, so refreshing the company refreshes the terms too. */
export const quoteTermsQueryKey = [...companyQueryKey, 'quote-terms'] as const;

/** The terms new quotes are sent with: the owner's own, or the built-in default. */
export function getQuoteTerms(): Promise<CompanyQuoteTerms> {
  return api.get<CompanyQuoteTerms>('/company/quote-terms');
}

export const getQuoteTermsQueryOptions = () =>
  queryOptions({ queryKey: quoteTermsQueryKey, queryFn: getQuoteTerms });

export const useQuoteTerms = () => useQuery(getQuoteTermsQueryOptions());
