import type { CrewView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Shared with the estimate page's "Make it a job" dialog, which asks for the same list. */
export const crewsQueryKey = ['crews'] as const;

export function getCrews(): Promise<CrewView[]> {
  return api.get<CrewView[]>('/crews');
}

export const getCrewsQueryOptions = () =>
  queryOptions({ queryKey: crewsQueryKey, queryFn: getCrews });

export const useCrews = ({ enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...getCrewsQueryOptions(), enabled });
