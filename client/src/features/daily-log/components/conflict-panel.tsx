import { Alert, Button, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { DailyLogView } from '@pondwright/shared';
import { useQuery } from '@tanstack/react-query';
import { IconGitCompare } from '@tabler/icons-react';
import { dailyLogKeys } from '../api/keys';
import { getStoredLog } from '../api/put-daily-log';
import type { OutboxItem } from '../storage/outbox-store';
import { formatTime } from '../utils/dates';
import { LogSummary } from './log-summary';

type ConflictPanelProps = {
  item: OutboxItem;
  onKeepMine: (storedRevision: number) => void;
  onUseSaved: (stored: DailyLogView) => void;
};

/**
 * Someone saved the day's log after this phone's copy was started. Both stay until a person picks
 * one; "Keep mine" sends this phone's copy again as an edit of the stored one.
 */
export function ConflictPanel({ item, onKeepMine, onUseSaved }: ConflictPanelProps) {
  // The conflict answer's copy, when the phone could fetch it then; otherwise it is fetched now.
  const stored = useQuery({
    queryKey: dailyLogKeys.storedLog(item.logId, item.saveId),
    queryFn: () => getStoredLog(item.jobId, item.logId),
    enabled: item.current === null,
  });
  const current = item.current ?? stored.data ?? null;

  return (
    <Alert
      color="red"
      variant="light"
      icon={<IconGitCompare />}
      title="Two versions of this day’s log"
      role="alert"
    >
      <Stack gap="sm">
        <Text size="sm">
          {current
            ? `${current.authorName} saved this day’s log (${formatTime(current.updatedAt)}) after your copy was started. Nothing is lost: choose which one to keep.`
            : 'Someone saved this day’s log after your copy was started. Nothing is lost: their version is loading so you can compare.'}
        </Text>
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
          <Paper withBorder p="sm" component="section" aria-label="Your version">
            <Title order={3} fz="sm" mb={4}>
              Yours, on this phone
            </Title>
            <LogSummary log={item.request} />
          </Paper>
          <Paper withBorder p="sm" component="section" aria-label="Saved version">
            <Title order={3} fz="sm" mb={4}>
              {current ? `Saved by ${current.authorName}` : 'Saved version'}
            </Title>
            {current ? (
              <LogSummary log={current} />
            ) : (
              <Text size="sm" c="dimmed">
                {stored.isError
                  ? 'Could not load it yet; try again with a connection.'
                  : 'Loading…'}
              </Text>
            )}
          </Paper>
        </SimpleGrid>
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
          <Button
            size="md"
            disabled={!current}
            onClick={() => current && onKeepMine(current.revision)}
          >
            Keep mine
          </Button>
          <Button
            size="md"
            variant="default"
            disabled={!current}
            onClick={() => current && onUseSaved(current)}
          >
            Use the saved one
          </Button>
        </SimpleGrid>
      </Stack>
    </Alert>
  );
}
