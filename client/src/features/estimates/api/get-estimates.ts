import type { EstimateListPage, EstimateStatus } from '@pondwright/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const estimateKeys = {
  all: ['estimates'] as const,
  list: (params: EstimateListParams) => [...estimateKeys.all, 'list', params] as const,
  detail: (id: string) => [...estimateKeys.all, 'detail', id] as const,
  comparison: (id: string, a: number, b: number) =>
    [...estimateKeys.all, 'detail', id, 'compare', a, b] as const,
  /** Under the estimate's detail key, so refreshing the estimate refreshes its quote too. */
  quote: (id: string) => [...estimateKeys.all, 'detail', id, 'quote'] as const,
};

export type EstimateListParams = {
  status: EstimateStatus | null;
  q: string;
  page: number;
  pageSize: number;
};

export function getEstimates(params: EstimateListParams): Promise<EstimateListPage> {
  const search = new URLSearchParams({
    page: String(params.page),
    pageSize: String(params.pageSize),
  });
  if (params.status) search.set('status', params.status);
  if (params.q.trim()) search.set('q', params.q.trim());
  return api.get<EstimateListPage>(`/estimates?${search.toString()}`);
}

export const getEstimatesQueryOptions = (params: EstimateListParams) =>
  queryOptions({
    queryKey: estimateKeys.list(params),
    queryFn: () => getEstimates(params),
    placeholderData: keepPreviousData,
  });

export const useEstimates = (params: EstimateListParams) =>
  useQuery(getEstimatesQueryOptions(params));
