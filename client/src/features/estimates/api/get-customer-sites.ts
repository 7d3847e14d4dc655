import type { CustomerDetail } from '@pondwright/shared';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

/** One customer's sites, for the optional site picker. */
export function getCustomerSites(customerId: string): Promise<CustomerDetail> {
  return api.get<CustomerDetail>(`/customers/${encodeURIComponent(customerId)}`);
}

export const useCustomerSites = (customerId: string | null) =>
  useQuery({
    queryKey: [...estimateKeys.all, 'customer-sites', customerId],
    queryFn: () => getCustomerSites(customerId ?? ''),
    enabled: customerId !== null,
  });
