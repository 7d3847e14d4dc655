import { Text, UnstyledButton } from '@mantine/core';
import { Link } from 'react-router-dom';
import type { ScheduleBar } from '../utils/schedule-rows';
import { formatDayRange } from '../utils/week';
import { JOB_STATUS_LABELS } from './job-status-badge';

const BAR_COLORS = {
  scheduled: 'blue',
  in_progress: 'clay',
  completed: 'reed',
  closed: 'stone',
} as const;

/** A job drawn across the days it is planned for this week; it opens the job. */
export function ScheduleBarLink({ bar, href }: { bar: ScheduleBar; href: string }) {
  const { job } = bar;
  const color = BAR_COLORS[job.status];
  const days = job.plannedStart ? formatDayRange(job.plannedStart, job.plannedEnd) : '';
  return (
    <UnstyledButton
      component={Link}
      to={href}
      title={`${days} · ${JOB_STATUS_LABELS[job.status]}`}
      px="xs"
      py={4}
      style={{
        gridColumn: `${bar.column} / span ${bar.span}`,
        background: `var(--mantine-color-${color}-light)`,
        borderLeft: bar.continuesBefore ? 'none' : `4px solid var(--mantine-color-${color}-6)`,
        // A square end says the job carries on into the next (or came from the last) week.
        borderRadius: `${bar.continuesBefore ? 0 : 6}px ${bar.continuesAfter ? 0 : 6}px ${
          bar.continuesAfter ? 0 : 6
        }px ${bar.continuesBefore ? 0 : 6}px`,
        minWidth: 0,
      }}
    >
      <Text size="sm" fw={600} truncate>
        {bar.continuesBefore && '‹ '}#{job.number} {job.title}
        {bar.continuesAfter && ' ›'}
      </Text>
      <Text size="xs" c="dimmed" truncate>
        {job.customerName}
      </Text>
    </UnstyledButton>
  );
}
