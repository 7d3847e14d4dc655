import {
  Alert,
  CloseButton,
  Group,
  Paper,
  SegmentedControl,
  Stack,
  Text,
  Title,
} from '@mantine/core';
import type { PhotoKind } from '@pondwright/shared';
import { IconCamera, IconPhotoPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { useOutbox } from '../hooks/use-outbox';
import type { useLogPhotos } from '../hooks/use-log-photos';
import { LOG_PHOTO_KINDS } from '../utils/photo-labels';
import { PhotoFileButton } from './photo-file-button';
import { QueuedPhotoRow } from './queued-photo-row';

/**
 * The day's photos not yet with the office. Each one is on the phone from the moment it is chosen and
 * goes after the day's log; sent photos leave this list for the job's photo page.
 */
export function LogPhotos({ queue }: { queue: ReturnType<typeof useLogPhotos> }) {
  const [kind, setKind] = useState<PhotoKind>('progress');
  const { signInNeeded } = useOutbox();
  const add = (files: File[]) => void queue.add(files, kind, '');

  return (
    <Paper p="sm" component="section" aria-labelledby="log-section-photos">
      <Stack gap="sm">
        <Title order={2} fz="h4" id="log-section-photos">
          Photos
        </Title>
        <Stack gap={4}>
          <Text size="sm" fw={500} id="log-photo-kind">
            The photos show
          </Text>
          <SegmentedControl
            fullWidth
            size="md"
            aria-labelledby="log-photo-kind"
            data={LOG_PHOTO_KINDS}
            value={kind}
            onChange={(value) => setKind(value as PhotoKind)}
          />
        </Stack>
        {/* One button a row: side by side, their labels are cut off on a 360 px phone. */}
        <Stack gap="xs">
          <PhotoFileButton
            size="md"
            fullWidth
            camera
            inputLabel="Photo from the camera"
            leftSection={<IconCamera size={18} />}
            onFiles={add}
          >
            Take a photo
          </PhotoFileButton>
          <PhotoFileButton
            size="md"
            variant="default"
            fullWidth
            multiple
            inputLabel="Photos from this phone"
            leftSection={<IconPhotoPlus size={18} />}
            onFiles={add}
          >
            Choose photos
          </PhotoFileButton>
        </Stack>
        <Text size="xs" c="dimmed">
          JPEG, PNG or WebP, at most 15 MB each. Kept on this phone and sent after the day’s log.
        </Text>
        {queue.refusals.map((refusal) => (
          <Alert key={refusal.id} color="red" variant="light" role="alert" title="Not added">
            <Group justify="space-between" wrap="nowrap" align="flex-start">
              <Text size="sm">{refusal.message}</Text>
              <CloseButton aria-label="Dismiss" onClick={() => queue.dismissRefusal(refusal.id)} />
            </Group>
          </Alert>
        ))}
        {queue.photos.length > 0 && (
          <Stack gap="xs" role="list" aria-label="Photos not sent yet">
            {queue.photos.map((photo) => (
              <QueuedPhotoRow
                key={photo.id}
                photo={photo}
                progress={queue.sending?.id === photo.id ? queue.sending.progress : null}
                signInNeeded={signInNeeded}
                onRemove={() => queue.remove(photo.id)}
              />
            ))}
          </Stack>
        )}
      </Stack>
    </Paper>
  );
}
