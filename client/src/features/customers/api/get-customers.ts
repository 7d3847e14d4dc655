import type { CustomerPage, CustomerSort, SortOrder } from '@pondwright/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const customersQueryKey = ['customers'] as const;

export type CustomerListParams = {
  q: string;
  sort: CustomerSort;
  order: SortOrder;
  page: number;
  pageSize: number;
};

export function getCustomers(params: CustomerListParams): Promise<CustomerPage> {
  const search = new URLSearchParams({
    sort: params.sort,
    order: params.order,
    page: String(params.page),
    pageSize: String(params.pageSize),
  });
  if (params.q.trim()) search.set('q', params.q.trim());
  return api.get<CustomerPage>(`/customers?${search.toString()}`);
}

export const getCustomersQueryOptions = (params: CustomerListParams) =>
  queryOptions({
    queryKey: [...customersQueryKey, 'list', params],
    queryFn: () => getCustomers(params),
    // The old page stays on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });

export const useCustomers = (params: CustomerListParams) =>
  useQuery(getCustomersQueryOptions(params));
