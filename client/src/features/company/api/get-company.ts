import type { CompanyProfile } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const companyQueryKey = ['company'] as const;

/** The signed-in user's company: its name and the units new takeoffs start in. */
export function getCompany(): Promise<CompanyProfile> {
  return api.get<CompanyProfile>('/company');
}

export const getCompanyQueryOptions = () =>
  queryOptions({ queryKey: companyQueryKey, queryFn: getCompany });

export const useCompany = () => useQuery(getCompanyQueryOptions());
