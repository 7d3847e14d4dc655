import type { ChangeOrderView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export type SendChangeOrderInput = {
  jobId: string;
  orderId: string;
  /** Left out, the server writes to the homeowner who accepted the quote. */
  recipientEmail?: string;
};

/** E-mails the homeowner a link to accept or decline; sending again withdraws the earlier link. */
export function sendChangeOrder({
  jobId,
  orderId,
  recipientEmail,
}: SendChangeOrderInput): Promise<ChangeOrderView> {
  return api.post<ChangeOrderView>(
    `/jobs/${encodeURIComponent(jobId)}/change-orders/${encodeURIComponent(orderId)}/send`,
    recipientEmail ? { recipientEmail } : {},
  );
}

export function useSendChangeOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendChangeOrder,
    onSuccess: (order, { jobId }) => {
      queryClient.setQueryData<ChangeOrderView[]>(jobKeys.changeOrders(jobId), (orders) =>
        orders?.map((o) => (o.id === order.id ? order : o)),
      );
      return queryClient.invalidateQueries({ queryKey: jobKeys.changeOrders(jobId) });
    },
  });
}
