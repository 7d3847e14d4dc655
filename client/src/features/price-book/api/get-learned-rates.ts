import type { LearnedRate } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { priceBookKeys } from './get-price-book';

/** Under the price book's key: a new version changes the book's side of every row. */
export const learnedRatesQueryKey = [...priceBookKeys.all, 'learned-rates'] as const;

/** Each production rate in the book beside what the crews achieved on closed jobs. */
export function getLearnedRates(): Promise<LearnedRate[]> {
  return api.get<LearnedRate[]>('/learned-rates');
}

export const getLearnedRatesQueryOptions = () =>
  queryOptions({ queryKey: learnedRatesQueryKey, queryFn: getLearnedRates });

export const useLearnedRates = () => useQuery(getLearnedRatesQueryOptions());
