import { Anchor, Badge, Button, Group, Stack, Text } from '@mantine/core';
import { IconSend } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useOutbox } from '../hooks/use-outbox';
import { outboxSync } from '../sync/outbox-sync';
import { formatDay } from '../utils/dates';
import {
  itemsOf,
  OUTBOX_STATUS_COLORS,
  OUTBOX_STATUS_LABELS,
  waitingLogs,
} from '../utils/outbox-views';

/** The logs on this phone that the office does not have yet, each one tap from its day. */
export function WaitingLogsList({ userId, onOpen }: { userId: string; onOpen?: () => void }) {
  const outbox = useOutbox();
  const mine = itemsOf(outbox.items, userId);
  const others = outbox.items.length - mine.length;
  const waiting = mine.filter((item) => item.status === 'waiting').length;

  return (
    <Stack gap="xs">
      {outbox.signInNeeded && waiting > 0 && (
        <Text size="sm" fw={600} c="clay.8">
          Sign in again to send {waitingLogs(waiting)}.
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
      {waiting > 0 && !outbox.signInNeeded && (
        <Button
          size="sm"
          variant="light"
          leftSection={<IconSend size={16} />}
          loading={outbox.sendingLogId !== null}
          onClick={() => void outboxSync.syncNow(userId)}
        >
          Send now
        </Button>
      )}
    </Stack>
  );
}
