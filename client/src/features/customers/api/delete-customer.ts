import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customerQueryKey } from './get-customer';
import { customersQueryKey } from './get-customers';

export function deleteCustomer(id: string): Promise<void> {
  return api.delete(`/customers/${encodeURIComponent(id)}`);
}

export function useDeleteCustomer(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteCustomer(id),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: customerQueryKey(id) });
      return queryClient.invalidateQueries({ queryKey: customersQueryKey });
    },
  });
}
