import { Group, Stack, Text, Title } from '@mantine/core';
import type { JobView } from '@pondwright/shared';
import type { ReactNode } from 'react';
import { formatDay } from '../utils/week';
import { JobStatusBadge } from './job-status-badge';
import { PlannedDays } from './planned-days';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text size="sm" component="div">
        {children}
      </Text>
    </Stack>
  );
}

/** Who the job is for, where, who builds it and when; the actions sit to the right. */
export function JobHeader({ job, actions }: { job: JobView; actions?: ReactNode }) {
  return (
    <Stack gap="sm" mb="md">
      <Group justify="space-between" align="flex-start" gap="sm">
        <Stack gap={4}>
          <Group gap="sm">
            <Title order={1} fz="h2">
              #{job.number} {job.title}
            </Title>
            <JobStatusBadge status={job.status} />
          </Group>
          <Text c="dimmed" size="sm">
            {job.customerName}
            {job.siteAddress ? ` · ${job.siteAddress}` : ''}
          </Text>
        </Stack>
        {actions && <Group gap="sm">{actions}</Group>}
      </Group>
      <Group gap="xl" role="group" aria-label="Plan">
        <Fact label="Crew">{job.crewName ?? 'No crew yet'}</Fact>
        <Fact label="Planned">
          <PlannedDays job={job} />
        </Fact>
        <Fact label="Crew days">{job.plannedCrewDays}</Fact>
        {job.startedOn && <Fact label="Started">{formatDay(job.startedOn)}</Fact>}
        {job.completedOn && <Fact label="Completed">{formatDay(job.completedOn)}</Fact>}
      </Group>
    </Stack>
  );
}
