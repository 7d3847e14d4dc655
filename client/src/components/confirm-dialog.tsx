import { Alert, Button, Group, Modal, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { errorMessage } from '@/lib/api-error';

type ConfirmDialogProps = {
  opened: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  confirmColor?: string;
  loading?: boolean;
  /** A failed attempt stays in the dialog, so the reason is read where the action was taken. */
  error?: unknown;
  onConfirm: () => void;
  onCancel: () => void;
};

export function ConfirmDialog({
  opened,
  title,
  children,
  confirmLabel,
  confirmColor,
  loading = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Modal opened={opened} onClose={onCancel} title={title} centered>
      <Stack gap="md">
        <Text size="sm" component="div">
          {children}
        </Text>
        {error !== undefined && error !== null && (
          <Alert color="red" variant="light" role="alert">
            {errorMessage(error)}
          </Alert>
        )}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onCancel}>
            Cancel
          </Button>
          <Button color={confirmColor} loading={loading} onClick={onConfirm}>
            {confirmLabel}
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
