import type { EstimateView } from '@pondwright/shared';
import { useEstimateQuote } from '../api/get-estimate-quote';
import { EstimateStatusBadge } from './estimate-status-badge';

/** The builder's status badge, with "Deposit paid" once the quote's deposit is in. */
export function EstimateHeaderStatus({
  estimate,
}: {
  estimate: Pick<EstimateView, 'id' | 'status'>;
}) {
  const quote = useEstimateQuote(estimate.id, estimate.status);
  return (
    <EstimateStatusBadge
      status={estimate.status}
      depositPaid={quote.data?.payment?.status === 'paid'}
    />
  );
}
