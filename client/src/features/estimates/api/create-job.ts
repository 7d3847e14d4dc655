import type { createJobRequestSchema, EstimateView, JobView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export type CreateJobRequest = z.output<typeof createJobRequestSchema>;

/** Makes the job of an accepted estimate; the server fixes its budget from the accepted version. */
export function createJob(request: CreateJobRequest): Promise<JobView> {
  return api.post<JobView>('/jobs', request);
}

export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    onSuccess: (job, { estimateId }) => {
      queryClient.setQueryData<EstimateView>(estimateKeys.detail(estimateId), (estimate) =>
        estimate ? { ...estimate, jobId: job.id } : estimate,
      );
      // The jobs pages (another feature) list under this key; they pick up the new job.
      return queryClient.invalidateQueries({ queryKey: ['jobs'] });
    },
  });
}
