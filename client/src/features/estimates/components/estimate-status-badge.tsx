import { Badge } from '@mantine/core';
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

export function EstimateStatusBadge({ status }: { status: EstimateStatus }) {
  const { color, variant } = STATUS_COLORS[status];
  return (
    <Badge color={color} variant={variant} tt="none">
      {ESTIMATE_STATUS_LABELS[status]}
    </Badge>
  );
}
