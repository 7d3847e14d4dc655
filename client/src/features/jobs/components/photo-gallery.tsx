import { SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { PHOTO_KINDS, type PhotoKind, type PhotoView } from '@pondwright/shared';
import { useState } from 'react';
import { PHOTO_KIND_FILTER_LABELS } from '../utils/labels';
import { BeforeAfter } from './before-after';
import { PhotoThumbnail } from './photo-thumbnail';
import { PhotoViewer } from './photo-viewer';

type View = 'all' | PhotoKind | 'compare';

const VIEW_OPTIONS: Array<{ value: View; label: string }> = [
  { value: 'all', label: 'All' },
  ...PHOTO_KINDS.map((kind) => ({ value: kind, label: PHOTO_KIND_FILTER_LABELS[kind] })),
  { value: 'compare', label: 'Before and after' },
];

/** The job's photos, oldest first, filtered by what they show, or before and after side by side. */
export function PhotoGallery({ photos }: { photos: PhotoView[] }) {
  const [view, setView] = useState<View>('all');
  const [open, setOpen] = useState<PhotoView | null>(null);
  const shown = view === 'all' ? photos : photos.filter((photo) => photo.kind === view);

  return (
    <Stack gap="md">
      <SegmentedControl
        aria-label="Show photos"
        data={VIEW_OPTIONS}
        value={view}
        onChange={(value) => setView(value as View)}
        w="fit-content"
        style={{ maxWidth: '100%', overflowX: 'auto' }}
      />
      {view === 'compare' ? (
        <BeforeAfter photos={photos} />
      ) : shown.length === 0 ? (
        <Text size="sm" c="dimmed">
          {photos.length === 0
            ? 'No photos yet. The first ones are best taken before the digging starts.'
            : 'No photos of this kind yet.'}
        </Text>
      ) : (
        <>
          <Text size="xs" c="dimmed">
            {shown.length === photos.length
              ? `${photos.length} ${photos.length === 1 ? 'photo' : 'photos'}`
              : `${shown.length} of ${photos.length} photos`}
          </Text>
          <SimpleGrid
            cols={{ base: 2, xs: 3, md: 4, lg: 5 }}
            spacing="sm"
            role="list"
            aria-label="Photos"
          >
            {shown.map((photo) => (
              <div role="listitem" key={photo.id}>
                <PhotoThumbnail photo={photo} onOpen={() => setOpen(photo)} />
              </div>
            ))}
          </SimpleGrid>
        </>
      )}
      <PhotoViewer photo={open} onClose={() => setOpen(null)} />
    </Stack>
  );
}
