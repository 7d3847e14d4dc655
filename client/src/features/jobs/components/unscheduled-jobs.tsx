import { Anchor, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { useJobs } from '../api/get-jobs';

/** Jobs waiting for a start date, beside the calendar so they can be picked up and planned. */
export function UnscheduledJobs({ jobHref }: { jobHref: (id: string) => string }) {
  // Without a range the server includes the jobs that have no start; only those are listed here.
  const jobs = useJobs();
  const waiting = (jobs.data ?? []).filter(
    (job) => job.plannedStart === null && job.status !== 'closed',
  );

  return (
    <Paper p="md" component="section" aria-labelledby="unscheduled-title">
      <Title order={2} fz="h5" id="unscheduled-title" mb="xs">
        Not scheduled yet
      </Title>
      {jobs.isError ? (
        <ErrorPanel error={jobs.error} onRetry={() => void jobs.refetch()} />
      ) : !jobs.data ? (
        <Skeleton height={60} />
      ) : waiting.length === 0 ? (
        <Text size="sm" c="dimmed">
          Every job has a start date.
        </Text>
      ) : (
        <Stack gap="xs" component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
          {waiting.map((job) => (
            <li key={job.id}>
              <Anchor component={Link} to={jobHref(job.id)} size="sm" fw={500}>
                #{job.number} {job.title}
              </Anchor>
              <Text size="xs" c="dimmed">
                {job.customerName} · {job.plannedCrewDays} crew days
              </Text>
            </li>
          ))}
        </Stack>
      )}
    </Paper>
  );
}
