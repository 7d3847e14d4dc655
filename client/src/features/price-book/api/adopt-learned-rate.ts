import type { LearnedRate } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersion } from '../types';
import { priceBookKeys } from './get-price-book';

export type AdoptLearnedRateInput = { parameter: LearnedRate['parameter'] };

/** Owners only: a new price-book version, effective today, carrying the crew's learned rate. */
export function adoptLearnedRate({ parameter }: AdoptLearnedRateInput): Promise<PriceBookVersion> {
  return api.post<PriceBookVersion>('/learned-rates/adopt', { parameter });
}

export function useAdoptLearnedRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: adoptLearnedRate,
    // The book, its versions and the learned rates (whose book side changed) all load again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: priceBookKeys.all }),
  });
}
