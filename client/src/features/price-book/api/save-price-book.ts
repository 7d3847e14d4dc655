import type { PriceBook } from '@pondwright/shared/pricing';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersion } from '../types';
import { priceBookKeys } from './get-price-book';

export type SavePriceBookInput = { book: PriceBook; effectiveDate?: string; note?: string };

/**
 * Owners only. Saves the whole book as a new version; a 400 names each bad field by its
 * path in the request, e.g. `book.materials.3.unitCost`.
 */
export function savePriceBook(input: SavePriceBookInput): Promise<PriceBookVersion> {
  return api.put<PriceBookVersion>('/price-book', input);
}

export function useSavePriceBook() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePriceBook,
    onSuccess: (saved) => {
      // A version dated in the future waits; the book in effect today stays the current one.
      if (saved?.book && (saved.status ?? 'current') === 'current') {
        queryClient.setQueryData(priceBookKeys.current(), saved);
      }
      return queryClient.invalidateQueries({ queryKey: priceBookKeys.all });
    },
  });
}
