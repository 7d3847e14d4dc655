import { Alert, Button, Group, Modal, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { sendQuoteRequestSchema, type EstimateView } from '@pondwright/shared';
import { IconSend } from '@tabler/icons-react';
import { useEffect, useRef } from 'react';
import { NumberTextInput } from '@/components/number-text-input';
import { applyApiErrorToForm, useSchemaForm } from '@/lib/form';
import { notifySuccess } from '@/lib/notify';
import { useCustomerSites } from '../api/get-customer-sites';
import { useSendQuote } from '../api/send-quote';

type SendQuoteModalProps = {
  opened: boolean;
  estimate: Pick<EstimateView, 'id' | 'customerId' | 'customerName'>;
  /** A link is out already: the new one replaces it. */
  resend: boolean;
  /** Who the last link went to, used when the customer has no e-mail address on file. */
  lastRecipient?: string | null;
  onClose: () => void;
};

function SendQuoteForm({
  estimate,
  resend,
  lastRecipient,
  onClose,
}: Omit<SendQuoteModalProps, 'opened'>) {
  const customer = useCustomerSites(estimate.customerId);
  const knownEmail = customer.data?.email || lastRecipient || '';
  const form = useSchemaForm(sendQuoteRequestSchema, {
    recipientEmail: knownEmail,
    message: '',
    expiresInDays: 30,
  });
  const send = useSendQuote();

  // The customer's e-mail may arrive after the dialog opened; it fills the field if it is still empty.
  const prefilled = useRef(knownEmail !== '');
  useEffect(() => {
    if (!knownEmail || prefilled.current) return;
    prefilled.current = true;
    if (!form.getValues().recipientEmail) form.setFieldValue('recipientEmail', knownEmail);
  }, [knownEmail, form]);

  const submit = form.onSubmit((values) => {
    const request = { ...values, message: values.message || undefined };
    send.mutate(
      { id: estimate.id, request },
      {
        onSuccess: () => {
          notifySuccess(`Quote sent to ${request.recipientEmail}`);
          onClose();
        },
        onError: (error) => applyApiErrorToForm(form, error, 'Could not send the quote'),
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Send the quote">
      <Stack gap="md">
        <Text size="sm">
          {estimate.customerName} gets an e-mail with a link to the quote, where they can choose
          options, accept it and pay the deposit.
        </Text>
        {resend && (
          <Alert color="clay" variant="light" title="The earlier link stops working">
            The link sent before no longer opens the quote once this one goes out.
          </Alert>
        )}
        <TextInput
          label="Homeowner’s e-mail"
          type="email"
          autoComplete="off"
          withAsterisk
          data-autofocus
          key={form.key('recipientEmail')}
          {...form.getInputProps('recipientEmail')}
        />
        <Textarea
          label="Message"
          description="Optional; shown above the link in the e-mail."
          resize="vertical"
          rows={3}
          key={form.key('message')}
          {...form.getInputProps('message')}
        />
        <NumberTextInput
          label="Link works for (days)"
          description="Between 1 and 90 days; 30 if left empty."
          inputMode="numeric"
          w={220}
          error={form.errors.expiresInDays}
          value={form.getValues().expiresInDays as number | string | undefined}
          onChange={(value) => form.setFieldValue('expiresInDays', value as number | undefined)}
          onBlur={() => form.validateField('expiresInDays')}
        />
        <Group justify="flex-end" gap="sm">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" loading={send.isPending} leftSection={<IconSend size={16} />}>
            {resend ? 'Resend quote' : 'Send quote'}
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

/** The e-mail that carries the homeowner's link: who gets it, a note, and how long the link works. */
export function SendQuoteModal({ opened, onClose, ...props }: SendQuoteModalProps) {
  return (
    <Modal
      opened={opened}
      onClose={onClose}
      title={props.resend ? 'Resend the quote' : 'Send the quote to the homeowner'}
      centered
    >
      {/* Mounted only while open, so each opening starts from the customer's e-mail again. */}
      {opened && <SendQuoteForm onClose={onClose} {...props} />}
    </Modal>
  );
}
