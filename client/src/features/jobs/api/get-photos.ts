import type { PhotoView } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { jobKeys } from './get-jobs';

export function getPhotos(jobId: string): Promise<PhotoView[]> {
  return api.get<PhotoView[]>(`/jobs/${encodeURIComponent(jobId)}/photos`);
}

export const getPhotosQueryOptions = (jobId: string) =>
  queryOptions({ queryKey: jobKeys.photos(jobId), queryFn: () => getPhotos(jobId) });

export const usePhotos = (jobId: string) => useQuery(getPhotosQueryOptions(jobId));
