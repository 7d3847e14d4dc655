import { Text, Timeline } from '@mantine/core';
import type { EstimateEventView } from '@pondwright/shared';

const ACTION_LABELS: Record<string, string> = {
  created: 'Started the estimate',
  draft_saved: 'Saved the draft',
  finalised: 'Finalised a version',
  approved: 'Approved',
  sent_back: 'Sent back for changes',
  // The server writes these with hyphens.
  'draft-saved': 'Saved the draft',
  'sent-back': 'Sent back for changes',
  'quote-sent': 'Sent the quote',
  'quote-viewed': 'Quote opened',
  'quote-link-revoked': 'Revoked a quote link',
  'quote-accepted': 'Quote accepted',
  'quote-declined': 'Quote declined',
  'quote-expired': 'Quote link expired unanswered',
  'deposit-paid': 'Deposit paid',
  'deposit-needs-review': 'Deposit needs a look',
};

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function describe(detail: Record<string, unknown>): string {
  return Object.entries(detail)
    .filter(([, value]) => ['string', 'number'].includes(typeof value))
    .map(([key, value]) => `${key} ${String(value)}`)
    .join(' · ');
}

/** The estimate's audit log, newest last, as the server recorded it. */
export function EstimateTimeline({ events }: { events: EstimateEventView[] }) {
  return (
    <Timeline active={events.length - 1} bulletSize={14} lineWidth={2} aria-label="History">
      {events.map((event) => (
        <Timeline.Item
          key={event.id}
          title={ACTION_LABELS[event.action] ?? event.action.replace(/[_-]/g, ' ')}
        >
          <Text size="sm" c="dimmed">
            {event.actorName} · {when.format(new Date(event.createdAt))}
          </Text>
          {describe(event.detail) && <Text size="xs">{describe(event.detail)}</Text>}
        </Timeline.Item>
      ))}
    </Timeline>
  );
}
