import type { CompanyProfile, UpdateCompanyInput } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { companyQueryKey } from './get-company';

/** Owners only; a 400 carries one message per field in `details`. */
export function updateCompany(change: UpdateCompanyInput): Promise<CompanyProfile> {
  return api.patch<CompanyProfile>('/company', change);
}

export function useUpdateCompany() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCompany,
    onSuccess: (updated) => {
      queryClient.setQueryData<CompanyProfile>(companyQueryKey, updated);
      return queryClient.invalidateQueries({ queryKey: companyQueryKey });
    },
  });
}
