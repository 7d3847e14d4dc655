import type { ChangeOrderView, CreateChangeOrderRequest } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export type CreateChangeOrderInput = { jobId: string; request: CreateChangeOrderRequest };

/** Prices the change on the version in force and freezes it as the estimate's next version. */
export function createChangeOrder({
  jobId,
  request,
}: CreateChangeOrderInput): Promise<ChangeOrderView> {
  return api.post<ChangeOrderView>(`/jobs/${encodeURIComponent(jobId)}/change-orders`, request);
}

export function useCreateChangeOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createChangeOrder,
    onSuccess: (order, { jobId }) => {
      queryClient.setQueryData<ChangeOrderView[]>(jobKeys.changeOrders(jobId), (orders) =>
        orders ? [...orders.filter((o) => o.id !== order.id), order] : orders,
      );
      return queryClient.invalidateQueries({ queryKey: jobKeys.changeOrders(jobId) });
    },
  });
}
