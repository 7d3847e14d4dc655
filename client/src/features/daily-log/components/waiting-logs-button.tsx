import { ActionIcon, Indicator, Popover } from '@mantine/core';
import { IconCloudUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { useOutbox } from '../hooks/use-outbox';
import { usePhotoOutbox } from '../hooks/use-photo-outbox';
import { itemsOf } from '../utils/outbox-views';
import { waitingCount } from '../utils/photo-labels';
import { WaitingLogsList } from './waiting-logs-list';

/**
 * The header's count of logs and photos on this phone that the office does not have yet. Absent when
 * there are none, so it only ever asks for attention when something is waiting.
 */
export function WaitingLogsButton({ userId }: { userId: string }) {
  const outbox = useOutbox();
  const { photos } = usePhotoOutbox();
  const [opened, setOpened] = useState(false);
  const mine = itemsOf(outbox.items, userId);
  const myPhotos = photos.filter((photo) => photo.userId === userId);
  const count = mine.length + myPhotos.length;
  if (count === 0) return null;
  const needsPerson =
    mine.some((item) => item.status !== 'waiting') ||
    myPhotos.some((photo) => photo.status === 'failed' || photo.status === 'conflict') ||
    outbox.signInNeeded;
  const label = `${waitingCount(mine.length, myPhotos.length)} not sent yet`;

  return (
    <Popover opened={opened} onChange={setOpened} position="bottom-end" width={300} shadow="md">
      <Popover.Target>
        <Indicator label={count} size={18} color={needsPerson ? 'red' : 'clay'} offset={4}>
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
      <Popover.Dropdown aria-label="Not sent yet">
        <WaitingLogsList userId={userId} onOpen={() => setOpened(false)} />
      </Popover.Dropdown>
    </Popover>
  );
}
