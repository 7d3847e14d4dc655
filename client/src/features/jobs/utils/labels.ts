import type {
  ChangeOrderLineChange,
  ChangeOrderStatus,
  PhotoKind,
  RescheduleReason,
} from '@pondwright/shared';

export const RESCHEDULE_REASON_LABELS: Record<RescheduleReason, string> = {
  weather: 'Weather',
  access: 'Site access',
  materials: 'Materials late or short',
  crew: 'Crew not available',
  homeowner: 'The homeowner asked',
  other: 'Something else',
};

export const CHANGE_ORDER_STATUS_LABELS: Record<ChangeOrderStatus, string> = {
  ready: 'Ready to send',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
};

export const CHANGE_ORDER_STATUS_COLORS: Record<ChangeOrderStatus, string> = {
  ready: 'blue',
  sent: 'clay',
  accepted: 'reed',
  declined: 'red',
};

export const CHANGE_ORDER_LINE_LABELS: Record<ChangeOrderLineChange, string> = {
  added: 'Added',
  reduced: 'Reduced',
  removed: 'Removed',
};

export const PHOTO_KIND_LABELS: Record<PhotoKind, string> = {
  before: 'Before',
  progress: 'Progress',
  after: 'After',
  ticket: 'Ticket',
};

/** The gallery's filter names the group: "Tickets" rather than "Ticket". */
export const PHOTO_KIND_FILTER_LABELS: Record<PhotoKind, string> = {
  before: 'Before',
  progress: 'Progress',
  after: 'After',
  ticket: 'Tickets',
};
