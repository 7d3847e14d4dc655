import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PricedTakeoffSummary } from '../types';

export const pricedTakeoffKeys = {
  all: ['priced-takeoffs'] as const,
  list: () => [...pricedTakeoffKeys.all, 'list'] as const,
  detail: (id: string) => [...pricedTakeoffKeys.all, 'detail', id] as const,
  preview: (id: string) => [...pricedTakeoffKeys.all, 'detail', id, 'reprice-preview'] as const,
};

export function getPricedTakeoffs(): Promise<PricedTakeoffSummary[]> {
  return api.get<PricedTakeoffSummary[]>('/priced-takeoffs');
}

export const getPricedTakeoffsQueryOptions = () =>
  queryOptions({ queryKey: pricedTakeoffKeys.list(), queryFn: getPricedTakeoffs });

export const usePricedTakeoffs = () => useQuery(getPricedTakeoffsQueryOptions());
