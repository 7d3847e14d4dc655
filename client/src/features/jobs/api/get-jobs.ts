import type { JobListItem, JobStatus } from '@pondwright/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const jobKeys = {
  all: ['jobs'] as const,
  list: (params: JobListParams) => [...jobKeys.all, 'list', params] as const,
  detail: (id: string) => [...jobKeys.all, 'detail', id] as const,
  /** Under the job's detail key, so refreshing the job (after logs or a move) refreshes its report. */
  report: (id: string) => [...jobKeys.all, 'detail', id, 'report'] as const,
  // Beside the detail key, not under it: refreshing the job after an accepted change must not
  // refetch the change orders that asked for it, nor every photo.
  changeOrders: (id: string) => [...jobKeys.all, 'change-orders', id] as const,
  invoice: (id: string) => [...jobKeys.all, 'invoice', id] as const,
  photos: (id: string) => [...jobKeys.all, 'photos', id] as const,
  /** One photo's image or thumbnail bytes, by its API path; they never change under that path. */
  photoImage: (path: string) => [...jobKeys.all, 'photo-image', path] as const,
};

export type JobListParams = {
  status?: JobStatus | null;
  /** First and last day (YYYY-MM-DD) the jobs' planned days must overlap. */
  from?: string;
  to?: string;
  crewId?: string | null;
};

export function getJobs(params: JobListParams = {}): Promise<JobListItem[]> {
  const search = new URLSearchParams();
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  if (params.status) search.set('status', params.status);
  if (params.crewId) search.set('crewId', params.crewId);
  const query = search.toString();
  return api.get<JobListItem[]>(query ? `/jobs?${query}` : '/jobs');
}

export const getJobsQueryOptions = (params: JobListParams = {}) =>
  queryOptions({
    queryKey: jobKeys.list(params),
    queryFn: () => getJobs(params),
    // Keeps the last week on screen while the next one loads, so the calendar does not blink.
    placeholderData: keepPreviousData,
  });

export const useJobs = (params: JobListParams = {}) => useQuery(getJobsQueryOptions(params));
