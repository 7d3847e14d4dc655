import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PricedTakeoff } from '../types';
import { pricedTakeoffKeys } from './get-priced-takeoffs';

export type CreatePricedTakeoffInput = { name: string; input: unknown };

/** Saves a takeoff and prices it with the current book; 404 when the company has no book yet. */
export function createPricedTakeoff(body: CreatePricedTakeoffInput): Promise<PricedTakeoff> {
  return api.post<PricedTakeoff>('/priced-takeoffs', body);
}

export function useCreatePricedTakeoff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPricedTakeoff,
    onSuccess: (created) => {
      queryClient.setQueryData(pricedTakeoffKeys.detail(created.id), created);
      return queryClient.invalidateQueries({ queryKey: pricedTakeoffKeys.list() });
    },
  });
}
