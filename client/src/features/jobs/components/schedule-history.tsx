import { Table, Text } from '@mantine/core';
import type { ScheduleChangeView } from '@pondwright/shared';
import { formatDate } from '@/lib/format';
import { RESCHEDULE_REASON_LABELS } from '../utils/labels';
import { formatDay } from '../utils/week';

/** Every time the job was given a date or moved, newest first, with who did it and why. */
export function ScheduleHistory({ changes }: { changes: readonly ScheduleChangeView[] }) {
  if (changes.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        The job has not been given a date yet.
      </Text>
    );
  }
  const newestFirst = [...changes].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <Table.ScrollContainer minWidth={720}>
      <Table aria-label="Schedule history" verticalSpacing={6}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>When</Table.Th>
            <Table.Th>Start</Table.Th>
            <Table.Th>Crew</Table.Th>
            <Table.Th>Reason</Table.Th>
            <Table.Th>Note</Table.Th>
            <Table.Th>By</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {newestFirst.map((change) => (
            <Table.Tr key={change.id}>
              <Table.Td>{formatDate(change.createdAt)}</Table.Td>
              <Table.Td>
                {change.fromStart ? `${formatDay(change.fromStart)} → ` : ''}
                {formatDay(change.toStart)}
              </Table.Td>
              <Table.Td>
                {change.fromCrewName !== change.toCrewName && change.fromCrewName
                  ? `${change.fromCrewName} → `
                  : ''}
                {change.toCrewName ?? 'No crew'}
              </Table.Td>
              <Table.Td>{change.reason ? RESCHEDULE_REASON_LABELS[change.reason] : '—'}</Table.Td>
              <Table.Td>{change.note ?? ''}</Table.Td>
              <Table.Td>{change.actorName}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
