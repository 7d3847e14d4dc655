import type { CustomerDetail } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customersQueryKey } from './get-customers';

export const customerQueryKey = (id: string) => [...customersQueryKey, 'detail', id] as const;

export function getCustomer(id: string): Promise<CustomerDetail> {
  return api.get<CustomerDetail>(`/customers/${encodeURIComponent(id)}`);
}

export const getCustomerQueryOptions = (id: string) =>
  queryOptions({ queryKey: customerQueryKey(id), queryFn: () => getCustomer(id) });

export const useCustomer = (id: string) => useQuery(getCustomerQueryOptions(id));
