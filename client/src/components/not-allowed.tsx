import { Button, EmptyState } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

type NotAllowedProps = { what?: string };

export function NotAllowed({ what = 'this page' }: NotAllowedProps) {
  return (
    <EmptyState
      mt="xl"
      variant="light"
      color="clay"
      icon={<IconLock />}
      title="Not available for your role"
      description={`Your role does not include ${what}. Ask a company owner if you need access.`}
    >
      <EmptyState.Actions>
        <Button component={Link} to={paths.home.getHref()} variant="light">
          Back to Home
        </Button>
      </EmptyState.Actions>
    </EmptyState>
  );
}
