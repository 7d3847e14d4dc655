import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { RepricePreview } from '../types';
import { pricedTakeoffKeys } from './get-priced-takeoffs';

/** What pricing the takeoff again with the latest book would change; nothing is saved. */
export function getRepricePreview(id: string): Promise<RepricePreview> {
  return api.get<RepricePreview>(`/priced-takeoffs/${encodeURIComponent(id)}/reprice-preview`);
}

export const getRepricePreviewQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pricedTakeoffKeys.preview(id),
    queryFn: () => getRepricePreview(id),
    // The book may change at any moment; a preview is asked for when it is wanted.
    staleTime: 0,
  });

export const useRepricePreview = (id: string, enabled: boolean) =>
  useQuery({ ...getRepricePreviewQueryOptions(id), enabled });
