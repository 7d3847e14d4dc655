import { Button, Grid, Group, Stack } from '@mantine/core';
import { IconList } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { CrewsPanel } from '@/features/jobs/components/crews-panel';
import { JobSchedule } from '@/features/jobs/components/job-schedule';
import { UnscheduledJobs } from '@/features/jobs/components/unscheduled-jobs';
import { canAccess } from '@/lib/authorization';

function JobSchedulePage() {
  const user = useSignedInUser();
  return (
    <>
      <Group justify="space-between" align="flex-start">
        <PageHeader title="Schedule" description="Each crew's week, Monday to Friday." />
        <Button
          component={Link}
          to={paths.jobs.getHref()}
          variant="light"
          leftSection={<IconList size={16} />}
        >
          All jobs
        </Button>
      </Group>
      <Grid gap="md">
        <Grid.Col span={{ base: 12, lg: 9 }}>
          <JobSchedule jobHref={paths.job.getHref} />
        </Grid.Col>
        <Grid.Col span={{ base: 12, lg: 3 }}>
          <Stack gap="md">
            <UnscheduledJobs jobHref={paths.job.getHref} />
            {canAccess(user.role, 'crewsEdit') && <CrewsPanel />}
          </Stack>
        </Grid.Col>
      </Grid>
    </>
  );
}

export function JobScheduleRoute() {
  return (
    <RequireRole area="jobs" areaName="jobs">
      <JobSchedulePage />
    </RequireRole>
  );
}
