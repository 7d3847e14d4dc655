import type { CompanyProfile } from '@pondwright/shared';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, apiDownload } from '@/lib/api-client';
import { companyQueryKey } from './get-company';

/** Under the company's key, so refreshing the company refreshes the logo too. */
export const companyLogoQueryKey = [...companyQueryKey, 'logo'] as const;

/** What the server accepts: a PNG or JPEG of at most 512 KB. */
export const LOGO_TYPES = ['image/png', 'image/jpeg'] as const;
export const LOGO_MAX_BYTES = 512 * 1024;

/** The logo as a Blob: an <img> cannot send the bearer token, so it is fetched and shown by object URL. */
export async function getCompanyLogo(): Promise<Blob> {
  const { blob } = await apiDownload('/company/logo', LOGO_TYPES.join(', '));
  return blob;
}

export const useCompanyLogo = (enabled: boolean) =>
  useQuery({ queryKey: companyLogoQueryKey, queryFn: getCompanyLogo, enabled });

/** Owners only: multipart, one field `logo`. */
export function uploadCompanyLogo(file: File): Promise<unknown> {
  const body = new FormData();
  body.append('logo', file);
  return api.put<unknown>('/company/logo', body);
}

export function removeCompanyLogo(): Promise<void> {
  return api.delete('/company/logo');
}

function isCompanyProfile(value: unknown): value is CompanyProfile {
  return typeof value === 'object' && value !== null && 'hasLogo' in value && 'name' in value;
}

export function useUploadCompanyLogo() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadCompanyLogo,
    onSuccess: (answer) => {
      if (isCompanyProfile(answer)) queryClient.setQueryData(companyQueryKey, answer);
      return queryClient.invalidateQueries({ queryKey: companyQueryKey });
    },
  });
}

export function useRemoveCompanyLogo() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeCompanyLogo,
    onSuccess: () => {
      queryClient.setQueryData<CompanyProfile>(companyQueryKey, (company) =>
        company ? { ...company, hasLogo: false } : company,
      );
      queryClient.removeQueries({ queryKey: companyLogoQueryKey });
      return queryClient.invalidateQueries({ queryKey: companyQueryKey });
    },
  });
}
