import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';

export type DownloadQuotePdfInput = { id: string; number: number };

/**
 * Downloads the PDF of the latest sent (or approved) version. A plain link cannot carry the bearer
 * token, so the file is fetched and handed to the browser through an object URL.
 */
export async function downloadQuotePdf({ id, number }: DownloadQuotePdfInput): Promise<string> {
  const { blob, fileName } = await apiDownload(
    `/estimates/${encodeURIComponent(id)}/quote.pdf`,
    'application/pdf',
  );
  const name = fileName ?? `quote-${number}.pdf`;
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  document.body.append(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL is released.
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
  return name;
}

export const useDownloadQuotePdf = () => useMutation({ mutationFn: downloadQuotePdf });
