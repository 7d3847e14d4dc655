import { Badge, Button, Group, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import type { ChangeOrderView, JobView } from '@pondwright/shared';
import { IconPlus, IconRefresh, IconSend } from '@tabler/icons-react';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { formatDate, formatMoney } from '@/lib/format';
import { notifySuccess } from '@/lib/notify';
import { useChangeOrders } from '../api/get-change-orders';
import { jobKeys } from '../api/get-jobs';
import { useSendChangeOrder } from '../api/send-change-order';
import { isCredit, lineSummaryText } from '../utils/change-order-text';
import { CHANGE_ORDER_STATUS_COLORS, CHANGE_ORDER_STATUS_LABELS } from '../utils/labels';
import { ChangeOrderModal } from './change-order-modal';
import { SendLinkModal } from './send-link-modal';

type Job = Pick<JobView, 'id' | 'status' | 'budget'>;

/**
 * The homeowner accepts a change from the e-mail, outside this page; the job's budget then holds the
 * change's version. When the list shows an accepted change newer than the budget on screen, the job
 * (and its report) is fetched again so the budget includes the change's lines.
 */
function useRefreshJobAfterAcceptance(job: Job, orders: ChangeOrderView[] | undefined) {
  const queryClient = useQueryClient();
  const newestAccepted = Math.max(
    0,
    ...(orders ?? []).filter((o) => o.status === 'accepted').map((o) => o.versionNumber),
  );
  const budgetVersion = job.budget?.versionNumber ?? 0;
  useEffect(() => {
    if (newestAccepted > budgetVersion) {
      void queryClient.invalidateQueries({ queryKey: jobKeys.detail(job.id) });
    }
  }, [newestAccepted, budgetVersion, job.id, queryClient]);
}

function Answer({ order }: { order: ChangeOrderView }) {
  if (order.status === 'accepted') {
    return (
      <Text size="sm">
        {order.acceptedByName ?? 'The homeowner'}
        {order.acceptedAt ? `, ${formatDate(order.acceptedAt)}` : ''}
      </Text>
    );
  }
  if (order.status === 'declined') {
    return <Text size="sm">Declined {formatDate(order.declinedAt)}</Text>;
  }
  if (order.status === 'sent') {
    return (
      <Text size="sm" c="dimmed">
        Waiting{order.sentTo ? ` for ${order.sentTo}` : ''}
      </Text>
    );
  }
  return (
    <Text size="sm" c="dimmed">
      Not sent yet
    </Text>
  );
}

function ChangeOrdersTable({
  orders,
  currency,
  canSend,
  onSend,
}: {
  orders: ChangeOrderView[];
  currency: string;
  canSend: boolean;
  onSend: (order: ChangeOrderView) => void;
}) {
  const money = (amount: string) => formatMoney(amount, currency);
  return (
    <Table.ScrollContainer minWidth={880}>
      <Table aria-label="Change orders" verticalSpacing={6}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>#</Table.Th>
            <Table.Th>Change</Table.Th>
            <Table.Th>Status</Table.Th>
            <Table.Th ta="right">Net change</Table.Th>
            <Table.Th>Job total</Table.Th>
            <Table.Th ta="right">Cost</Table.Th>
            <Table.Th>Accepted by</Table.Th>
            <Table.Th />
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {orders.map((order) => (
            <Table.Tr key={order.id}>
              <Table.Td>{order.number}</Table.Td>
              <Table.Td>
                <Text size="sm" fw={500}>
                  {order.title}
                </Text>
                {order.reason && (
                  <Text size="xs" c="dimmed">
                    {order.reason}
                  </Text>
                )}
                <Text size="xs" c="dimmed">
                  {order.lines.map(lineSummaryText).join(' · ')}
                </Text>
              </Table.Td>
              <Table.Td>
                <Badge color={CHANGE_ORDER_STATUS_COLORS[order.status]} variant="light" tt="none">
                  {CHANGE_ORDER_STATUS_LABELS[order.status]}
                </Badge>
              </Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                <Text span size="sm" ff="monospace">
                  {money(order.total)}
                </Text>
                {isCredit(order) && (
                  <Badge ml={6} size="sm" variant="light" color="clay" tt="none">
                    Credit
                  </Badge>
                )}
              </Table.Td>
              <Table.Td ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                {money(order.previousJobTotal)} → {money(order.newJobTotal)}
              </Table.Td>
              <Table.Td ta="right" ff="monospace">
                {money(order.cost)}
              </Table.Td>
              <Table.Td>
                <Answer order={order} />
              </Table.Td>
              <Table.Td>
                {canSend && (order.status === 'ready' || order.status === 'sent') && (
                  <Button
                    size="xs"
                    variant={order.status === 'ready' ? 'filled' : 'default'}
                    leftSection={<IconSend size={14} />}
                    onClick={() => onSend(order)}
                  >
                    {order.status === 'ready' ? 'Send to homeowner' : 'Send again'}
                  </Button>
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/**
 * Scope changes after the quote, work added or taken off: priced, sent to the homeowner, and applied
 * to the budget on yes.
 */
export function ChangeOrders({ job }: { job: Job }) {
  const orders = useChangeOrders(job.id);
  const send = useSendChangeOrder();
  const [creating, setCreating] = useState(false);
  const [sending, setSending] = useState<ChangeOrderView | null>(null);
  useRefreshJobAfterAcceptance(job, orders.data);
  const currency = job.budget?.currency ?? 'USD';
  // A closed job takes no more changes (the server answers 409 JOB_CLOSED).
  const open = job.status !== 'closed';

  const startSending = (order: ChangeOrderView) => {
    send.reset();
    setSending(order);
  };

  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-start">
        <Stack gap={2}>
          <Title order={2} fz="h4">
            Change orders
          </Title>
          <Text size="sm" c="dimmed">
            Work the homeowner adds or drops after accepting the quote. Each change is priced, sent
            for them to accept, and changes the budget once they do; work taken off is a credit.
          </Text>
        </Stack>
        <Group gap="xs">
          <Button
            variant="subtle"
            leftSection={<IconRefresh size={16} />}
            loading={orders.isFetching}
            onClick={() => void orders.refetch()}
          >
            Check for answers
          </Button>
          {open && (
            <Button leftSection={<IconPlus size={16} />} onClick={() => setCreating(true)}>
              New change order
            </Button>
          )}
        </Group>
      </Group>
      {orders.isPending ? (
        <Skeleton height={120} aria-label="Loading the change orders" />
      ) : orders.isError ? (
        <ErrorPanel
          title="Could not load the change orders"
          error={orders.error}
          onRetry={() => void orders.refetch()}
        />
      ) : orders.data.length === 0 ? (
        <Text size="sm" c="dimmed">
          No change orders yet.
        </Text>
      ) : (
        <ChangeOrdersTable
          orders={orders.data}
          currency={currency}
          canSend={open}
          onSend={startSending}
        />
      )}
      <ChangeOrderModal
        opened={creating}
        jobId={job.id}
        currency={currency}
        budgetLines={job.budget?.lines ?? []}
        onClose={() => setCreating(false)}
        onSend={(order) => {
          setCreating(false);
          startSending(order);
        }}
      />
      <SendLinkModal
        opened={sending !== null}
        title={
          sending?.status === 'sent'
            ? `Send change order ${sending.number} again`
            : `Send change order ${sending?.number ?? ''} to the homeowner`
        }
        resend={sending?.status === 'sent'}
        lastRecipient={sending?.sentTo}
        submitLabel={sending?.status === 'sent' ? 'Send again' : 'Send to homeowner'}
        pending={send.isPending}
        error={send.error}
        onClose={() => setSending(null)}
        onSend={(recipientEmail) =>
          sending &&
          send.mutate(
            { jobId: job.id, orderId: sending.id, recipientEmail },
            {
              onSuccess: (order) => {
                notifySuccess(
                  `Change order ${order.number} went to ${order.sentTo ?? 'the homeowner'}.`,
                );
                setSending(null);
              },
            },
          )
        }
      >
        The homeowner gets an e-mail with a link to “{sending?.title}”, where they can accept or
        decline it, as they did the quote.
      </SendLinkModal>
    </Stack>
  );
}
