import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookChange } from '@pondwright/shared/pricing';
import { priceBookKeys } from './get-price-book';

/** What a version changed from the one before it. */
export function getPriceBookVersionChanges(id: string): Promise<PriceBookChange[]> {
  return api.get<PriceBookChange[]>(`/price-book/versions/${encodeURIComponent(id)}/changes`);
}

export const getPriceBookVersionChangesQueryOptions = (id: string) =>
  queryOptions({
    queryKey: priceBookKeys.changes(id),
    queryFn: () => getPriceBookVersionChanges(id),
  });

export const usePriceBookVersionChanges = (id: string) =>
  useQuery(getPriceBookVersionChangesQueryOptions(id));
