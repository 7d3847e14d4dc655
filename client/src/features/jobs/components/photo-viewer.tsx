import { Modal, Stack, Text } from '@mantine/core';
import type { PhotoView } from '@pondwright/shared';
import { photoCredit, photoName } from '../utils/photo-text';
import { PhotoImage } from './photo-image';

/** One photo at full size (at most 2048 px), with its caption and who took it when. */
export function PhotoViewer({ photo, onClose }: { photo: PhotoView | null; onClose: () => void }) {
  return (
    <Modal
      opened={photo !== null}
      onClose={onClose}
      title={photo ? photoName(photo) : ''}
      size="xl"
      centered
    >
      {photo && (
        <Stack gap="xs">
          <PhotoImage path={photo.imagePath} alt={photoName(photo)} height="70vh" fit="contain" />
          <Text size="sm" c="dimmed">
            {photoCredit(photo)}
          </Text>
        </Stack>
      )}
    </Modal>
  );
}
