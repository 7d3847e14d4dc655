import { Button, Grid, NativeSelect, TextInput } from '@mantine/core';
import { inviteSchema, type CreatedInvite } from '@pondwright/shared';
import { IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { useCreateInvite } from '../api/create-invite';
import { InviteLinkCard } from './invite-link-card';
import { roleOptions } from './role-options';

export function InviteForm() {
  const form = useSchemaForm(inviteSchema, { email: '', role: 'estimator' });
  const createInvite = useCreateInvite();
  const [created, setCreated] = useState<CreatedInvite | null>(null);

  const submit = form.onSubmit((values) =>
    createInvite.mutate(values, {
      onSuccess: (invite) => {
        setCreated(invite);
        form.reset();
      },
      onError: (error) => applyApiErrorToForm(form, error, 'Could not create the invite'),
    }),
  );

  return (
    <>
      <form onSubmit={submit} noValidate aria-label="Invite a team member">
        <Grid align="flex-start" gap="sm">
          <Grid.Col span={{ base: 12, sm: 6 }}>
            <TextInput
              label="E-mail"
              type="email"
              autoComplete="off"
              required
              {...form.getInputProps('email')}
            />
          </Grid.Col>
          <Grid.Col span={{ base: 12, sm: 3 }}>
            <NativeSelect
              label="Role"
              data={roleOptions}
              required
              {...form.getInputProps('role')}
            />
          </Grid.Col>
          <Grid.Col span={{ base: 12, sm: 3 }}>
            <Button
              type="submit"
              fullWidth
              // Lines the button up with the inputs, below their one-line labels.
              mt={{ base: 0, sm: 'calc(var(--mantine-font-size-sm) * var(--mantine-line-height))' }}
              loading={createInvite.isPending}
              leftSection={<IconSend size={16} />}
            >
              Send invite
            </Button>
          </Grid.Col>
        </Grid>
      </form>
      {created && <InviteLinkCard invite={created} onDismiss={() => setCreated(null)} />}
    </>
  );
}
