import {
  ActionIcon,
  Button,
  Group,
  Paper,
  Progress,
  SegmentedControl,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { PHOTO_KINDS, uploadPhotoFieldsSchema, type PhotoKind } from '@pondwright/shared';
import { IconCamera, IconPhotoPlus, IconRefresh, IconUpload, IconX } from '@tabler/icons-react';
import { useRef, useState, type DragEvent } from 'react';
import { usePhotoUploads, type PhotoUpload } from '../hooks/use-photo-uploads';
import { PHOTO_KIND_LABELS } from '../utils/labels';

const KIND_OPTIONS = PHOTO_KINDS.map((kind) => ({ value: kind, label: PHOTO_KIND_LABELS[kind] }));

function statusText(upload: PhotoUpload): string {
  switch (upload.status) {
    case 'checking':
      return 'Checking…';
    case 'waiting':
      return 'Waiting to upload';
    case 'uploading':
      return `Uploading… ${Math.round(upload.progress * 100)} %`;
    case 'done':
      return upload.alreadyStored ? 'Already uploaded' : 'Uploaded';
    case 'failed':
      return `Not uploaded: ${upload.message ?? ''}`;
    case 'refused':
      return upload.message ?? 'Not a photo';
  }
}

function UploadRow({
  upload,
  onRetry,
  onDismiss,
}: {
  upload: PhotoUpload;
  onRetry: () => void;
  onDismiss: () => void;
}) {
  const bad = upload.status === 'failed' || upload.status === 'refused';
  const going = upload.status === 'uploading' || upload.status === 'waiting';
  return (
    <Stack gap={4} role="listitem" aria-label={upload.file.name}>
      <Group justify="space-between" gap="xs" wrap="nowrap">
        <Text size="sm" truncate>
          {upload.file.name} · {PHOTO_KIND_LABELS[upload.kind]}
        </Text>
        <Group gap={4} wrap="nowrap">
          {upload.status === 'failed' && (
            <Button
              size="compact-xs"
              variant="light"
              leftSection={<IconRefresh size={12} />}
              onClick={onRetry}
            >
              Try again
            </Button>
          )}
          {!going && upload.status !== 'checking' && (
            <ActionIcon
              size="sm"
              variant="subtle"
              color="gray"
              aria-label={`Remove ${upload.file.name} from the list`}
              onClick={onDismiss}
            >
              <IconX size={14} />
            </ActionIcon>
          )}
        </Group>
      </Group>
      {upload.status !== 'refused' && (
        <Progress
          size="sm"
          value={Math.round(upload.progress * 100)}
          color={upload.status === 'failed' ? 'red' : upload.status === 'done' ? 'reed' : undefined}
          striped={upload.status === 'uploading'}
          aria-label={`Upload of ${upload.file.name}`}
        />
      )}
      <Text size="xs" c={bad ? 'red' : 'dimmed'} role={bad ? 'alert' : undefined}>
        {statusText(upload)}
      </Text>
    </Stack>
  );
}

/**
 * Adds photos to the job: dropped on the area, taken with the phone's camera or chosen from the
 * device. Each file is checked here first, then uploaded with its own progress bar.
 */
export function PhotoUploader({ jobId }: { jobId: string }) {
  const { uploads, add, retry, dismiss, clearFinished } = usePhotoUploads(jobId);
  const [kind, setKind] = useState<PhotoKind>('progress');
  const [caption, setCaption] = useState('');
  const [dragging, setDragging] = useState(false);
  const camera = useRef<HTMLInputElement>(null);
  const picker = useRef<HTMLInputElement>(null);
  // The same rule the server applies to the fields beside the file.
  const fields = uploadPhotoFieldsSchema.safeParse({ kind, caption });
  const captionError = fields.success ? null : (fields.error.issues[0]?.message ?? null);

  const take = (files: FileList | null | undefined) => {
    if (!files || files.length === 0 || captionError) return;
    add([...files], kind, caption.trim());
  };
  const chosen = (input: HTMLInputElement) => {
    take(input.files);
    // The same file chosen again (to retry a refused one) must fire another change.
    input.value = '';
  };
  const over = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(true);
  };
  const leave = (event: DragEvent<HTMLDivElement>) => {
    // Leaving for one of the area's own children is not leaving the area.
    if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setDragging(false);
  };
  const drop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    take(event.dataTransfer?.files);
  };
  const finished = uploads.some((u) => u.status === 'done' || u.status === 'refused');

  return (
    <Stack gap="sm" component="section" aria-label="Add photos">
      <Group align="flex-end" gap="md">
        <Stack gap={4}>
          <Text size="sm" fw={500} id="photo-kind-label">
            The photos show
          </Text>
          <SegmentedControl
            aria-labelledby="photo-kind-label"
            data={KIND_OPTIONS}
            value={kind}
            onChange={(value) => setKind(value as PhotoKind)}
          />
        </Stack>
        <TextInput
          label="Caption"
          description="Optional; goes with each photo you add next."
          value={caption}
          error={captionError}
          onChange={(event) => setCaption(event.currentTarget.value)}
          style={{ flex: 1, minWidth: 220 }}
        />
      </Group>
      <Paper
        withBorder
        p="lg"
        role="group"
        aria-label="Drop photos here"
        onDragEnter={over}
        onDragOver={over}
        onDragLeave={leave}
        onDrop={drop}
        style={{
          borderStyle: 'dashed',
          borderWidth: 2,
          borderColor: dragging ? 'var(--mantine-primary-color-filled)' : undefined,
          background: dragging ? 'var(--mantine-primary-color-light)' : undefined,
        }}
      >
        <Stack align="center" gap="xs">
          <IconUpload size={28} aria-hidden />
          <Text size="sm" ta="center">
            Drop photos here, take one with the phone’s camera, or choose several at once.
          </Text>
          <Text size="xs" c="dimmed" ta="center">
            JPEG, PNG or WebP, at most 15 MB each.
          </Text>
          <Group gap="sm" justify="center">
            <Button leftSection={<IconCamera size={16} />} onClick={() => camera.current?.click()}>
              Take a photo
            </Button>
            <Button
              variant="default"
              leftSection={<IconPhotoPlus size={16} />}
              onClick={() => picker.current?.click()}
            >
              Choose photos
            </Button>
          </Group>
        </Stack>
        {/* Hidden inputs behind the buttons: one opens the camera, the other the photo library. */}
        <input
          ref={camera}
          type="file"
          accept="image/*"
          capture="environment"
          hidden
          aria-label="Photo from the camera"
          onChange={(event) => chosen(event.currentTarget)}
        />
        <input
          ref={picker}
          type="file"
          accept="image/*"
          multiple
          hidden
          aria-label="Photos from this device"
          onChange={(event) => chosen(event.currentTarget)}
        />
      </Paper>
      {uploads.length > 0 && (
        <Stack gap="sm" role="list" aria-label="Uploads">
          {uploads.map((upload) => (
            <UploadRow
              key={upload.id}
              upload={upload}
              onRetry={() => retry(upload.id)}
              onDismiss={() => dismiss(upload.id)}
            />
          ))}
          {finished && (
            <Group>
              <Button size="xs" variant="subtle" onClick={clearFinished}>
                Clear finished
              </Button>
            </Group>
          )}
        </Stack>
      )}
    </Stack>
  );
}
