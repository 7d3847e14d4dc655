import type { EstimateComparison } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export function compareEstimateVersions(
  id: string,
  a: number,
  b: number,
): Promise<EstimateComparison> {
  const search = new URLSearchParams({ a: String(a), b: String(b) });
  return api.get<EstimateComparison>(
    `/estimates/${encodeURIComponent(id)}/compare?${search.toString()}`,
  );
}

export const compareEstimateVersionsQueryOptions = (id: string, a: number, b: number) =>
  queryOptions({
    queryKey: estimateKeys.comparison(id, a, b),
    queryFn: () => compareEstimateVersions(id, a, b),
  });

/** Versions are immutable, so a comparison once loaded never goes stale. */
export const useEstimateComparison = (id: string, pair: { a: number; b: number } | null) =>
  useQuery({
    ...compareEstimateVersionsQueryOptions(id, pair?.a ?? 0, pair?.b ?? 0),
    enabled: pair !== null,
    staleTime: Infinity,
  });
