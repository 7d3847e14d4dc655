import { Alert, Badge, Button, Group, PasswordInput, Stack, Text, TextInput } from '@mantine/core';
import { acceptInviteSchema, PASSWORD_MIN_LENGTH, ROLE_LABELS } from '@pondwright/shared';
import { IconBuildingStore } from '@tabler/icons-react';
import { PageLoader } from '@/components/page-loader';
import { isApiError } from '@/lib/api-error';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { useAcceptInvite } from '../api/accept-invite';
import { useInvitePreview } from '../api/get-invite-preview';
import { InviteUnavailable } from './invite-unavailable';

type AcceptInviteFormProps = {
  token: string;
  onAccepted: () => void;
};

export function AcceptInviteForm({ token, onAccepted }: AcceptInviteFormProps) {
  const preview = useInvitePreview(token);
  const accept = useAcceptInvite();
  const form = useSchemaForm(acceptInviteSchema, { token, name: '', password: '' });

  if (preview.isPending) return <PageLoader label="Checking your invite…" />;
  if (preview.isError) {
    const gone = isApiError(preview.error, 404) || isApiError(preview.error, 410);
    return (
      <InviteUnavailable error={preview.error} gone={gone} onRetry={() => preview.refetch()} />
    );
  }

  const { companyName, role, email } = preview.data;
  const submit = form.onSubmit((values) =>
    accept.mutate(values, {
      onSuccess: onAccepted,
      onError: (error) => applyApiErrorToForm(form, error, 'Could not join the team'),
    }),
  );

  return (
    <Stack gap="lg">
      <Alert variant="light" color="reed" icon={<IconBuildingStore />} title={companyName}>
        <Group gap="xs">
          <Text size="sm">You are invited to join as</Text>
          <Badge variant="filled" color="reed">
            {ROLE_LABELS[role]}
          </Badge>
        </Group>
        <Text size="sm" c="dimmed" mt={4}>
          You will sign in with {email}.
        </Text>
      </Alert>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <TextInput
            label="Your name"
            autoComplete="name"
            required
            {...form.getInputProps('name')}
          />
          <PasswordInput
            label="Password"
            description={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            autoComplete="new-password"
            required
            {...form.getInputProps('password')}
          />
          <Button type="submit" loading={accept.isPending} fullWidth>
            Join team
          </Button>
        </Stack>
      </form>
    </Stack>
  );
}
