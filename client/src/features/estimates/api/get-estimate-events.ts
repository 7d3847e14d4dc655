import type { EstimateEventView } from '@pondwright/shared';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export function getEstimateEvents(id: string): Promise<EstimateEventView[]> {
  return api.get<EstimateEventView[]>(`/estimates/${encodeURIComponent(id)}/events`);
}

/**
 * The whole audit log, asked for only when someone wants the entries older than the estimate's view
 * carries. Under the estimate's detail key, so a save that refreshes the estimate refreshes this too.
 */
export const useEstimateEvents = (id: string, enabled: boolean) =>
  useQuery({
    queryKey: [...estimateKeys.detail(id), 'events'] as const,
    queryFn: () => getEstimateEvents(id),
    enabled,
  });
