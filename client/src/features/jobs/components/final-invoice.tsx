import { Badge, Button, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import type { InvoiceView, JobView } from '@pondwright/shared';
import { IconReceipt, IconSend } from '@tabler/icons-react';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { ApiError } from '@/lib/api-error';
import { formatDate, formatMoney } from '@/lib/format';
import { notifySuccess } from '@/lib/notify';
import { useInvoice } from '../api/get-invoice';
import { jobKeys } from '../api/get-jobs';
import { useSendInvoice } from '../api/send-invoice';
import { SendLinkModal } from './send-link-modal';

type Job = Pick<JobView, 'id' | 'status' | 'budget'>;

function Figure({ label, value, strong }: { label: string; value: string; strong?: boolean }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text fw={strong ? 700 : 600} ff="monospace" aria-label={label}>
        {value}
      </Text>
    </Stack>
  );
}

function InvoiceFigures({ invoice, currency }: { invoice: InvoiceView; currency: string }) {
  const money = (amount: string) => formatMoney(amount, currency);
  const paid = invoice.status === 'paid';
  return (
    <Stack gap="sm">
      <Group gap="xl">
        <Figure label="Job total" value={money(invoice.total)} />
        <Figure label="Deposit paid" value={money(invoice.depositPaid)} />
        <Figure label="Balance" value={money(invoice.balance)} strong />
        <Stack gap={2}>
          <Text size="xs" c="dimmed">
            Status
          </Text>
          <Badge color={paid ? 'reed' : 'clay'} variant={paid ? 'filled' : 'light'} tt="none">
            {paid ? `Paid ${formatDate(invoice.paidAt)}` : 'Open'}
          </Badge>
        </Stack>
      </Group>
      <Text size="sm" c="dimmed">
        Sent to {invoice.recipientEmail} on {formatDate(invoice.issuedAt)}.
        {paid ? '' : ' The homeowner pays the balance from the link in the e-mail.'}
      </Text>
    </Stack>
  );
}

/** The last bill: the job's total less the deposit paid, e-mailed as a link the homeowner pays from. */
export function FinalInvoice({ job }: { job: Job }) {
  const queryClient = useQueryClient();
  const invoice = useInvoice(job.id);
  const send = useSendInvoice();
  const [sending, setSending] = useState(false);
  const currency = job.budget?.currency ?? 'USD';
  const existing = invoice.data ?? null;
  const canSend = existing === null || existing.status === 'open';

  const submit = (recipientEmail: string | undefined) =>
    send.mutate(
      { jobId: job.id, recipientEmail },
      {
        onSuccess: (sent) => {
          notifySuccess(`The final invoice went to ${sent.recipientEmail}.`);
          setSending(false);
        },
        onError: (error) => {
          // The page was out of date: show what the server knows now beside the message.
          if (error instanceof ApiError && error.code === 'INVOICE_PAID') {
            void queryClient.invalidateQueries({ queryKey: jobKeys.invoice(job.id) });
          }
        },
      },
    );

  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-start">
        <Stack gap={2}>
          <Title order={2} fz="h4">
            Final invoice
          </Title>
          <Text size="sm" c="dimmed">
            The job’s total, accepted changes included, less the deposit the homeowner paid.
          </Text>
        </Stack>
        {!invoice.isPending && !invoice.isError && canSend && (
          <Button
            variant={existing ? 'default' : 'filled'}
            leftSection={<IconSend size={16} />}
            onClick={() => {
              send.reset();
              setSending(true);
            }}
          >
            {existing ? 'Send again' : 'Send the final invoice'}
          </Button>
        )}
      </Group>
      {invoice.isPending ? (
        <Skeleton height={80} aria-label="Loading the invoice" />
      ) : invoice.isError ? (
        <ErrorPanel
          title="Could not load the invoice"
          error={invoice.error}
          onRetry={() => void invoice.refetch()}
        />
      ) : existing ? (
        <InvoiceFigures invoice={existing} currency={currency} />
      ) : (
        <Group gap="xs" c="dimmed">
          <IconReceipt size={18} aria-hidden />
          <Text size="sm">
            No final invoice yet.
            {job.budget ? ` The job’s total is ${formatMoney(job.budget.total, currency)}.` : ''}
          </Text>
        </Group>
      )}
      <SendLinkModal
        opened={sending}
        title={existing ? 'Send the final invoice again' : 'Send the final invoice'}
        resend={existing !== null}
        lastRecipient={existing?.recipientEmail}
        submitLabel={existing ? 'Send again' : 'Send the final invoice'}
        pending={send.isPending}
        error={send.error}
        onClose={() => {
          setSending(false);
          // The job's status on screen was out of date. It is fetched again only once the message
          // has been read, because a job that is not complete has no invoice tab to show it in.
          if (send.error instanceof ApiError && send.error.code === 'JOB_NOT_COMPLETE') {
            void queryClient.invalidateQueries({ queryKey: jobKeys.detail(job.id) });
          }
        }}
        onSend={submit}
      >
        The homeowner gets an e-mail with a link to the invoice, where they can pay the balance
        online.
      </SendLinkModal>
    </Stack>
  );
}
