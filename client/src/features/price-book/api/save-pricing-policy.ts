import type { PricingPolicy } from '@pondwright/shared/pricing';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersion } from '../types';
import { priceBookKeys } from './get-price-book';

export type SavePricingPolicyInput = { policy: PricingPolicy; note?: string };

/** Owners only; a changed policy is a new version of the book. */
export function savePricingPolicy(input: SavePricingPolicyInput): Promise<PriceBookVersion> {
  return api.put<PriceBookVersion>('/price-book/policy', input);
}

export function useSavePricingPolicy() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePricingPolicy,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: priceBookKeys.all }),
  });
}
