import type { CreateEstimateRequest, EstimateView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

/** Starts an estimate for a customer; the server seeds the draft with a typical pond when no input is sent. */
export function createEstimate(body: CreateEstimateRequest): Promise<EstimateView> {
  return api.post<EstimateView>('/estimates', body);
}

export function useCreateEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEstimate,
    onSuccess: (created) => {
      queryClient.setQueryData(estimateKeys.detail(created.id), created);
      return queryClient.invalidateQueries({ queryKey: [...estimateKeys.all, 'list'] });
    },
  });
}
