import type { InvoiceView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export type SendInvoiceInput = {
  jobId: string;
  /** Left out, the server writes to the homeowner who accepted the quote. */
  recipientEmail?: string;
};

/** Issues the final invoice, or sends it again with a new link (the earlier one stops working). */
export function sendInvoice({ jobId, recipientEmail }: SendInvoiceInput): Promise<InvoiceView> {
  return api.post<InvoiceView>(
    `/jobs/${encodeURIComponent(jobId)}/invoice`,
    recipientEmail ? { recipientEmail } : {},
  );
}

export function useSendInvoice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendInvoice,
    onSuccess: (invoice, { jobId }) => {
      queryClient.setQueryData(jobKeys.invoice(jobId), invoice);
    },
  });
}
