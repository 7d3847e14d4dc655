import type { JobView, rescheduleJobRequestSchema } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export type RescheduleJobRequest = z.output<typeof rescheduleJobRequestSchema>;
export type RescheduleJobInput = { id: string; request: RescheduleJobRequest };

/** Moves the job to a new start (and crew); the server keeps every move in `scheduleChanges`. */
export function rescheduleJob({ id, request }: RescheduleJobInput): Promise<JobView> {
  return api.post<JobView>(`/jobs/${encodeURIComponent(id)}/schedule`, request);
}

export function useRescheduleJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: rescheduleJob,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      // The lists and the week calendar show the planned days too.
      return queryClient.invalidateQueries({ queryKey: [...jobKeys.all, 'list'] });
    },
  });
}
