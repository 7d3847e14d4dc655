import type { ApprovalQueueItem } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const approvalQueueQueryKey = ['approvals'] as const;

export function getApprovalQueue(): Promise<ApprovalQueueItem[]> {
  return api.get<ApprovalQueueItem[]>('/approvals');
}

export const getApprovalQueueQueryOptions = () =>
  queryOptions({ queryKey: approvalQueueQueryKey, queryFn: getApprovalQueue });

export const useApprovalQueue = () => useQuery(getApprovalQueueQueryOptions());
