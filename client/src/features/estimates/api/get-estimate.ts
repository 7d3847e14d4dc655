import type { EstimateView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export function getEstimate(id: string): Promise<EstimateView> {
  return api.get<EstimateView>(`/estimates/${encodeURIComponent(id)}`);
}

export const getEstimateQueryOptions = (id: string) =>
  queryOptions({ queryKey: estimateKeys.detail(id), queryFn: () => getEstimate(id) });

export const useEstimate = (id: string) => useQuery(getEstimateQueryOptions(id));
