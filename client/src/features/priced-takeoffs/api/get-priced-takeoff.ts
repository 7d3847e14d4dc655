import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PricedTakeoff } from '../types';
import { pricedTakeoffKeys } from './get-priced-takeoffs';

export function getPricedTakeoff(id: string): Promise<PricedTakeoff> {
  return api.get<PricedTakeoff>(`/priced-takeoffs/${encodeURIComponent(id)}`);
}

export const getPricedTakeoffQueryOptions = (id: string) =>
  queryOptions({ queryKey: pricedTakeoffKeys.detail(id), queryFn: () => getPricedTakeoff(id) });

export const usePricedTakeoff = (id: string) => useQuery(getPricedTakeoffQueryOptions(id));
