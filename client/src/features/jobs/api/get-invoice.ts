import type { InvoiceView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';
import { jobKeys } from './get-jobs';

/** The job's final invoice, or null while none has been sent (the server answers 404). */
export async function getInvoice(jobId: string): Promise<InvoiceView | null> {
  try {
    return await api.get<InvoiceView>(`/jobs/${encodeURIComponent(jobId)}/invoice`);
  } catch (error) {
    if (isApiError(error, 404)) return null;
    throw error;
  }
}

export const getInvoiceQueryOptions = (jobId: string) =>
  queryOptions({ queryKey: jobKeys.invoice(jobId), queryFn: () => getInvoice(jobId) });

export const useInvoice = (jobId: string, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...getInvoiceQueryOptions(jobId), enabled });
