import { Alert, Button, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import type { OutboxItem } from '../storage/outbox-store';

/**
 * The server refused the log. Field messages sit on the fields; a refusal no edit can fix (a closed
 * job) leaves the person a deliberate way to let this copy go.
 */
export function RejectedPanel({ item, onDiscard }: { item: OutboxItem; onDiscard: () => void }) {
  const [confirming, setConfirming] = useState(false);
  const onFields = (item.problem?.fields.length ?? 0) > 0;
  return (
    <Alert
      color="red"
      variant="light"
      icon={<IconAlertTriangle />}
      title="The log was not accepted"
    >
      <Stack gap="xs">
        <Text size="sm">{item.problem?.message}</Text>
        <Text size="sm">
          {onFields
            ? 'Fix the marked fields and save again. Your copy stays on this phone until then.'
            : 'Your copy stays on this phone until you change it or let it go.'}
        </Text>
        <Button
          size="sm"
          variant="subtle"
          color="red"
          onClick={() => setConfirming(true)}
          style={{ alignSelf: 'flex-start' }}
        >
          Discard this copy
        </Button>
      </Stack>
      <ConfirmDialog
        opened={confirming}
        title="Discard this copy?"
        confirmLabel="Discard"
        confirmColor="red"
        onConfirm={() => {
          setConfirming(false);
          onDiscard();
        }}
        onCancel={() => setConfirming(false)}
      >
        The day’s log as typed on this phone will be removed and not sent.
      </ConfirmDialog>
    </Alert>
  );
}
