import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersion } from '../types';

/** Every price-book query starts with this key, so one invalidation refreshes them all. */
export const priceBookKeys = {
  all: ['price-book'] as const,
  current: () => [...priceBookKeys.all, 'current'] as const,
  versions: () => [...priceBookKeys.all, 'versions'] as const,
  version: (id: string) => [...priceBookKeys.versions(), id] as const,
  changes: (id: string) => [...priceBookKeys.versions(), id, 'changes'] as const,
  policy: () => [...priceBookKeys.all, 'policy'] as const,
};

/** The company's current price book; a 404 means none has been set up yet. */
export function getPriceBook(): Promise<PriceBookVersion> {
  return api.get<PriceBookVersion>('/price-book');
}

export const getPriceBookQueryOptions = () =>
  queryOptions({ queryKey: priceBookKeys.current(), queryFn: getPriceBook });

export const usePriceBook = () => useQuery(getPriceBookQueryOptions());
