import { Button, Group, Paper } from '@mantine/core';
import { IconCalendarWeek } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { JobsTable } from '@/features/jobs/components/jobs-table';

export function JobsRoute() {
  return (
    <RequireRole area="jobs" areaName="jobs">
      <Group justify="space-between" align="flex-start">
        <PageHeader
          title="Jobs"
          description="Accepted quotes being built: who has each one, when, and how far along it is."
        />
        <Button
          component={Link}
          to={paths.jobSchedule.getHref()}
          variant="light"
          leftSection={<IconCalendarWeek size={16} />}
        >
          Week schedule
        </Button>
      </Group>
      <Paper p="md">
        <JobsTable jobHref={paths.job.getHref} />
      </Paper>
    </RequireRole>
  );
}
