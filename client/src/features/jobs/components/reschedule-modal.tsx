import {
  Alert,
  Button,
  Group,
  Modal,
  Select,
  Stack,
  Text,
  Textarea,
  TextInput,
} from '@mantine/core';
import {
  RESCHEDULE_REASONS,
  rescheduleJobRequestSchema,
  type JobView,
  type RescheduleReason,
} from '@pondwright/shared';
import { useMemo } from 'react';
import { todayIsoDate } from '@/lib/format';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useCrews } from '../api/get-crews';
import { useRescheduleJob, type RescheduleJobRequest } from '../api/reschedule-job';
import { RESCHEDULE_REASON_LABELS } from '../utils/labels';
import { formatDay } from '../utils/week';

// Mantine's Select keeps string values; this one stands for "no crew" (null in the request).
const NO_CREW = 'none';
const REASON_OPTIONS = RESCHEDULE_REASONS.map((reason) => ({
  value: reason,
  label: RESCHEDULE_REASON_LABELS[reason],
}));

/** "3.0" and "3" are the same crew days; the field shows the short form the schema accepts. */
function plainDays(value: string): string {
  const number = Number(value);
  return Number.isFinite(number) ? String(number) : value;
}

type Job = Pick<JobView, 'id' | 'plannedStart' | 'crewId' | 'plannedCrewDays'>;

function RescheduleForm({ job, onClose }: { job: Job; onClose: () => void }) {
  const crews = useCrews();
  const reschedule = useRescheduleJob();
  // Once the job had a start, the server wants to know why it moves; the form says so first.
  const hadStart = job.plannedStart !== null;
  const schema = useMemo(
    () =>
      rescheduleJobRequestSchema.superRefine((values, context) => {
        if (hadStart && !values.reason) {
          context.addIssue({ code: 'custom', path: ['reason'], message: 'Choose a reason' });
        }
      }),
    [hadStart],
  );
  const initialDays = plainDays(job.plannedCrewDays);
  const form = useSchemaForm(schema, {
    plannedStart: job.plannedStart ?? todayIsoDate(),
    crewId: job.crewId,
    plannedCrewDays: initialDays,
    reason: undefined,
    note: '',
  });

  const submit = form.onSubmit((values) => {
    // Crew days go only when changed, so the server keeps its own figure otherwise.
    const request: RescheduleJobRequest = {
      plannedStart: values.plannedStart,
      crewId: values.crewId,
      ...(values.plannedCrewDays && values.plannedCrewDays !== initialDays
        ? { plannedCrewDays: values.plannedCrewDays }
        : {}),
      ...(values.reason ? { reason: values.reason } : {}),
      ...(values.note ? { note: values.note } : {}),
    };
    reschedule.mutate(
      { id: job.id, request },
      {
        onSuccess: () => {
          notifySuccess(`Planned to start ${formatDay(request.plannedStart)}`);
          onClose();
        },
        onError: (error) => applyApiErrorToForm(form, error, 'Could not move the job'),
      },
    );
  });

  const crewOptions = [
    { value: NO_CREW, label: 'No crew yet' },
    ...(crews.data ?? []).map((crew) => ({ value: crew.id, label: crew.name })),
  ];

  return (
    <form onSubmit={submit} noValidate aria-label="Reschedule the job">
      <Stack gap="md">
        {hadStart && (
          <Text size="sm">
            Planned to start {formatDay(job.plannedStart)}. Every move is kept in the job’s schedule
            history with its reason.
          </Text>
        )}
        <Group grow align="flex-start">
          <TextInput
            type="date"
            label="Start"
            withAsterisk
            data-autofocus
            key={form.key('plannedStart')}
            {...form.getInputProps('plannedStart')}
          />
          <TextInput
            label="Crew days"
            inputMode="decimal"
            description="Working days, Monday to Friday"
            key={form.key('plannedCrewDays')}
            {...form.getInputProps('plannedCrewDays')}
          />
        </Group>
        <Select
          label="Crew"
          data={crewOptions}
          placeholder={crews.isPending ? 'Loading crews…' : undefined}
          allowDeselect={false}
          error={form.errors.crewId}
          value={form.getValues().crewId ?? NO_CREW}
          onChange={(value) => form.setFieldValue('crewId', value === NO_CREW ? null : value)}
        />
        <Select
          label="Reason"
          withAsterisk={hadStart}
          placeholder={hadStart ? 'Why does it move?' : 'Optional for a first date'}
          data={REASON_OPTIONS}
          clearable
          error={form.errors.reason}
          value={form.getValues().reason ?? null}
          onChange={(value) => {
            form.setFieldValue('reason', (value as RescheduleReason | null) ?? undefined);
            form.validateField('reason');
          }}
        />
        <Textarea
          label="Note"
          description="Optional; kept with the move."
          resize="vertical"
          rows={2}
          key={form.key('note')}
          {...form.getInputProps('note')}
        />
        {crews.isError && (
          <Alert color="red" variant="light">
            The crews could not be loaded; the job keeps its crew unless you choose again.
          </Alert>
        )}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={reschedule.isPending}>
            Save the new date
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

export function RescheduleModal({
  opened,
  job,
  onClose,
}: {
  opened: boolean;
  job: Job;
  onClose: () => void;
}) {
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={job.plannedStart ? 'Reschedule the job' : 'Schedule the job'}
      centered
    >
      {/* Mounted only while open, so each opening starts from the job's current plan. */}
      {opened && <RescheduleForm job={job} onClose={onClose} />}
    </Modal>
  );
}
