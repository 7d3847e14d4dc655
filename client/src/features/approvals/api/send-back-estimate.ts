import type { EstimateView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { approvalQueueQueryKey } from './get-approval-queue';

export type SendBackEstimateInput = { estimateId: string; comment: string };

export function sendBackEstimate({ estimateId, comment }: SendBackEstimateInput) {
  return api.post<EstimateView>(`/estimates/${encodeURIComponent(estimateId)}/send-back`, {
    comment,
  });
}

export function useSendBackEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendBackEstimate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: approvalQueueQueryKey }),
  });
}
