import { ActionIcon, Indicator, Popover } from '@mantine/core';
import { IconCloudUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { useOutbox } from '../hooks/use-outbox';
import { itemsOf } from '../utils/outbox-views';
import { WaitingLogsList } from './waiting-logs-list';

/**
 * The header's count of logs on this phone that the office does not have yet. Absent when there are
 * none, so it only ever asks for attention when something is waiting.
 */
export function WaitingLogsButton({ userId }: { userId: string }) {
  const outbox = useOutbox();
  const [opened, setOpened] = useState(false);
  const mine = itemsOf(outbox.items, userId);
  if (mine.length === 0) return null;
  const needsPerson = mine.some((item) => item.status !== 'waiting') || outbox.signInNeeded;
  const label = `${mine.length} ${mine.length === 1 ? 'log' : 'logs'} not sent yet`;

  return (
    <Popover opened={opened} onChange={setOpened} position="bottom-end" width={300} shadow="md">
      <Popover.Target>
        <Indicator label={mine.length} size={18} color={needsPerson ? 'red' : 'clay'} offset={4}>
          <ActionIcon
            variant="light"
            color={needsPerson ? 'red' : 'clay'}
            size={44}
            aria-label={label}
            onClick={() => setOpened((open) => !open)}
          >
            <IconCloudUpload size={22} />
          </ActionIcon>
        </Indicator>
      </Popover.Target>
      <Popover.Dropdown aria-label="Logs not sent yet">
        <WaitingLogsList userId={userId} onOpen={() => setOpened(false)} />
      </Popover.Dropdown>
    </Popover>
  );
}
