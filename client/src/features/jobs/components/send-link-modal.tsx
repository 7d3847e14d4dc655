import { Alert, Button, Group, Modal, Stack, Text, TextInput } from '@mantine/core';
import { sendInvoiceRequestSchema } from '@pondwright/shared';
import { IconSend } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { z } from 'zod';
import { ApiError, errorMessage } from '@/lib/api-error';
import { useSchemaForm } from '@/lib/form';

// The server's own e-mail rule, but an empty field is allowed: it then writes to the homeowner.
const emailRule = sendInvoiceRequestSchema.shape.recipientEmail.unwrap();
const recipientSchema = z.object({
  recipientEmail: z
    .string()
    .trim()
    .refine(
      (value) => value === '' || emailRule.safeParse(value).success,
      'Enter an e-mail address such as name@example.com, or leave it empty',
    ),
});

/** Titles for the server's codes, so the reason reads as a heading above the server's sentence. */
const ERROR_TITLES: Record<string, string> = {
  JOB_NOT_COMPLETE: 'The job is not complete yet',
  INVOICE_PAID: 'The invoice is already paid',
  QUOTE_ALREADY_ANSWERED: 'The homeowner has already answered',
  JOB_CLOSED: 'The job is closed',
  JOB_INVOICED: 'The final invoice is issued',
  CREDIT_EXCEEDS_PAID: 'The credit is more than the homeowner still owes',
  CHANGE_ORDER_SUPERSEDED: 'Another change was accepted first',
};

export function SendError({ error }: { error: unknown }) {
  const code = error instanceof ApiError ? error.code : null;
  return (
    <Alert color="red" variant="light" role="alert" title={code ? ERROR_TITLES[code] : undefined}>
      {errorMessage(error)}
    </Alert>
  );
}

type SendLinkModalProps = {
  opened: boolean;
  title: string;
  /** What the homeowner gets. */
  children: ReactNode;
  /** Who the last e-mail went to; empty means the homeowner who accepted the quote. */
  lastRecipient?: string | null;
  /** A link is out already: the new one replaces it. */
  resend: boolean;
  submitLabel: string;
  pending: boolean;
  error: unknown;
  onSend: (recipientEmail: string | undefined) => void;
  onClose: () => void;
};

function SendLinkForm({
  children,
  lastRecipient,
  resend,
  submitLabel,
  pending,
  error,
  onSend,
  onClose,
}: Omit<SendLinkModalProps, 'opened' | 'title'>) {
  const form = useSchemaForm(recipientSchema, { recipientEmail: lastRecipient ?? '' });
  const fieldError =
    error instanceof ApiError
      ? error.details.find((detail) => detail.field === 'recipientEmail')?.message
      : undefined;

  return (
    <form
      noValidate
      onSubmit={form.onSubmit((values) => onSend(values.recipientEmail || undefined))}
    >
      <Stack gap="md">
        <Text size="sm" component="div">
          {children}
        </Text>
        {resend && (
          <Text size="sm" c="dimmed">
            The link sent before stops working once this one goes out.
          </Text>
        )}
        <TextInput
          label="Homeowner’s e-mail"
          type="email"
          autoComplete="off"
          placeholder="The homeowner’s address from the accepted quote"
          description="Leave it empty to write to the homeowner who accepted the quote."
          data-autofocus
          key={form.key('recipientEmail')}
          {...form.getInputProps('recipientEmail')}
          error={form.errors.recipientEmail ?? fieldError}
        />
        {error !== null && error !== undefined && <SendError error={error} />}
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={pending} leftSection={<IconSend size={16} />}>
            {submitLabel}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

/** The e-mail that carries a homeowner's link (a change order or the final invoice). */
export function SendLinkModal({ opened, title, onClose, ...props }: SendLinkModalProps) {
  return (
    <Modal opened={opened} onClose={onClose} title={title} centered>
      {/* Mounted only while open, so each opening starts from the last recipient again. */}
      {opened && <SendLinkForm onClose={onClose} {...props} />}
    </Modal>
  );
}
