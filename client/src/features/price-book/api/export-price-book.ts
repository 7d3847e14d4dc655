import { useMutation } from '@tanstack/react-query';
import { apiDownload } from '@/lib/api-client';
import { saveFile } from '@/lib/save-file';
import { todayIsoDate } from '@/lib/format';

/** Downloads the current book as CSV. */
export async function exportPriceBook(): Promise<string> {
  const { blob, fileName } = await apiDownload('/price-book/export.csv', 'text/csv');
  const name = fileName ?? `price-book-${todayIsoDate()}.csv`;
  saveFile(blob, name);
  return name;
}

export const useExportPriceBook = () => useMutation({ mutationFn: exportPriceBook });
