import { Anchor, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { paths } from '@/config/paths';

type InviteUnavailableProps = {
  error: unknown;
  /** The invite is unknown, expired, used or revoked: retrying will not help. */
  gone: boolean;
  onRetry: () => void;
};

export function InviteUnavailable({ error, gone, onRetry }: InviteUnavailableProps) {
  if (!gone) {
    return <ErrorPanel title="Could not check this invite" error={error} onRetry={onRetry} />;
  }
  return (
    <Stack gap="sm">
      <ErrorPanel title="This invite can no longer be used" error={error} />
      <Text size="sm" c="dimmed">
        Invites expire, and each one works only once. Ask the company owner to send you a new link.
        Already joined?{' '}
        <Anchor component={Link} to={paths.signIn.getHref()}>
          Sign in
        </Anchor>
        .
      </Text>
    </Stack>
  );
}
