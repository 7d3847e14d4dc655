import { Alert, Button, Group, Modal, Stack, Text, Textarea, TextInput } from '@mantine/core';
import {
  createChangeOrderRequestSchema,
  type BudgetLine,
  type ChangeOrderView,
} from '@pondwright/shared';
import { IconCalculator, IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { ApiError } from '@/lib/api-error';
import { useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useCreateChangeOrder } from '../api/create-change-order';
import { ChangeOrderLinesEditor } from './change-order-lines-editor';
import { ChangeOrderReductionsEditor } from './change-order-reductions-editor';
import { ChangeOrderSummary } from './change-order-summary';
import { SendError } from './send-link-modal';

type ChangeOrderModalProps = {
  opened: boolean;
  jobId: string;
  currency: string;
  /** The job's budget lines: the work a change can take off. */
  budgetLines: BudgetLine[];
  onClose: () => void;
  /** The priced change is to go to the homeowner now. */
  onSend: (order: ChangeOrderView) => void;
};

function ListError({ error }: { error: unknown }) {
  return typeof error === 'string' ? (
    <Text size="sm" c="red" role="alert">
      {error}
    </Text>
  ) : null;
}

function ChangeOrderForm({
  jobId,
  budgetLines,
  onPriced,
}: {
  jobId: string;
  budgetLines: BudgetLine[];
  onPriced: (order: ChangeOrderView) => void;
}) {
  const create = useCreateChangeOrder();
  const form = useSchemaForm(createChangeOrderRequestSchema, {
    title: '',
    reason: '',
    lines: [],
    reductions: [],
  });

  const submit = form.onSubmit((request) =>
    create.mutate(
      { jobId, request },
      {
        onSuccess: (order) => {
          notifySuccess(`Change order ${order.number} is priced and ready to send.`);
          onPriced(order);
        },
        onError: (error) => {
          // The server names bad fields by their path in the request, as the form does.
          if (error instanceof ApiError && error.details.length > 0) {
            form.setErrors(
              Object.fromEntries(error.details.map((detail) => [detail.field, detail.message])),
            );
          }
        },
      },
    ),
  );

  return (
    <form onSubmit={submit} noValidate aria-label="New change order">
      <Stack gap="md">
        <Text size="sm">
          Add new work, take work off the job (a credit), or both. Priced with the price book of the
          version the homeowner accepted; the job’s budget changes only once they accept.
        </Text>
        <TextInput
          label="Title"
          withAsterisk
          data-autofocus
          placeholder="e.g. Second waterfall"
          key={form.key('title')}
          {...form.getInputProps('title')}
        />
        <Textarea
          label="Reason"
          description="Optional; the homeowner reads it with the change."
          resize="vertical"
          rows={2}
          key={form.key('reason')}
          {...form.getInputProps('reason')}
        />
        <ChangeOrderLinesEditor form={form} />
        <ChangeOrderReductionsEditor form={form} budgetLines={budgetLines} />
        <ListError error={form.errors.lines} />
        <ListError error={form.errors.reductions} />
        {create.error && <SendError error={create.error} />}
        <Group justify="flex-end">
          <Button
            type="submit"
            loading={create.isPending}
            leftSection={<IconCalculator size={16} />}
          >
            Price the change
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

function PricedChange({
  order,
  currency,
  onClose,
  onSend,
}: {
  order: ChangeOrderView;
  currency: string;
  onClose: () => void;
  onSend: () => void;
}) {
  return (
    <Stack gap="md" aria-label="Priced change order" role="region">
      <Alert color="reed" variant="light" title={`Change order ${order.number}: ${order.title}`}>
        Priced and saved. Send it to the homeowner to accept or decline.
      </Alert>
      <ChangeOrderSummary order={order} currency={currency} />
      <Group justify="flex-end" gap="sm">
        <Button variant="default" onClick={onClose}>
          Send later
        </Button>
        <Button leftSection={<IconSend size={16} />} onClick={onSend}>
          Send to homeowner
        </Button>
      </Group>
    </Stack>
  );
}

/**
 * A new change order: title, reason, new lines and work taken off; once priced, its figures and a
 * way to send it.
 */
export function ChangeOrderModal({
  opened,
  jobId,
  currency,
  budgetLines,
  onClose,
  onSend,
}: ChangeOrderModalProps) {
  const [priced, setPriced] = useState<ChangeOrderView | null>(null);
  const close = () => {
    setPriced(null);
    onClose();
  };
  return (
    <Modal
      opened={opened}
      onClose={close}
      title={priced ? 'The change is priced' : 'New change order'}
      size="xl"
      centered
    >
      {/* Mounted only while open, so each opening starts from an empty change. */}
      {opened &&
        (priced ? (
          <PricedChange
            order={priced}
            currency={currency}
            onClose={close}
            onSend={() => {
              setPriced(null);
              onSend(priced);
            }}
          />
        ) : (
          <ChangeOrderForm jobId={jobId} budgetLines={budgetLines} onPriced={setPriced} />
        ))}
    </Modal>
  );
}
