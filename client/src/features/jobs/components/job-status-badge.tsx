import { Badge } from '@mantine/core';
import type { JobStatus } from '@pondwright/shared';

export const JOB_STATUS_LABELS: Record<JobStatus, string> = {
  scheduled: 'Scheduled',
  in_progress: 'In progress',
  completed: 'Completed',
  closed: 'Closed',
};

// Reed, clay and stone are the theme's own; blue is Mantine's, which the theme keeps.
const STATUS_COLORS: Record<JobStatus, { color: string; variant: 'light' | 'filled' | 'outline' }> =
  {
    scheduled: { color: 'blue', variant: 'light' },
    in_progress: { color: 'clay', variant: 'light' },
    completed: { color: 'reed', variant: 'filled' },
    closed: { color: 'stone', variant: 'outline' },
  };

export function JobStatusBadge({ status }: { status: JobStatus }) {
  const { color, variant } = STATUS_COLORS[status];
  return (
    <Badge color={color} variant={variant} tt="none">
      {JOB_STATUS_LABELS[status]}
    </Badge>
  );
}
