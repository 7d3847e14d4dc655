import { Alert } from '@mantine/core';
import { IconCloudUpload } from '@tabler/icons-react';
import { useOutbox } from '../hooks/use-outbox';
import { waitingLogs } from '../utils/outbox-views';

/**
 * On the sign-in page: the session ended (or could not be renewed) with logs still on the phone.
 * They are kept; signing in sends them.
 */
export function WaitingLogsSignInNotice() {
  const { items } = useOutbox();
  const waiting = items.filter((item) => item.status === 'waiting').length;
  if (waiting === 0) return null;
  return (
    <Alert color="clay" variant="light" icon={<IconCloudUpload />} mb="md" role="status">
      Sign in again to send {waitingLogs(waiting)}. They are kept on this phone until then.
    </Alert>
  );
}
