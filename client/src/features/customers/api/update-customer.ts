import type { CustomerDetail, UpdateCustomerInput } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customerQueryKey } from './get-customer';
import { customersQueryKey } from './get-customers';

export function updateCustomer(id: string, change: UpdateCustomerInput): Promise<CustomerDetail> {
  return api.patch<CustomerDetail>(`/customers/${encodeURIComponent(id)}`, change);
}

export function useUpdateCustomer(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: UpdateCustomerInput) => updateCustomer(id, change),
    onSuccess: (updated) => {
      queryClient.setQueryData(customerQueryKey(id), updated);
      return queryClient.invalidateQueries({ queryKey: customersQueryKey });
    },
  });
}
