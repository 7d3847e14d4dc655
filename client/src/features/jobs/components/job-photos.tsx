import { Divider, Skeleton, Stack, Text, Title } from '@mantine/core';
import { ErrorPanel } from '@/components/error-panel';
import { usePhotos } from '../api/get-photos';
import { PhotoGallery } from './photo-gallery';
import { PhotoUploader } from './photo-uploader';

/** The job's photos: before, progress, after and suppliers' tickets; everyone can add them. */
export function JobPhotos({ jobId }: { jobId: string }) {
  const photos = usePhotos(jobId);
  return (
    <Stack gap="md">
      <Stack gap={2}>
        <Title order={2} fz="h4">
          Photos
        </Title>
        <Text size="sm" c="dimmed">
          The site before, the work as it goes, the finished pond, and the tickets that came with
          deliveries. Locations are removed from every photo when it is stored.
        </Text>
      </Stack>
      <PhotoUploader jobId={jobId} />
      <Divider />
      {photos.isPending ? (
        <Skeleton height={160} aria-label="Loading the photos" />
      ) : photos.isError ? (
        <ErrorPanel
          title="Could not load the photos"
          error={photos.error}
          onRetry={() => void photos.refetch()}
        />
      ) : (
        <PhotoGallery photos={photos.data} />
      )}
    </Stack>
  );
}
