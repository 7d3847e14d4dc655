import type { JobView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export type NextJobStatus = 'in_progress' | 'completed' | 'closed';
export type SetJobStatusInput = { id: string; status: NextJobStatus };

export function setJobStatus({ id, status }: SetJobStatusInput): Promise<JobView> {
  return api.post<JobView>(`/jobs/${encodeURIComponent(id)}/status`, { status });
}

export function useSetJobStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setJobStatus,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      return queryClient.invalidateQueries({ queryKey: [...jobKeys.all, 'list'] });
    },
  });
}
