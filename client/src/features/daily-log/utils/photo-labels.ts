import type { PhotoKind } from '@pondwright/shared';
import type { PhotoStatus } from '../storage/photo-store';

/** In the order a crew reaches for them on a working day: progress first, then the supplier's ticket. */
export const LOG_PHOTO_KINDS: Array<{ value: PhotoKind; label: string }> = [
  { value: 'progress', label: 'Progress' },
  { value: 'ticket', label: 'Ticket' },
  { value: 'before', label: 'Before' },
  { value: 'after', label: 'After' },
];

export const photoKindLabel = (kind: PhotoKind) =>
  LOG_PHOTO_KINDS.find((option) => option.value === kind)?.label ?? kind;

/** The caption a delivery's ticket photo gets, so the office can match it to the row. */
export const ticketCaption = (ticketNumber: string) =>
  ticketNumber.trim() ? `Ticket ${ticketNumber.trim()}` : 'Ticket';

export function photoStatusText(
  status: PhotoStatus,
  message: string | null,
  progress: number | null,
): string {
  if (progress !== null) return `Sending… ${Math.round(progress * 100)} %`;
  if (status === 'failed') return `Not accepted: ${message ?? ''}`;
  if (status === 'conflict') return `Not sent: ${message ?? 'another photo already has its id.'}`;
  return 'Waiting to send';
}

const plural = (count: number, one: string, many: string) => `${count} ${count === 1 ? one : many}`;

/** "1 log, 2 photos": what this phone still has to send, for the header and its list. */
export function waitingCount(logs: number, photos: number): string {
  const parts = [];
  if (logs > 0 || photos === 0) parts.push(plural(logs, 'log', 'logs'));
  if (photos > 0) parts.push(plural(photos, 'photo', 'photos'));
  return parts.join(', ');
}
