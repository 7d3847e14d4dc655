import { Alert, Button, CopyButton, Group, Stack, Text, TextInput } from '@mantine/core';
import { ROLE_LABELS, type CreatedInvite } from '@pondwright/shared';
import { IconCheck, IconCopy, IconLink } from '@tabler/icons-react';
import { formatDate } from '@/lib/format';

type InviteLinkCardProps = {
  invite: CreatedInvite;
  onDismiss: () => void;
};

function absoluteUrl(url: string): string {
  try {
    return new URL(url, window.location.origin).toString();
  } catch {
    return url;
  }
}

export function InviteLinkCard({ invite, onDismiss }: InviteLinkCardProps) {
  const link = absoluteUrl(invite.inviteUrl);

  return (
    <Alert
      mt="md"
      variant="light"
      color="reed"
      icon={<IconLink />}
      title={`Invite ready for ${invite.email} (${ROLE_LABELS[invite.role]})`}
      withCloseButton
      closeButtonLabel="Close"
      onClose={onDismiss}
    >
      <Stack gap="xs">
        <Text size="sm">
          E-mail delivery is coming later. For now, copy this link and send it to them yourself, by
          text or e-mail. It works once and expires on {formatDate(invite.expiresAt)}.
        </Text>
        <Group gap="xs" align="flex-end" wrap="nowrap">
          <TextInput
            label="Invite link"
            value={link}
            readOnly
            onFocus={(event) => event.currentTarget.select()}
            flex={1}
          />
          <CopyButton value={link}>
            {({ copied, copy }) => (
              <Button
                variant={copied ? 'filled' : 'light'}
                leftSection={copied ? <IconCheck size={16} /> : <IconCopy size={16} />}
                onClick={copy}
              >
                {copied ? 'Copied' : 'Copy link'}
              </Button>
            )}
          </CopyButton>
        </Group>
      </Stack>
    </Alert>
  );
}
