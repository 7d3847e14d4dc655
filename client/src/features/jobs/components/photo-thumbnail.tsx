import { Badge, Stack, Text, UnstyledButton } from '@mantine/core';
import type { PhotoView } from '@pondwright/shared';
import { PHOTO_KIND_LABELS } from '../utils/labels';
import { photoName } from '../utils/photo-text';
import { PhotoImage } from './photo-image';

type PhotoThumbnailProps = {
  photo: PhotoView;
  onOpen: () => void;
  height?: number;
  /** Marks the one chosen in the before-and-after view. */
  selected?: boolean;
  withCaption?: boolean;
};

/** The 320 px thumbnail; choosing it opens (or picks) the photo. */
export function PhotoThumbnail({
  photo,
  onOpen,
  height = 140,
  selected,
  withCaption = true,
}: PhotoThumbnailProps) {
  return (
    <UnstyledButton
      onClick={onOpen}
      aria-label={`Open ${photoName(photo)}`}
      aria-pressed={selected}
      style={{
        borderRadius: 'var(--mantine-radius-sm)',
        outline: selected ? '3px solid var(--mantine-primary-color-filled)' : undefined,
      }}
    >
      <Stack gap={4}>
        <PhotoImage path={photo.thumbnailPath} alt={photoName(photo)} height={height} />
        {withCaption && (
          <>
            <Badge size="xs" variant="light" tt="none" w="fit-content">
              {PHOTO_KIND_LABELS[photo.kind]}
            </Badge>
            {photo.caption && (
              <Text size="xs" lineClamp={2}>
                {photo.caption}
              </Text>
            )}
          </>
        )}
      </Stack>
    </UnstyledButton>
  );
}
