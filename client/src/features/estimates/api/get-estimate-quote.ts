import type { EstimateQuoteStatus, EstimateStatus } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

/** The statuses in which an estimate has (or may be given) a quote for the homeowner. */
export const QUOTE_STATUSES: readonly EstimateStatus[] = [
  'approved',
  'sent',
  'viewed',
  'accepted',
  'declined',
  'expired',
];

/** The statuses from which the latest version may be sent (again). */
export const SENDABLE_STATUSES: readonly EstimateStatus[] = [
  'approved',
  'sent',
  'viewed',
  'declined',
  'expired',
];

export const hasQuote = (status: EstimateStatus) => QUOTE_STATUSES.includes(status);

/** Links (never their tokens), the acceptance, the decline and the deposit. */
export function getEstimateQuote(id: string): Promise<EstimateQuoteStatus> {
  return api.get<EstimateQuoteStatus>(`/estimates/${encodeURIComponent(id)}/quote`);
}

export const getEstimateQuoteQueryOptions = (id: string) =>
  queryOptions({ queryKey: estimateKeys.quote(id), queryFn: () => getEstimateQuote(id) });

/** Only asked for when the estimate's status can have a quote. */
export const useEstimateQuote = (id: string, status: EstimateStatus) =>
  useQuery({ ...getEstimateQuoteQueryOptions(id), enabled: hasQuote(status) });
