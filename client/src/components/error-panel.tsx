import { Alert, Button, Group, Text } from '@mantine/core';
import { IconAlertTriangle, IconRefresh } from '@tabler/icons-react';
import { errorMessage } from '@/lib/api-error';

type ErrorPanelProps = {
  title?: string;
  error: unknown;
  onRetry?: () => void;
};

export function ErrorPanel({ title = 'Could not load this', error, onRetry }: ErrorPanelProps) {
  return (
    <Alert color="red" variant="light" title={title} icon={<IconAlertTriangle />} role="alert">
      <Group justify="space-between" align="center" gap="sm">
        <Text size="sm">{errorMessage(error)}</Text>
        {onRetry && (
          <Button
            size="xs"
            variant="white"
            color="red"
            leftSection={<IconRefresh size={14} />}
            onClick={onRetry}
          >
            Try again
          </Button>
        )}
      </Group>
    </Alert>
  );
}
