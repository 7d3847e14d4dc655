import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customersQueryKey } from './get-customers';

export function deleteSite(customerId: string, siteId: string): Promise<void> {
  return api.delete(
    `/customers/${encodeURIComponent(customerId)}/sites/${encodeURIComponent(siteId)}`,
  );
}

export function useDeleteSite(customerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (siteId: string) => deleteSite(customerId, siteId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersQueryKey }),
  });
}
