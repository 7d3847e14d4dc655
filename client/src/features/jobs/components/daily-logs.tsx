import { Anchor, Button, Group, Table, Text, Title } from '@mantine/core';
import type { JobView } from '@pondwright/shared';
import { IconNotebook } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { todayIsoDate } from '@/lib/format';
import { hoursLogged } from '../utils/log-totals';
import { formatDay } from '../utils/week';

type DailyLogsProps = {
  job: Pick<JobView, 'status' | 'logs'>;
  /** Where the crew's log for a day is read and written. */
  logHref: (date: string) => string;
};

/** The crew's logs, one a day, newest first; each opens the day's log. */
export function DailyLogs({ job, logHref }: DailyLogsProps) {
  const newestFirst = [...job.logs].sort((a, b) => b.logDate.localeCompare(a.logDate));
  const today = todayIsoDate();
  const hasToday = job.logs.some((log) => log.logDate === today);

  return (
    <section aria-labelledby="daily-logs-title">
      <Group justify="space-between" mb="sm">
        <Title order={2} fz="h4" id="daily-logs-title">
          Daily logs
        </Title>
        {/* Closed jobs take no more logs (the server answers 409), so there is nothing to open. */}
        {job.status !== 'closed' && (
          <Button
            component={Link}
            to={logHref(today)}
            size="xs"
            variant="light"
            leftSection={<IconNotebook size={14} />}
          >
            {hasToday ? 'Today’s log' : 'Write today’s log'}
          </Button>
        )}
      </Group>
      {newestFirst.length === 0 ? (
        <Text size="sm" c="dimmed">
          No logs yet. The crew lead writes one for each day on site.
        </Text>
      ) : (
        <Table.ScrollContainer minWidth={560}>
          <Table aria-label="Daily logs" verticalSpacing={6}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Day</Table.Th>
                <Table.Th>Written by</Table.Th>
                <Table.Th ta="right">Hours</Table.Th>
                <Table.Th ta="right">Entries</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {newestFirst.map((log) => (
                <Table.Tr key={log.id}>
                  <Table.Td>
                    <Anchor component={Link} to={logHref(log.logDate)} fw={500}>
                      {formatDay(log.logDate)}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{log.authorName}</Table.Td>
                  <Table.Td ta="right">{hoursLogged(log)}</Table.Td>
                  <Table.Td ta="right">{log.entries.length}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
    </section>
  );
}
