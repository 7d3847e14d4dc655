import { Alert, Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { createJobRequestSchema, type EstimateView } from '@pondwright/shared';
import { IconArrowRight, IconShovel } from '@tabler/icons-react';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { errorMessage, isApiError } from '@/lib/api-error';
import { useSchemaForm } from '@/lib/form';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useCreateJob } from '../api/create-job';
import { useCrewOptions } from '../api/get-crews';
import { estimateKeys } from '../api/get-estimates';

// Mantine's Select keeps string values; this one stands for "no crew yet" (left out of the request).
const NO_CREW = 'none';

type Estimate = Pick<EstimateView, 'id' | 'jobId'>;

function MakeJobForm({ estimate, onClose }: { estimate: Estimate; onClose: () => void }) {
  const crews = useCrewOptions({ enabled: true });
  const create = useCreateJob();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const form = useSchemaForm(createJobRequestSchema, {
    estimateId: estimate.id,
    crewId: null,
    plannedStart: null,
  });

  const submit = form.onSubmit(({ estimateId, crewId, plannedStart }) =>
    create.mutate(
      { estimateId, ...(crewId ? { crewId } : {}), ...(plannedStart ? { plannedStart } : {}) },
      {
        onSuccess: (job) => {
          notifySuccess(`Job #${job.number} made`);
          onClose();
          void navigate(paths.job.getHref(job.id));
        },
        onError: (error) => {
          // Someone made the job meanwhile: the estimate's fresh copy carries its link, and the dialog
          // gives way to it, so the reason is also shown as a notification.
          if (isApiError(error, 409)) {
            notifyApiError(error, 'Could not make the job');
            void queryClient.invalidateQueries({ queryKey: estimateKeys.detail(estimate.id) });
          }
        },
      },
    ),
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Make it a job">
      <Stack gap="md">
        <Text size="sm">
          The job carries the accepted version’s lines as its budget. A crew and a start can wait;
          set them on the schedule later.
        </Text>
        <Select
          label="Crew"
          data={[
            { value: NO_CREW, label: 'No crew yet' },
            ...(crews.data ?? []).map((crew) => ({ value: crew.id, label: crew.name })),
          ]}
          placeholder={crews.isPending ? 'Loading crews…' : undefined}
          allowDeselect={false}
          error={form.errors.crewId}
          value={form.getValues().crewId ?? NO_CREW}
          onChange={(value) => form.setFieldValue('crewId', value === NO_CREW ? null : value)}
        />
        <TextInput
          type="date"
          label="Planned start"
          description="Optional"
          error={form.errors.plannedStart}
          value={form.getValues().plannedStart ?? ''}
          onChange={(event) =>
            form.setFieldValue('plannedStart', event.currentTarget.value || null)
          }
        />
        {create.isError && (
          <Alert color="red" variant="light" role="alert">
            {errorMessage(create.error)}
          </Alert>
        )}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={create.isPending} leftSection={<IconShovel size={16} />}>
            Make the job
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

/** On an accepted estimate: make its job, or open the one already made. */
export function MakeJob({ estimate }: { estimate: Estimate }) {
  const [opened, setOpened] = useState(false);
  if (estimate.jobId) {
    return (
      <Button
        component={Link}
        to={paths.job.getHref(estimate.jobId)}
        variant="light"
        rightSection={<IconArrowRight size={16} />}
      >
        Open the job
      </Button>
    );
  }
  return (
    <>
      <Button leftSection={<IconShovel size={16} />} onClick={() => setOpened(true)}>
        Make it a job
      </Button>
      <Modal opened={opened} onClose={() => setOpened(false)} title="Make it a job" centered>
        {/* Mounted only while open, so the crews are asked for only when someone needs them. */}
        {opened && <MakeJobForm estimate={estimate} onClose={() => setOpened(false)} />}
      </Modal>
    </>
  );
}
