import { useQuery } from '@tanstack/react-query';
import { API_BASE_PATH } from '@/config/env';
import { apiDownload } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

/** The view gives full API paths (`/api/jobs/…`); the client adds its own base again. */
function withoutApiBase(path: string): string {
  return path.startsWith(`${API_BASE_PATH}/`) ? path.slice(API_BASE_PATH.length) : path;
}

/** An <img> cannot send the bearer token, so the bytes are fetched and shown by object URL. */
export async function getPhotoImage(path: string): Promise<Blob> {
  const { blob } = await apiDownload(withoutApiBase(path), 'image/*');
  return blob;
}

export const usePhotoImage = (path: string) =>
  useQuery({
    queryKey: jobKeys.photoImage(path),
    queryFn: () => getPhotoImage(path),
    // A stored photo never changes under its id.
    staleTime: Infinity,
  });
