import { Button, Paper, Tabs, Text } from '@mantine/core';
import type { JobView } from '@pondwright/shared';
import { IconCalendarEvent } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { useJob } from '../api/get-job';
import { DailyLogs } from './daily-logs';
import { CrewBudgetView, JobBudgetView } from './job-budget';
import { JobHeader } from './job-header';
import { JobReport } from './job-report';
import { JobStatusActions } from './job-status-actions';
import { RescheduleModal } from './reschedule-modal';
import { ScheduleHistory } from './schedule-history';

/** What the signed-in role may see and do here; the server enforces the same rules. */
export type JobAccess = {
  /** Budget money and the cost report: owners and estimators. */
  money: boolean;
  /** Moving the job: owners and estimators. */
  schedule: boolean;
  /** Closing a completed job: owners. */
  close: boolean;
};

type JobPageProps = {
  id: string;
  access: JobAccess;
  /** The crew's log for one day of this job. */
  logHref: (jobId: string, date: string) => string;
};

function JobDetails({ job, access, logHref }: { job: JobView } & Omit<JobPageProps, 'id'>) {
  const [rescheduling, setRescheduling] = useState(false);
  // A finished job is not moved; its schedule history stays as it was.
  const movable = access.schedule && (job.status === 'scheduled' || job.status === 'in_progress');

  return (
    <>
      <JobHeader
        job={job}
        actions={
          <>
            {movable && (
              <Button
                variant="default"
                leftSection={<IconCalendarEvent size={16} />}
                onClick={() => setRescheduling(true)}
              >
                {job.plannedStart ? 'Reschedule' : 'Schedule'}
              </Button>
            )}
            <JobStatusActions job={job} canClose={access.close} />
          </>
        }
      />
      {/* Panels mount only when chosen, so the cost report is fetched when someone opens it. */}
      <Tabs defaultValue="plan" keepMounted={false}>
        <Tabs.List mb="md">
          <Tabs.Tab value="plan">{access.money ? 'Budget' : 'What to build'}</Tabs.Tab>
          <Tabs.Tab value="logs">Daily logs ({job.logs.length})</Tabs.Tab>
          <Tabs.Tab value="schedule">Schedule history</Tabs.Tab>
          {access.money && <Tabs.Tab value="report">Cost report</Tabs.Tab>}
        </Tabs.List>
        <Tabs.Panel value="plan">
          <Paper p="md">
            {job.budget ? (
              <JobBudgetView budget={job.budget} />
            ) : (
              <CrewBudgetView lines={job.crewBudget} />
            )}
          </Paper>
        </Tabs.Panel>
        <Tabs.Panel value="logs">
          <Paper p="md">
            <DailyLogs job={job} logHref={(date) => logHref(job.id, date)} />
          </Paper>
        </Tabs.Panel>
        <Tabs.Panel value="schedule">
          <Paper p="md">
            <ScheduleHistory changes={job.scheduleChanges} />
          </Paper>
        </Tabs.Panel>
        {access.money && (
          <Tabs.Panel value="report">
            <Paper p="md">
              <JobReport job={job} />
            </Paper>
          </Tabs.Panel>
        )}
      </Tabs>
      {movable && (
        <RescheduleModal opened={rescheduling} job={job} onClose={() => setRescheduling(false)} />
      )}
    </>
  );
}

/** One job: its header and actions, then the budget, logs, schedule history and cost report. */
export function JobPage({ id, access, logHref }: JobPageProps) {
  const job = useJob(id);
  if (job.isPending) return <PageLoader label="Opening the job…" />;
  if (job.isError) {
    return (
      <ErrorPanel
        title="Could not open the job"
        error={job.error}
        onRetry={() => void job.refetch()}
      />
    );
  }
  return (
    <>
      {job.data.status === 'closed' && (
        <Text size="sm" c="dimmed" mb="xs">
          This job is closed: its logs and cost report no longer change.
        </Text>
      )}
      <JobDetails job={job.data} access={access} logHref={logHref} />
    </>
  );
}
