import { Alert } from '@mantine/core';
import { IconCloudUpload } from '@tabler/icons-react';
import { useOutbox } from '../hooks/use-outbox';
import { usePhotoOutbox } from '../hooks/use-photo-outbox';
import { waitingLogs } from '../utils/outbox-views';
import { waitingCount } from '../utils/photo-labels';

/**
 * On the sign-in page: the session ended (or could not be renewed) with logs still on the phone.
 * They are kept; signing in sends them.
 */
export function WaitingLogsSignInNotice() {
  const { items } = useOutbox();
  const { photos } = usePhotoOutbox();
  const waiting = items.filter((item) => item.status === 'waiting').length;
  const waitingPhotos = photos.filter(
    (p) => p.status === 'waiting' || p.status === 'sending',
  ).length;
  if (waiting === 0 && waitingPhotos === 0) return null;
  const what =
    waiting === 0
      ? waitingCount(0, waitingPhotos)
      : `${waitingLogs(waiting)}${waitingPhotos > 0 ? ` and ${waitingCount(0, waitingPhotos)}` : ''}`;
  return (
    <Alert color="clay" variant="light" icon={<IconCloudUpload />} mb="md" role="status">
      Sign in again to send {what}. They are kept on this phone until then.
    </Alert>
  );
}
