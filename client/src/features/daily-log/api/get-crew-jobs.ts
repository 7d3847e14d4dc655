import type { CrewView, JobListItem, JobStatus } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { addDays } from '../utils/dates';
import { withDeviceCopy } from './device-copy';
import { dailyLogKeys } from './keys';

/** How far ahead "coming up" looks, and how far back a late or long job is still found. */
export const AHEAD_DAYS = 14;
const BEHIND_DAYS = 30;

function getJobs(status: JobStatus, from: string, to: string): Promise<JobListItem[]> {
  const search = new URLSearchParams({ status, from, to });
  return api.get<JobListItem[]>(`/jobs?${search.toString()}`);
}

/** Jobs under way, and jobs scheduled, whose planned days touch the weeks around today. */
export async function getCrewJobs(today: string): Promise<JobListItem[]> {
  const from = addDays(today, -BEHIND_DAYS);
  const to = addDays(today, AHEAD_DAYS);
  const [underWay, scheduled] = await Promise.all([
    getJobs('in_progress', from, to),
    getJobs('scheduled', from, to),
  ]);
  const byId = new Map([...underWay, ...scheduled].map((job) => [job.id, job]));
  return [...byId.values()];
}

export const useCrewJobs = (today: string, userId: string) =>
  useQuery(
    queryOptions({
      queryKey: dailyLogKeys.crewJobs(today),
      queryFn: () => withDeviceCopy(userId, 'crew-jobs', () => getCrewJobs(today)),
    }),
  );

export const useCrews = (userId: string) =>
  useQuery(
    queryOptions({
      queryKey: dailyLogKeys.crews(),
      queryFn: () => withDeviceCopy(userId, 'crews', () => api.get<CrewView[]>('/crews')),
      staleTime: 10 * 60_000,
    }),
  );
