import { Text } from '@mantine/core';
import type { JobListItem } from '@pondwright/shared';
import { formatDayRange } from '../utils/week';

/** "Mar 2 – Mar 4, 2026", or a quiet "Not scheduled" before the job has a start. */
export function PlannedDays({ job }: { job: Pick<JobListItem, 'plannedStart' | 'plannedEnd'> }) {
  if (!job.plannedStart) {
    return (
      <Text span size="sm" c="dimmed">
        Not scheduled
      </Text>
    );
  }
  return <>{formatDayRange(job.plannedStart, job.plannedEnd)}</>;
}
