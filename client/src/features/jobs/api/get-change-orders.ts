import type { ChangeOrderView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export function getChangeOrders(jobId: string): Promise<ChangeOrderView[]> {
  return api.get<ChangeOrderView[]>(`/jobs/${encodeURIComponent(jobId)}/change-orders`);
}

export const getChangeOrdersQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: jobKeys.changeOrders(jobId),
    queryFn: () => getChangeOrders(jobId),
    // The homeowner answers from the e-mail, outside the app; a shorter wait shows it sooner.
    staleTime: 10_000,
  });

export const useChangeOrders = (jobId: string) => useQuery(getChangeOrdersQueryOptions(jobId));
