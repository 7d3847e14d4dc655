import { Badge, Button, Group, Paper, Stack, Text } from '@mantine/core';
import type { JobListItem } from '@pondwright/shared';
import { IconNotebook } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDay } from '../utils/dates';
import { JOB_STATUS_LABELS } from '../utils/labels';

type JobCardProps = {
  job: JobListItem;
  today: string;
  /** Logs of this job still on the phone. */
  waiting: number;
};

function plannedDays(job: JobListItem): string {
  if (!job.plannedStart) return 'No date yet';
  if (!job.plannedEnd || job.plannedEnd === job.plannedStart) return formatDay(job.plannedStart);
  return `${formatDay(job.plannedStart)} – ${formatDay(job.plannedEnd)}`;
}

export function JobCard({ job, today, waiting }: JobCardProps) {
  return (
    <Paper withBorder p="sm" component="article" aria-label={`#${job.number} ${job.title}`}>
      <Stack gap="xs">
        <Group justify="space-between" wrap="nowrap" align="flex-start" gap="xs">
          <Stack gap={0} miw={0}>
            <Text fw={600}>
              #{job.number} {job.title}
            </Text>
            <Text size="sm" c="dimmed">
              {job.customerName}
            </Text>
          </Stack>
          <Badge
            variant="light"
            color={job.status === 'in_progress' ? 'reed' : 'gray'}
            style={{ flexShrink: 0 }}
          >
            {JOB_STATUS_LABELS[job.status]}
          </Badge>
        </Group>
        {job.siteAddress && <Text size="sm">{job.siteAddress}</Text>}
        <Text size="sm" c="dimmed">
          {plannedDays(job)}
          {job.crewName ? ` · ${job.crewName}` : ''}
        </Text>
        {waiting > 0 && (
          <Badge color="clay" variant="light">
            {waiting} not sent yet
          </Badge>
        )}
        <Button
          component={Link}
          to={paths.jobLog.getHref(job.id, today)}
          size="md"
          fullWidth
          leftSection={<IconNotebook size={18} />}
        >
          Today’s log
        </Button>
      </Stack>
    </Paper>
  );
}
