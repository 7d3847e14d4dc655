import { List, Stack, Text } from '@mantine/core';
import type { LogEntry } from '@pondwright/shared';
import { MOVEMENT_LABELS, TASK_LABELS, unitLabel } from '../utils/labels';

function entryText(entry: LogEntry): string {
  if (entry.kind === 'hours')
    return `${entry.person}: ${entry.hours} h, ${TASK_LABELS[entry.task]}`;
  const size = entry.loadVolumeLooseCubicYards ? ` of ${entry.loadVolumeLooseCubicYards} yd³` : '';
  const amount = `${entry.quantity} ${unitLabel(entry.unit)}${size} ${entry.description}`;
  if (entry.kind !== 'material' || !entry.movement) return amount;
  const ticket = entry.ticketNumber ? ` (ticket ${entry.ticketNumber})` : '';
  return `${MOVEMENT_LABELS[entry.movement]}: ${amount}${ticket}`;
}

/** A day's log in a few lines, for setting two versions of it side by side. */
export function LogSummary({ log }: { log: { notes: string; entries: LogEntry[] } }) {
  return (
    <Stack gap="xs">
      {log.entries.length === 0 ? (
        <Text size="sm" c="dimmed">
          No rows.
        </Text>
      ) : (
        <List size="sm" spacing={2}>
          {log.entries.map((entry) => (
            <List.Item key={entry.id}>{entryText(entry)}</List.Item>
          ))}
        </List>
      )}
      {log.notes.trim() && (
        <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
          Notes: {log.notes}
        </Text>
      )}
    </Stack>
  );
}
