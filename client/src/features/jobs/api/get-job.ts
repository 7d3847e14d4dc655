import type { JobView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export function getJob(id: string): Promise<JobView> {
  return api.get<JobView>(`/jobs/${encodeURIComponent(id)}`);
}

export const getJobQueryOptions = (id: string) =>
  queryOptions({ queryKey: jobKeys.detail(id), queryFn: () => getJob(id) });

export const useJob = (id: string) => useQuery(getJobQueryOptions(id));
