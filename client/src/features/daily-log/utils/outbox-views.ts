import type { OutboxItem, OutboxStatus } from '../storage/outbox-store';

export const OUTBOX_STATUS_LABELS: Record<OutboxStatus, string> = {
  waiting: 'Waiting to send',
  conflict: 'Conflict',
  rejected: 'Needs a fix',
};

export const OUTBOX_STATUS_COLORS: Record<OutboxStatus, string> = {
  waiting: 'clay',
  conflict: 'red',
  rejected: 'red',
};

export function itemsOf(items: OutboxItem[], userId: string): OutboxItem[] {
  return items.filter((item) => item.userId === userId);
}

export const waitingLogs = (count: number) => `${count} waiting ${count === 1 ? 'log' : 'logs'}`;
