import type { EstimateStatus } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/estimate-stats`: money and percentages are decimal strings, as the server sends them. */
export type EstimateStats = {
  byStatus: Array<{ status: EstimateStatus; count: number; value: string }>;
  winRatePct: string | null;
  averageMarginPct: string | null;
  currency: string | null;
};

export const estimateStatsQueryKey = ['estimate-stats'] as const;

export function getEstimateStats(): Promise<EstimateStats> {
  return api.get<EstimateStats>('/estimate-stats');
}

export const getEstimateStatsQueryOptions = () =>
  queryOptions({ queryKey: estimateStatsQueryKey, queryFn: getEstimateStats });

export const useEstimateStats = () => useQuery(getEstimateStatsQueryOptions());
