import type { CreateSiteInput, SiteView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { customersQueryKey } from './get-customers';

const sitesPath = (customerId: string) => `/customers/${encodeURIComponent(customerId)}/sites`;

/** Adds a site, or replaces the given fields of an existing one when `siteId` is set. */
export function saveSite(
  customerId: string,
  siteId: string | null,
  input: CreateSiteInput,
): Promise<SiteView> {
  return siteId
    ? api.patch<SiteView>(`${sitesPath(customerId)}/${encodeURIComponent(siteId)}`, input)
    : api.post<SiteView>(sitesPath(customerId), input);
}

export function useSaveSite(customerId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ siteId, input }: { siteId: string | null; input: CreateSiteInput }) =>
      saveSite(customerId, siteId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: customersQueryKey }),
  });
}
