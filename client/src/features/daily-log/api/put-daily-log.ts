import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { api } from '@/lib/api-client';

const logsPath = (jobId: string) => `/jobs/${encodeURIComponent(jobId)}/logs`;

/** `PUT /api/jobs/:jobId/logs/:logId`: 201 for a new log, 200 for an edit or a repeat of the same. */
export function putDailyLog(
  jobId: string,
  logId: string,
  request: SaveDailyLogRequest,
): Promise<DailyLogView> {
  return api.put<DailyLogView>(`${logsPath(jobId)}/${encodeURIComponent(logId)}`, request);
}

/**
 * The stored copy of one log. A 409 LOG_CONFLICT carries it as `current`, but the shared API client
 * keeps only the error's message and fields, so it is read again here.
 */
export async function getStoredLog(jobId: string, logId: string): Promise<DailyLogView | null> {
  const logs = await api.get<DailyLogView[]>(logsPath(jobId));
  return logs.find((log) => log.id === logId) ?? null;
}
