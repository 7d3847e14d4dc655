import type { CreateCustomerInput, CustomerDetail } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customersQueryKey } from './get-customers';

export function createCustomer(input: CreateCustomerInput): Promise<CustomerDetail> {
  return api.post<CustomerDetail>('/customers', input);
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersQueryKey }),
  });
}
