import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';
import { todayIsoDate } from '@/lib/format';

/**
 * Downloads the current book as CSV. A plain link cannot carry the bearer token, so the file
 * is fetched and handed to the browser as a Blob.
 */
export async function exportPriceBook(): Promise<string> {
  const { blob, fileName } = await apiDownload('/price-book/export.csv', 'text/csv');
  const name = fileName ?? `price-book-${todayIsoDate()}.csv`;
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

export const useExportPriceBook = () => useMutation({ mutationFn: exportPriceBook });
