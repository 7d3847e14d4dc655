import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';

export type DownloadQuotePdfInput = { id: string; number: number };

/** Downloads the PDF of the latest sent (or approved) version. */
export async function downloadQuotePdf({ id, number }: DownloadQuotePdfInput): Promise<string> {
  const { blob, fileName } = await apiDownload(
    `/estimates/${encodeURIComponent(id)}/quote.pdf`,
    'application/pdf',
  );
  const name = fileName ?? `quote-${number}.pdf`;
  saveFile(blob, name);
  return name;
}

export const useDownloadQuotePdf = () => useMutation({ mutationFn: downloadQuotePdf });
