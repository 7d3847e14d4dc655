import { Paper, SegmentedControl, Stack, Text, Title } from '@mantine/core';
import type { JobListItem } from '@pondwright/shared';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { useCrewJobs, useCrews } from '../api/get-crew-jobs';
import { useOutbox } from '../hooks/use-outbox';
import { formatTime, todayIsoDate } from '../utils/dates';
import { itemsOf } from '../utils/outbox-views';
import { JobCard } from './job-card';
import { WaitingLogsList } from './waiting-logs-list';

const byStart = (a: JobListItem, b: JobListItem) =>
  (a.plannedStart ?? '').localeCompare(b.plannedStart ?? '') || a.number - b.number;

/** On site today: under way, or planned to have started (a late start still needs its log). */
const isToday = (job: JobListItem, today: string) =>
  job.status === 'in_progress' || (job.plannedStart !== null && job.plannedStart <= today);

function JobGroup(props: {
  title: string;
  empty: string;
  jobs: JobListItem[];
  today: string;
  waiting: Map<string, number>;
}) {
  const { title, empty, jobs, today, waiting } = props;
  return (
    <Stack gap="sm" component="section" aria-label={title}>
      <Title order={2} fz="h4">
        {title}
      </Title>
      {jobs.length === 0 ? (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      ) : (
        jobs.map((job) => (
          <JobCard key={job.id} job={job} today={today} waiting={waiting.get(job.id) ?? 0} />
        ))
      )}
    </Stack>
  );
}

/** A crew lead's day: the jobs on site today and the ones coming up, with anything not yet sent. */
export function CrewJobs({ userId }: { userId: string }) {
  const [today] = useState(todayIsoDate);
  const jobs = useCrewJobs(today, userId);
  const crews = useCrews(userId);
  const outbox = useOutbox();
  const [scope, setScope] = useState<'mine' | 'all'>('mine');

  if (jobs.isPending) return <PageLoader label="Loading your jobs…" />;
  if (jobs.isError) {
    return (
      <ErrorPanel
        title="Could not load your jobs"
        error={jobs.error}
        onRetry={() => void jobs.refetch()}
      />
    );
  }

  const myCrewIds = new Set(
    (crews.data?.data ?? []).filter((crew) => crew.leadUserId === userId).map((crew) => crew.id),
  );
  // A lead of a crew sees that crew's jobs first and can widen the list to cover for another crew.
  const narrowed = myCrewIds.size > 0 && scope === 'mine';
  const shown = jobs.data.data
    .filter((job) => !narrowed || (job.crewId !== null && myCrewIds.has(job.crewId)))
    .sort(byStart);
  const waiting = new Map<string, number>();
  const mine = itemsOf(outbox.items, userId);
  for (const item of mine) waiting.set(item.jobId, (waiting.get(item.jobId) ?? 0) + 1);

  return (
    <Stack gap="lg">
      {mine.length > 0 && (
        <Paper withBorder p="sm" component="section" aria-label="Not sent yet">
          <Title order={2} fz="h5" mb="xs">
            Not sent yet
          </Title>
          <WaitingLogsList userId={userId} />
        </Paper>
      )}
      {jobs.data.copiedAt && (
        <Text size="xs" c="dimmed">
          No connection: the list as this phone last saw it ({formatTime(jobs.data.copiedAt)}).
        </Text>
      )}
      {myCrewIds.size > 0 && (
        <SegmentedControl
          fullWidth
          size="md"
          aria-label="Whose jobs"
          value={scope}
          onChange={(value) => setScope(value as 'mine' | 'all')}
          data={[
            { value: 'mine', label: 'My crew' },
            { value: 'all', label: 'All crews' },
          ]}
        />
      )}
      <JobGroup
        title="Today"
        empty="Nothing on the schedule today."
        jobs={shown.filter((job) => isToday(job, today))}
        today={today}
        waiting={waiting}
      />
      <JobGroup
        title="Coming up"
        empty="Nothing planned for the next two weeks."
        jobs={shown.filter((job) => !isToday(job, today))}
        today={today}
        waiting={waiting}
      />
    </Stack>
  );
}
