import type { CompanyQuoteTerms, UpdateQuoteTermsInput } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { quoteTermsQueryKey } from './get-quote-terms';

/** Owners only; `terms: null` goes back to the built-in default. A 400 names the field in `details`. */
export function updateQuoteTerms(change: UpdateQuoteTermsInput): Promise<CompanyQuoteTerms> {
  return api.put<CompanyQuoteTerms>('/company/quote-terms', change);
}

export function useUpdateQuoteTerms() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateQuoteTerms,
    onSuccess: (updated) => {
      queryClient.setQueryData<CompanyQuoteTerms>(quoteTermsQueryKey, updated);
      return queryClient.invalidateQueries({ queryKey: quoteTermsQueryKey });
    },
  });
}
