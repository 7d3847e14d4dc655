import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PriceBookVersionSummary } from '../types';
import { priceBookKeys } from './get-price-book';

/** Every version of the book, newest first. */
export function getPriceBookVersions(): Promise<PriceBookVersionSummary[]> {
  return api.get<PriceBookVersionSummary[]>('/price-book/versions');
}

export const getPriceBookVersionsQueryOptions = () =>
  queryOptions({ queryKey: priceBookKeys.versions(), queryFn: getPriceBookVersions });

export const usePriceBookVersions = () => useQuery(getPriceBookVersionsQueryOptions());
