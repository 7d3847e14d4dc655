import { Badge, Group, Text } from '@mantine/core';
import type { DailyLogView } from '@pondwright/shared';
import type { OutboxItem } from '../storage/outbox-store';
import { formatTime } from '../utils/dates';

type LogStatusProps = {
  item: OutboxItem | null;
  sending: boolean;
  signInNeeded: boolean;
  dirty: boolean;
  saved: DailyLogView | null;
};

type Shown = { label: string; color: string; detail?: string };

function shown({ item, sending, signInNeeded, dirty, saved }: LogStatusProps): Shown {
  if (item?.status === 'conflict') return { label: 'Conflict', color: 'red' };
  if (item?.status === 'rejected') return { label: 'Needs a fix', color: 'red' };
  if (item && sending) return { label: 'Sending…', color: 'reed' };
  if (item) {
    const detail = signInNeeded
      ? 'Sign in again to send it.'
      : item.lastTrouble === 'server'
        ? 'The server is having trouble; it is tried again soon.'
        : 'Kept on this phone; sent when there is a connection.';
    return { label: 'Waiting to send', color: 'clay', detail };
  }
  if (dirty) return { label: 'Not saved yet', color: 'gray' };
  if (saved) {
    return {
      label: 'Saved',
      color: 'reed',
      detail: `By ${saved.authorName}, ${formatTime(saved.updatedAt)}`,
    };
  }
  return { label: 'New log', color: 'gray' };
}

/** Where this day's log stands: on the phone, on its way, with the office, or waiting for a person. */
export function LogStatus(props: LogStatusProps) {
  const { label, color, detail } = shown(props);
  return (
    <Group gap="xs" wrap="nowrap" role="status" aria-label="Log status" miw={0}>
      <Badge color={color} variant="light" size="lg" style={{ flexShrink: 0 }}>
        {label}
      </Badge>
      {detail && (
        <Text size="xs" c="dimmed" lineClamp={2}>
          {detail}
        </Text>
      )}
    </Group>
  );
}
