import { Alert, Group, Stack, Text, TextInput, Title } from '@mantine/core';
import type { DailyLogView, JobView } from '@pondwright/shared';
import { useQueryClient } from '@tanstack/react-query';
import { IconCloudOff } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { NetworkError } from '@/lib/api-error';
import { putLogInCache, useLogJob } from '../api/get-log-job';
import { draftKey as draftKeyFor, writeDraft } from '../storage/draft-store';
import { formatTime, isIsoDay } from '../utils/dates';
import { defaultLoadVolume } from '../utils/default-load-volume';
import { initialDraft, peopleOn } from '../utils/initial-draft';
import { logToValues } from '../utils/log-values';
import { CrewPlan } from './crew-plan';
import { DailyLogForm } from './daily-log-form';

type DailyLogPageProps = {
  jobId: string;
  logDate: string;
  userId: string;
  /** Opens another day's log of the same job. */
  onDayChange: (logDate: string) => void;
};

/** One job's log for one day, written on a phone, with or without a connection. */
export function DailyLogPage({ jobId, logDate, userId, onDayChange }: DailyLogPageProps) {
  const job = useLogJob(jobId, userId);
  const queryClient = useQueryClient();
  // Bumped when the form must open again from storage (after "Use the saved one").
  const [generation, setGeneration] = useState(0);

  if (job.isPending) return <PageLoader label="Opening the day’s log…" />;
  // No connection and no copy on the phone: the day can still be written, by typing items in.
  const unreachable = job.isError && job.error instanceof NetworkError;
  if (job.isError && !unreachable) {
    return (
      <ErrorPanel
        title="Could not open the job"
        error={job.error}
        onRetry={() => void job.refetch()}
      />
    );
  }
  const data = job.data?.data ?? null;
  const draftKey = draftKeyFor(userId, jobId, logDate);
  const jobLabel = data ? `#${data.number} ${data.title}` : 'A job not loaded yet';

  const useSaved = (current: DailyLogView) => {
    writeDraft(draftKey, {
      logId: current.id,
      jobId,
      logDate,
      baseRevision: current.revision,
      values: logToValues(current, data?.crewBudget ?? []),
      dirty: false,
      updatedAt: new Date().toISOString(),
    });
    putLogInCache(queryClient, current);
    setGeneration((value) => value + 1);
  };

  return (
    <Stack gap="md">
      <Stack gap={4}>
        <Title order={1} fz="h3">
          {jobLabel}
        </Title>
        {data && (
          <Text c="dimmed" size="sm">
            {[data.customerName, data.siteAddress].filter(Boolean).join(' · ')}
          </Text>
        )}
      </Stack>
      <Group align="flex-end" gap="sm">
        <TextInput
          type="date"
          label="Day"
          size="md"
          value={logDate}
          onChange={(event) => {
            const day = event.currentTarget.value;
            if (isIsoDay(day)) onDayChange(day);
          }}
        />
      </Group>
      {unreachable && (
        <Alert color="clay" variant="light" icon={<IconCloudOff />} title="No connection">
          This phone has no copy of the job yet, so type items in by hand. The log is kept here and
          sent later.
        </Alert>
      )}
      {job.data?.copiedAt && (
        <Text size="xs" c="dimmed">
          No connection: the job as this phone last saw it ({formatTime(job.data.copiedAt)}).
        </Text>
      )}
      {data?.status === 'closed' && (
        <Alert color="clay" variant="light" title="This job is closed">
          A closed job takes no more logs.
        </Alert>
      )}
      <CrewPlan lines={data?.crewBudget ?? []} />
      <LogEditor
        key={`${draftKey}.${generation}`}
        userId={userId}
        jobId={jobId}
        logDate={logDate}
        draftKey={draftKey}
        jobLabel={jobLabel}
        data={data}
        onUseSaved={useSaved}
      />
    </Stack>
  );
}

type LogEditorProps = {
  userId: string;
  jobId: string;
  logDate: string;
  draftKey: string;
  jobLabel: string;
  /** The job without its money; null when it could not be loaded. */
  data: JobView | null;
  onUseSaved: (current: DailyLogView) => void;
};

/** Picks the copy to open once, when the day opens; later answers from the server do not reset typing. */
function LogEditor({
  userId,
  jobId,
  logDate,
  draftKey,
  jobLabel,
  data,
  onUseSaved,
}: LogEditorProps) {
  const [initial] = useState(() => initialDraft({ draftKey, userId, jobId, logDate, job: data }));
  const [loadVolume] = useState(() => defaultLoadVolume(data, userId));
  return (
    <DailyLogForm
      userId={userId}
      jobLabel={jobLabel}
      draftKey={draftKey}
      initial={initial}
      lines={data?.crewBudget ?? []}
      people={peopleOn(data)}
      defaultLoadVolume={loadVolume}
      stored={data?.logs.find((log) => log.id === initial.logId) ?? null}
      onUseSaved={onUseSaved}
    />
  );
}
