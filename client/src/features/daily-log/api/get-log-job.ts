import type { DailyLogView, JobView } from '@pondwright/shared';
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { toCrewJob } from '../utils/crew-budget';
import { withDeviceCopy, type Copied } from './device-copy';
import { dailyLogKeys } from './keys';

export async function getLogJob(jobId: string): Promise<JobView> {
  return toCrewJob(await api.get<JobView>(`/jobs/${encodeURIComponent(jobId)}`));
}

export const getLogJobQueryOptions = (jobId: string, userId: string) =>
  queryOptions({
    queryKey: dailyLogKeys.job(jobId),
    queryFn: () => withDeviceCopy(userId, `job.${jobId}`, () => getLogJob(jobId)),
  });

export const useLogJob = (jobId: string, userId: string) =>
  useQuery(getLogJobQueryOptions(jobId, userId));

/** A log the server has just stored takes its place in the job's cached logs, by date. */
export function putLogInCache(queryClient: QueryClient, log: DailyLogView): void {
  queryClient.setQueryData<Copied<JobView>>(dailyLogKeys.job(log.jobId), (old) => {
    if (!old) return old;
    const logs = [...old.data.logs.filter((other) => other.id !== log.id), log].sort((a, b) =>
      a.logDate.localeCompare(b.logDate),
    );
    return { ...old, data: { ...old.data, logs } };
  });
  // The office's job page (features/jobs, key `['jobs', 'detail', id]`) shows the logs and the cost
  // report; it reloads them rather than showing the day without this save.
  void queryClient.invalidateQueries({ queryKey: ['jobs', 'detail', log.jobId] });
}
