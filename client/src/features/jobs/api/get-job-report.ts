import type { JobCostReport } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export function getJobReport(id: string): Promise<JobCostReport> {
  return api.get<JobCostReport>(`/jobs/${encodeURIComponent(id)}/report`);
}

export const getJobReportQueryOptions = (id: string) =>
  queryOptions({ queryKey: jobKeys.report(id), queryFn: () => getJobReport(id) });

export const useJobReport = (id: string) => useQuery(getJobReportQueryOptions(id));
