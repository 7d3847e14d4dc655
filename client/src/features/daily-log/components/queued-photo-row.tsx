import { Button, Group, Image, Paper, Progress, Stack, Text } from '@mantine/core';
import { useEffect, useState } from 'react';
import { photoBlob, type QueuedPhoto } from '../storage/photo-store';
import { photoKindLabel, photoStatusText } from '../utils/photo-labels';

/** A thumbnail from the bytes kept on the phone: it shows with no connection, before any upload. */
function useStoredPhotoUrl(photo: QueuedPhoto): string | null {
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    const next = URL.createObjectURL(photoBlob(photo));
    setUrl(next);
    // Each object URL holds the photo's bytes in memory until it is revoked.
    return () => URL.revokeObjectURL(next);
    // The bytes never change under one id; a status change must not make a new URL.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [photo.id]);
  return url;
}

type QueuedPhotoRowProps = {
  photo: QueuedPhoto;
  /** 0 to 1 while it is on its way. */
  progress: number | null;
  signInNeeded: boolean;
  onRemove: () => void;
};

export function QueuedPhotoRow({ photo, progress, signInNeeded, onRemove }: QueuedPhotoRowProps) {
  const url = useStoredPhotoUrl(photo);
  const refused = photo.status === 'failed' || photo.status === 'conflict';
  const title = photo.caption || photoKindLabel(photo.kind);
  return (
    <Paper withBorder p="xs" role="listitem" aria-label={title}>
      <Group gap="sm" wrap="nowrap" align="flex-start">
        <Image src={url} alt={title} w={64} h={64} radius="sm" fit="cover" />
        <Stack gap={4} miw={0} style={{ flex: 1 }}>
          <Text size="sm" fw={500} truncate>
            {photoKindLabel(photo.kind)}
            {photo.caption ? ` · ${photo.caption}` : ''}
          </Text>
          {progress !== null && (
            <Progress size="sm" value={Math.round(progress * 100)} striped aria-label="Sending" />
          )}
          <Text size="xs" c={refused ? 'red' : 'dimmed'} role={refused ? 'alert' : undefined}>
            {photoStatusText(photo.status, photo.message, progress)}
            {!refused && progress === null && signInNeeded ? ' Sign in again to send it.' : ''}
          </Text>
          {refused && (
            <Button
              size="compact-sm"
              variant="subtle"
              color="red"
              onClick={onRemove}
              style={{ alignSelf: 'flex-start' }}
              aria-label={`Remove ${title}`}
            >
              Remove
            </Button>
          )}
        </Stack>
      </Group>
    </Paper>
  );
}
