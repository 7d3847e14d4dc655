import {
  Badge,
  Button,
  Group,
  List,
  Paper,
  Skeleton,
  Stack,
  Text,
  Title,
  Tooltip,
} from '@mantine/core';
import type { EstimateQuoteStatus, EstimateStatus, EstimateView } from '@pondwright/shared';
import { IconCircleCheck, IconCircleX, IconDownload, IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { formatDate, formatMoney } from '@/lib/format';
import { notifyApiError } from '@/lib/notify';
import { useDownloadQuotePdf } from '../api/download-quote-pdf';
import { hasQuote, SENDABLE_STATUSES, useEstimateQuote } from '../api/get-estimate-quote';
import { MakeJob } from './make-job';
import { formatDateTime } from './quote-format';
import { QuoteLinksTable } from './quote-links-table';
import { SendQuoteModal } from './send-quote-modal';

const INTRO: Partial<Record<EstimateStatus, string>> = {
  approved:
    'This version is approved and ready to send. The homeowner gets an e-mail with a link to a page where they can choose options, accept and pay the deposit.',
  sent: 'The quote is on its way. You will see here when the homeowner opens it.',
  viewed: 'The homeowner has opened the quote and not answered yet.',
  declined:
    'The homeowner declined this quote. You can change the estimate and send a new version, or send this one again.',
  expired:
    'The link ran out before the homeowner answered. Send the quote again to give them a fresh link.',
  accepted: 'The homeowner accepted this quote. It is kept exactly as they saw it.',
};

type Payment = EstimateQuoteStatus['payment'];

/** "Deposit paid $X on date" in green, or a quiet "Deposit not paid yet". */
export function DepositBadge({ payment, currency }: { payment: Payment; currency: string }) {
  if (payment?.status === 'paid') {
    return (
      <Badge color="green" variant="light" tt="none" leftSection={<IconCircleCheck size={14} />}>
        Deposit paid {formatMoney(payment.amount, currency)}
        {payment.paidAt ? ` on ${formatDate(payment.paidAt)}` : ''}
      </Badge>
    );
  }
  return (
    <Badge color="stone" variant="outline" tt="none">
      Deposit not paid yet
    </Badge>
  );
}

function Acceptance({
  acceptance,
  payment,
  currency,
  optionLabels,
}: {
  acceptance: NonNullable<EstimateQuoteStatus['acceptance']>;
  payment: Payment;
  currency: string;
  optionLabels: Map<string, string>;
}) {
  return (
    <Stack gap={6} component="section" aria-label="Acceptance">
      <Group gap="xs">
        <IconCircleCheck size={18} color="var(--mantine-color-reed-7)" aria-hidden />
        <Text fw={600}>Accepted by {acceptance.fullName}</Text>
        <Text size="sm" c="dimmed">
          {formatDateTime(acceptance.acceptedAt)}
        </Text>
      </Group>
      {acceptance.optionIds.length === 0 ? (
        <Text size="sm">No options chosen: the base quote only.</Text>
      ) : (
        <div>
          <Text size="sm">Options chosen:</Text>
          <List size="sm" aria-label="Options chosen">
            {acceptance.optionIds.map((id) => (
              <List.Item key={id}>{optionLabels.get(id) ?? id}</List.Item>
            ))}
          </List>
        </div>
      )}
      <Group gap="lg">
        <Text size="sm">
          Total <b>{formatMoney(acceptance.total, currency)}</b>
        </Text>
        <Text size="sm">
          Deposit <b>{formatMoney(acceptance.deposit, currency)}</b>
        </Text>
        <DepositBadge payment={payment} currency={currency} />
      </Group>
      <Text size="xs" c="dimmed">
        Version {acceptance.versionNumber} · SHA-256{' '}
        <Tooltip label={acceptance.contentSha256}>
          <Text span inherit ff="monospace">
            {acceptance.contentSha256.slice(0, 12)}
          </Text>
        </Tooltip>{' '}
        · IP {acceptance.ip} · {acceptance.userAgent}
      </Text>
    </Stack>
  );
}

function Decline({ declined }: { declined: NonNullable<EstimateQuoteStatus['declined']> }) {
  return (
    <Stack gap={4} component="section" aria-label="Decline">
      <Group gap="xs">
        <IconCircleX size={18} color="var(--mantine-color-red-7)" aria-hidden />
        <Text fw={600}>Declined</Text>
        <Text size="sm" c="dimmed">
          {formatDateTime(declined.at)}
        </Text>
      </Group>
      <Text size="sm">
        {declined.reason ? `Their reason: “${declined.reason}”` : 'They did not give a reason.'}
      </Text>
    </Stack>
  );
}

function QuoteStatusBody({
  estimate,
  quote,
}: {
  estimate: EstimateView;
  quote: EstimateQuoteStatus;
}) {
  const { currency, options } = estimate.draft.computed.priced;
  const optionLabels = new Map(options.map((option) => [option.id, option.label]));
  const accepted = estimate.status === 'accepted';
  return (
    <Stack gap="md">
      {quote.acceptance && (
        <Acceptance
          acceptance={quote.acceptance}
          payment={quote.payment}
          currency={currency}
          optionLabels={optionLabels}
        />
      )}
      {quote.declined && <Decline declined={quote.declined} />}
      {quote.links.length === 0 ? (
        <Text size="sm" c="dimmed">
          No link has been sent yet.
        </Text>
      ) : (
        <QuoteLinksTable estimateId={estimate.id} links={quote.links} readOnly={accepted} />
      )}
    </Stack>
  );
}

/**
 * Sending the approved version to the homeowner, and what came of it: the links sent, the acceptance
 * or decline, and the deposit. Read-only once the quote is accepted.
 */
export function EstimateQuotePanel({ estimate }: { estimate: EstimateView }) {
  const quote = useEstimateQuote(estimate.id, estimate.status);
  const download = useDownloadQuotePdf();
  const [sending, setSending] = useState(false);
  if (!hasQuote(estimate.status)) return null;

  const accepted = estimate.status === 'accepted';
  const sendable = SENDABLE_STATUSES.includes(estimate.status);
  const resend = estimate.status === 'sent' || estimate.status === 'viewed';
  const lastRecipient =
    [...(quote.data?.links ?? [])].sort((a, b) => b.createdAt.localeCompare(a.createdAt))[0]
      ?.recipientEmail ?? null;

  return (
    <Paper p="md" component="section" aria-labelledby="estimate-quote-title">
      <Stack gap="md">
        <Group justify="space-between" align="flex-start">
          <Stack gap={4} maw={640}>
            <Title order={2} fz="h4" id="estimate-quote-title">
              {accepted ? 'Homeowner’s quote' : 'Send to homeowner'}
            </Title>
            <Text size="sm" c="dimmed">
              {INTRO[estimate.status]}
            </Text>
          </Stack>
          <Group gap="sm">
            <Button
              variant="default"
              leftSection={<IconDownload size={16} />}
              loading={download.isPending}
              onClick={() =>
                download.mutate(
                  { id: estimate.id, number: estimate.number },
                  { onError: (error) => notifyApiError(error, 'Could not download the PDF') },
                )
              }
            >
              Download PDF
            </Button>
            {accepted && <MakeJob estimate={estimate} />}
            {sendable && (
              <Button leftSection={<IconSend size={16} />} onClick={() => setSending(true)}>
                {resend ? 'Resend' : 'Send to homeowner'}
              </Button>
            )}
          </Group>
        </Group>
        {quote.isPending ? (
          <Stack gap="xs" aria-label="Loading the quote">
            <Skeleton height={16} width="40%" />
            <Skeleton height={16} />
          </Stack>
        ) : quote.isError ? (
          <ErrorPanel
            title="Could not load the quote’s status"
            error={quote.error}
            onRetry={() => void quote.refetch()}
          />
        ) : (
          <QuoteStatusBody estimate={estimate} quote={quote.data} />
        )}
      </Stack>
      {sendable && (
        <SendQuoteModal
          opened={sending}
          estimate={estimate}
          resend={resend}
          lastRecipient={lastRecipient}
          onClose={() => setSending(false)}
        />
      )}
    </Paper>
  );
}
