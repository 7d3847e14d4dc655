import type { EstimateView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { approvalQueueQueryKey } from './get-approval-queue';

export function approveEstimate(estimateId: string): Promise<EstimateView> {
  return api.post<EstimateView>(`/estimates/${encodeURIComponent(estimateId)}/approve`);
}

export function useApproveEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: approveEstimate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: approvalQueueQueryKey }),
  });
}
