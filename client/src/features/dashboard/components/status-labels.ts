import type { EstimateStatus } from '@pondwright/shared';

/** Short enough to sit under every bar of a half-width chart. */
export const STATUS_LABELS: Record<EstimateStatus, string> = {
  draft: 'Draft',
  awaiting_approval: 'Awaiting',
  approved: 'Approved',
  sent: 'Sent',
  viewed: 'Viewed',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
};
