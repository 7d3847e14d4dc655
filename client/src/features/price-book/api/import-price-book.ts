import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersion } from '../types';
import { priceBookKeys } from './get-price-book';

export type ImportPriceBookInput = { csv: string; effectiveDate?: string; note?: string };

/**
 * Owners only. Replaces the book with the CSV's rows as a new version; a 400 lists every bad
 * row with its line and column, and then nothing is imported.
 */
export function importPriceBook(input: ImportPriceBookInput): Promise<PriceBookVersion> {
  return api.post<PriceBookVersion>('/price-book/import', input);
}

export function useImportPriceBook() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importPriceBook,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: priceBookKeys.all }),
  });
}
