import { Badge, Group } from '@mantine/core';
import type { EstimateStatus } from '@pondwright/shared';

export const ESTIMATE_STATUS_LABELS: Record<EstimateStatus, string> = {
  draft: 'Draft',
  awaiting_approval: 'Awaiting approval',
  approved: 'Approved',
  sent: 'Sent',
  viewed: 'Viewed',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
};

// Reed, clay and stone are the theme's own; the rest are Mantine's palette, which the theme keeps.
const STATUS_COLORS: Record<
  EstimateStatus,
  { color: string; variant: 'light' | 'filled' | 'outline' }
> = {
  draft: { color: 'stone', variant: 'light' },
  awaiting_approval: { color: 'clay', variant: 'light' },
  approved: { color: 'reed', variant: 'light' },
  sent: { color: 'blue', variant: 'light' },
  viewed: { color: 'indigo', variant: 'light' },
  accepted: { color: 'reed', variant: 'filled' },
  declined: { color: 'red', variant: 'light' },
  expired: { color: 'stone', variant: 'outline' },
};

type EstimateStatusBadgeProps = {
  status: EstimateStatus;
  /** Shows "Deposit paid" beside "Accepted" once the homeowner's deposit is in. */
  depositPaid?: boolean;
};

export function EstimateStatusBadge({ status, depositPaid = false }: EstimateStatusBadgeProps) {
  const { color, variant } = STATUS_COLORS[status];
  const badge = (
    <Badge color={color} variant={variant} tt="none">
      {ESTIMATE_STATUS_LABELS[status]}
    </Badge>
  );
  if (status !== 'accepted' || !depositPaid) return badge;
  return (
    <Group gap={6} wrap="nowrap">
      {badge}
      <Badge color="green" variant="light" tt="none">
        Deposit paid
      </Badge>
    </Group>
  );
}
