import {
  Anchor,
  Badge,
  Button,
  EmptyState,
  Group,
  Table,
  Text,
  Tooltip,
  VisuallyHidden,
} from '@mantine/core';
import type { ApprovalQueueItem } from '@pondwright/shared';
import { IconChecks } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { ErrorPanel } from '@/components/error-panel';
import { TableSkeleton } from '@/components/table-skeleton';
import { formatDate, formatMoney, formatPercent } from '@/lib/format';
import { notifySuccess } from '@/lib/notify';
import { useApproveEstimate } from '../api/approve-estimate';
import { useApprovalQueue } from '../api/get-approval-queue';
import { SendBackModal } from './send-back-modal';

const REASON_LABELS: Record<string, string> = {
  'margin-below-floor': 'Margin below floor',
  'discount-above-ceiling': 'Discount above ceiling',
};

type ApprovalQueueProps = {
  /** Where an estimate's number links to; the estimates feature owns that page. */
  estimateHref: (estimateId: string) => string;
};

export function ApprovalQueue({ estimateHref }: ApprovalQueueProps) {
  const queue = useApprovalQueue();
  const approve = useApproveEstimate();
  const [toApprove, setToApprove] = useState<ApprovalQueueItem | null>(null);
  const [toSendBack, setToSendBack] = useState<ApprovalQueueItem | null>(null);

  if (queue.isPending) return <TableSkeleton rows={3} label="Loading the approval queue" />;
  if (queue.isError) {
    return (
      <ErrorPanel
        title="Could not load the approval queue"
        error={queue.error}
        onRetry={() => queue.refetch()}
      />
    );
  }
  if (queue.data.length === 0) {
    return (
      <EmptyState
        size="sm"
        icon={<IconChecks />}
        title="Nothing is waiting for you."
        description="Estimates finalised below the margin floor or above the discount ceiling wait here."
      />
    );
  }

  return (
    <>
      <Table.ScrollContainer minWidth={900}>
        <Table aria-label="Estimates waiting for approval" verticalSpacing="sm">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Number</Table.Th>
              <Table.Th>Title</Table.Th>
              <Table.Th>Customer</Table.Th>
              <Table.Th>Version</Table.Th>
              <Table.Th ta="right">Total</Table.Th>
              <Table.Th ta="right">Margin</Table.Th>
              <Table.Th>Reasons</Table.Th>
              <Table.Th>Finalised</Table.Th>
              <Table.Th>
                <VisuallyHidden>Actions</VisuallyHidden>
              </Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {queue.data.map((item) => (
              <Table.Tr key={item.estimateId}>
                <Table.Td>
                  <Anchor component={Link} to={estimateHref(item.estimateId)}>
                    #{item.number}
                  </Anchor>
                </Table.Td>
                <Table.Td>{item.title}</Table.Td>
                <Table.Td>{item.customerName}</Table.Td>
                <Table.Td>v{item.versionNumber}</Table.Td>
                <Table.Td ta="right" ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                  {formatMoney(item.total)}
                </Table.Td>
                <Table.Td ta="right" ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                  {item.grossMarginPct === null ? '—' : formatPercent(item.grossMarginPct)}
                </Table.Td>
                <Table.Td>
                  <Group gap={4}>
                    {item.reasons.map((reason) => (
                      <Tooltip key={reason.code} label={reason.message} multiline maw={280}>
                        <Badge variant="light" color="clay">
                          {REASON_LABELS[reason.code] ?? reason.code}
                        </Badge>
                      </Tooltip>
                    ))}
                  </Group>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{item.finalisedByName}</Text>
                  <Text size="xs" c="dimmed">
                    {formatDate(item.finalisedAt)}
                  </Text>
                </Table.Td>
                <Table.Td>
                  <Group gap="xs" wrap="nowrap" justify="flex-end">
                    <Button
                      size="xs"
                      aria-label={`Approve #${item.number}`}
                      onClick={() => {
                        approve.reset();
                        setToApprove(item);
                      }}
                    >
                      Approve
                    </Button>
                    <Button
                      size="xs"
                      variant="default"
                      aria-label={`Send back #${item.number}`}
                      onClick={() => setToSendBack(item)}
                    >
                      Send back
                    </Button>
                  </Group>
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ConfirmDialog
        opened={toApprove !== null}
        title="Approve this estimate?"
        confirmLabel="Approve"
        loading={approve.isPending}
        error={approve.error}
        onCancel={() => setToApprove(null)}
        onConfirm={() =>
          toApprove &&
          approve.mutate(toApprove.estimateId, {
            onSuccess: () => {
              notifySuccess(`#${toApprove.number} can now be sent.`, 'Approved');
              setToApprove(null);
            },
          })
        }
      >
        Version {toApprove?.versionNumber} of #{toApprove?.number} {toApprove?.title} goes out as it
        stands, at {formatMoney(toApprove?.total)}.
      </ConfirmDialog>
      <SendBackModal item={toSendBack} onClose={() => setToSendBack(null)} />
    </>
  );
}
