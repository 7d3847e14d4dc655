import type { EmailDeliveryView } from '@pondwright/shared';

/** The outbox columns staff are shown, as PostgreSQL returns them to a raw query. */
export type EmailDeliveryRow = {
  id: string;
  status: EmailDeliveryView['status'];
  attempts: number;
  last_error: string | null;
  sent_at: Date | null;
  retried_at: Date | null;
};

export function emailDeliveryView(row: EmailDeliveryRow): EmailDeliveryView {
  return {
    id: row.id,
    status: row.status,
    attempts: row.attempts,
    lastError: row.last_error,
    sentAt: row.sent_at ? new Date(row.sent_at).toISOString() : null,
    retriedAt: row.retried_at ? new Date(row.retried_at).toISOString() : null,
  };
}
