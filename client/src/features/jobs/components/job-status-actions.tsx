import { Button } from '@mantine/core';
import type { JobView } from '@pondwright/shared';
import { IconCircleCheck, IconLock, IconPlayerPlay } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { notifySuccess } from '@/lib/notify';
import { useSetJobStatus, type NextJobStatus } from '../api/set-job-status';

type Step = {
  status: NextJobStatus;
  label: string;
  icon: typeof IconPlayerPlay;
  title: string;
  body: string;
  done: string;
};

// Scheduled → in progress → completed → closed; each status has one way forward.
const NEXT_STEP: Partial<Record<JobView['status'], Step>> = {
  scheduled: {
    status: 'in_progress',
    label: 'Start job',
    icon: IconPlayerPlay,
    title: 'Start this job?',
    body: 'The job shows as in progress, and the crew keeps daily logs against it.',
    done: 'Job started',
  },
  in_progress: {
    status: 'completed',
    label: 'Mark complete',
    icon: IconCircleCheck,
    title: 'Mark this job complete?',
    body: 'The work is done. Late logs can still be added until an owner closes the job.',
    done: 'Job marked complete',
  },
  completed: {
    status: 'closed',
    label: 'Close job',
    icon: IconLock,
    title: 'Close this job?',
    body: 'A closed job takes no more daily logs, so its cost report stays as it is.',
    done: 'Job closed',
  },
};

type JobStatusActionsProps = {
  job: Pick<JobView, 'id' | 'status'>;
  /** Only owners close a job. */
  canClose: boolean;
};

/** The one button that moves the job forward, asked for once more before it is sent. */
export function JobStatusActions({ job, canClose }: JobStatusActionsProps) {
  const [confirming, setConfirming] = useState(false);
  const setStatus = useSetJobStatus();
  const step = NEXT_STEP[job.status];
  if (!step || (step.status === 'closed' && !canClose)) return null;
  const Icon = step.icon;

  return (
    <>
      <Button
        variant={step.status === 'closed' ? 'default' : 'filled'}
        leftSection={<Icon size={16} />}
        onClick={() => {
          setStatus.reset();
          setConfirming(true);
        }}
      >
        {step.label}
      </Button>
      <ConfirmDialog
        opened={confirming}
        title={step.title}
        confirmLabel={step.label}
        loading={setStatus.isPending}
        error={setStatus.error}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          setStatus.mutate(
            { id: job.id, status: step.status },
            {
              onSuccess: () => {
                notifySuccess(step.done);
                setConfirming(false);
              },
            },
          )
        }
      >
        {step.body}
      </ConfirmDialog>
    </>
  );
}
