import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PricedTakeoff } from '../types';
import { pricedTakeoffKeys } from './get-priced-takeoffs';

/** Prices the saved takeoff again with the company's latest price-book version. */
export function repricePricedTakeoff(id: string): Promise<PricedTakeoff> {
  return api.post<PricedTakeoff>(`/priced-takeoffs/${encodeURIComponent(id)}/reprice`);
}

export function useRepricePricedTakeoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: repricePricedTakeoff,
    onSuccess: (updated) => {
      queryClient.setQueryData(pricedTakeoffKeys.detail(updated.id), updated);
      return queryClient.invalidateQueries({ queryKey: pricedTakeoffKeys.all });
    },
  });
}
