import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';

export type DownloadJobReportInput = { id: string; number: number };

/** The report's lines as CSV, fetched with the bearer token and handed to the browser as a file. */
export async function downloadJobReport({ id, number }: DownloadJobReportInput): Promise<string> {
  const { blob, fileName } = await apiDownload(
    `/jobs/${encodeURIComponent(id)}/report.csv`,
    'text/csv',
  );
  const name = fileName ?? `job-${number}-cost-report.csv`;
  saveFile(blob, name);
  return name;
}

export const useDownloadJobReport = () => useMutation({ mutationFn: downloadJobReport });
