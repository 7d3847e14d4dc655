import { Button, Paper, Tabs, Text } from '@mantine/core';
import type { JobView } from '@pondwright/shared';
import { IconCalendarEvent } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { useJob } from '../api/get-job';
import { ChangeOrders } from './change-orders';
import { DailyLogs } from './daily-logs';
import { FinalInvoice } from './final-invoice';
import { CrewBudgetView, JobBudgetView } from './job-budget';
import { JobHeader } from './job-header';
import { JobPhotos } from './job-photos';
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
  // The final invoice follows the finished work (the server answers 409 JOB_NOT_COMPLETE before).
  const invoiceable = access.money && (job.status === 'completed' || job.status === 'closed');
  const [tab, setTab] = useState('plan');
  // A tab can go away under the user (a job found not complete loses its invoice tab).
  const shownTab = tab === 'invoice' && !invoiceable ? 'plan' : tab;

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
      <Tabs value={shownTab} onChange={(value) => setTab(value ?? 'plan')} keepMounted={false}>
        <Tabs.List mb="md">
          <Tabs.Tab value="plan">{access.money ? 'Budget' : 'What to build'}</Tabs.Tab>
          <Tabs.Tab value="logs">Daily logs ({job.logs.length})</Tabs.Tab>
          <Tabs.Tab value="schedule">Schedule history</Tabs.Tab>
          {access.money && <Tabs.Tab value="report">Cost report</Tabs.Tab>}
          {access.money && <Tabs.Tab value="changes">Change orders</Tabs.Tab>}
          {invoiceable && <Tabs.Tab value="invoice">Final invoice</Tabs.Tab>}
          <Tabs.Tab value="photos">Photos</Tabs.Tab>
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
        {access.money && (
          <Tabs.Panel value="changes">
            <Paper p="md">
              <ChangeOrders job={job} />
            </Paper>
          </Tabs.Panel>
        )}
        {invoiceable && (
          <Tabs.Panel value="invoice">
            <Paper p="md">
              <FinalInvoice job={job} />
            </Paper>
          </Tabs.Panel>
        )}
        <Tabs.Panel value="photos">
          <Paper p="md">
            <JobPhotos jobId={job.id} />
          </Paper>
        </Tabs.Panel>
      </Tabs>
      {movable && (
        <RescheduleModal opened={rescheduling} job={job} onClose={() => setRescheduling(false)} />
      )}
    </>
  );
}

/**
 * One job: its header and actions, then the budget, logs, schedule history, cost report, change
 * orders, final invoice and photos.
 */
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
