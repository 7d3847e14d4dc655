import type { CustomerPage } from '@pondwright/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

/** Customers for the estimate's customer picker; the customers feature owns the full list. */
export function searchCustomers(q: string): Promise<CustomerPage> {
  const search = new URLSearchParams({ page: '1', pageSize: '10', sort: 'name', order: 'asc' });
  if (q.trim()) search.set('q', q.trim());
  return api.get<CustomerPage>(`/customers?${search.toString()}`);
}

export const searchCustomersQueryOptions = (q: string) =>
  queryOptions({
    queryKey: [...estimateKeys.all, 'customer-picker', q.trim()],
    queryFn: () => searchCustomers(q),
    placeholderData: keepPreviousData,
  });

export const useCustomerSearch = (q: string) => useQuery(searchCustomersQueryOptions(q));
