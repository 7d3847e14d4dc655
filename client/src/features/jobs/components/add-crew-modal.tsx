import { Button, Group, Modal, Select, Stack, TextInput } from '@mantine/core';
import { createCrewRequestSchema, ROLE_LABELS, type TeamMember } from '@pondwright/shared';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useCreateCrew } from '../api/create-crew';
import { useTeamMembers } from '../api/get-team-members';

/** Active people, crew leads first: they are the usual choice, but anyone may lead a crew. */
function leadOptions(members: readonly TeamMember[]) {
  return members
    .filter((member) => member.active)
    .sort(
      (a, b) =>
        Number(b.role === 'crew_lead') - Number(a.role === 'crew_lead') ||
        a.name.localeCompare(b.name),
    )
    .map((member) => ({ value: member.id, label: `${member.name} (${ROLE_LABELS[member.role]})` }));
}

function AddCrewForm({ onClose }: { onClose: () => void }) {
  const members = useTeamMembers();
  const create = useCreateCrew();
  const form = useSchemaForm(createCrewRequestSchema, { name: '', leadUserId: null });

  const submit = form.onSubmit((values) =>
    create.mutate(values, {
      onSuccess: (crew) => {
        notifySuccess(`${crew.name} added`);
        onClose();
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not add the crew'),
    }),
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Add a crew">
      <Stack gap="md">
        <TextInput
          label="Crew name"
          withAsterisk
          data-autofocus
          key={form.key('name')}
          {...form.getInputProps('name')}
        />
        <Select
          label="Crew lead"
          description="Optional. The crew lead keeps the crew's daily logs."
          placeholder={members.isPending ? 'Loading the team…' : 'Choose someone'}
          data={leadOptions(members.data ?? [])}
          clearable
          searchable
          error={form.errors.leadUserId}
          value={form.getValues().leadUserId ?? null}
          onChange={(value) => form.setFieldValue('leadUserId', value)}
        />
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={create.isPending}>
            Add crew
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

export function AddCrewModal({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  return (
    <Modal opened={opened} onClose={onClose} title="Add a crew" centered>
      {/* Mounted only while open: each opening starts empty, and the team is asked for only then. */}
      {opened && <AddCrewForm onClose={onClose} />}
    </Modal>
  );
}
