import { Anchor, Badge, Button, Group, Stack, Text } from '@mantine/core';
import { IconSend } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { syncLogsThenPhotos } from '../hooks/use-daily-log-sync';
import { useOutbox } from '../hooks/use-outbox';
import { usePhotoOutbox } from '../hooks/use-photo-outbox';
import { formatDay } from '../utils/dates';
import {
  itemsOf,
  OUTBOX_STATUS_COLORS,
  OUTBOX_STATUS_LABELS,
  waitingLogs,
} from '../utils/outbox-views';
import { waitingCount } from '../utils/photo-labels';

/**
 * The logs on this phone that the office does not have yet, each one tap from its day, and how many
 * of the day's photos still wait (they are listed, with thumbnails, on their day's log).
 */
export function WaitingLogsList({ userId, onOpen }: { userId: string; onOpen?: () => void }) {
  const outbox = useOutbox();
  const { photos, sending } = usePhotoOutbox();
  const mine = itemsOf(outbox.items, userId);
  const others = outbox.items.length - mine.length;
  const waiting = mine.filter((item) => item.status === 'waiting').length;
  const myPhotos = photos.filter((photo) => photo.userId === userId);
  const refusedPhotos = myPhotos.filter((p) => p.status === 'failed' || p.status === 'conflict');
  const waitingPhotos = myPhotos.length - refusedPhotos.length;
  const photosToo = waitingPhotos > 0 ? ` and ${waitingCount(0, waitingPhotos)}` : '';

  return (
    <Stack gap="xs">
      {myPhotos.length > 0 && (
        <Text size="sm" fw={500}>
          {waitingCount(mine.length, myPhotos.length)} waiting
        </Text>
      )}
      {outbox.signInNeeded && (waiting > 0 || waitingPhotos > 0) && (
        <Text size="sm" fw={600} c="clay.8">
          Sign in again to send{' '}
          {waiting > 0 ? `${waitingLogs(waiting)}${photosToo}` : waitingCount(0, waitingPhotos)}.
        </Text>
      )}
      {refusedPhotos.length > 0 && (
        <Text size="sm" c="red">
          {refusedPhotos.length === 1
            ? 'One photo was not accepted; see its day’s log.'
            : `${refusedPhotos.length} photos were not accepted; see their day’s log.`}
        </Text>
      )}
      {mine.map((item) => (
        <Group key={item.logId} justify="space-between" wrap="nowrap" gap="xs">
          <Anchor
            component={Link}
            to={paths.jobLog.getHref(item.jobId, item.request.logDate)}
            onClick={onOpen}
            size="sm"
            miw={0}
          >
            <Text span inherit lineClamp={1}>
              {formatDay(item.request.logDate)} · {item.jobLabel}
            </Text>
          </Anchor>
          <Badge
            color={OUTBOX_STATUS_COLORS[item.status]}
            variant="light"
            style={{ flexShrink: 0 }}
          >
            {outbox.sendingLogId === item.logId ? 'Sending…' : OUTBOX_STATUS_LABELS[item.status]}
          </Badge>
        </Group>
      ))}
      {others > 0 && (
        <Text size="xs" c="dimmed">
          {others === 1 ? 'One more log waits' : `${others} more logs wait`} for the person who
          saved
          {others === 1 ? ' it' : ' them'} to sign in on this phone.
        </Text>
      )}
      {(waiting > 0 || waitingPhotos > 0) && !outbox.signInNeeded && (
        <Button
          size="sm"
          variant="light"
          leftSection={<IconSend size={16} />}
          loading={outbox.sendingLogId !== null || sending !== null}
          onClick={() => void syncLogsThenPhotos(userId)}
        >
          Send now
        </Button>
      )}
    </Stack>
  );
}
