import { Alert, Button, Group, Text, Timeline } from '@mantine/core';
import type { EstimateEventView, EstimateView } from '@pondwright/shared';
import { useState } from 'react';
import { useEstimateEvents } from '../api/get-estimate-events';

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

/**
 * The estimate's audit log, newest last, as the server recorded it. The estimate carries only its
 * latest entries; the older ones are fetched when asked for.
 */
export function EstimateTimeline({
  estimate,
}: {
  estimate: Pick<EstimateView, 'id' | 'events' | 'eventCount'>;
}) {
  const [showAll, setShowAll] = useState(false);
  const older = estimate.eventCount - estimate.events.length;
  const all = useEstimateEvents(estimate.id, showAll && older > 0);
  const events = showAll && all.data ? all.data : estimate.events;
  return (
    <>
      {older > 0 && !(showAll && all.data) && (
        <Group justify="space-between" mb="md">
          <Text size="sm" c="dimmed">
            Showing the latest {estimate.events.length} of {estimate.eventCount} entries.
          </Text>
          <Button
            variant="light"
            size="xs"
            loading={all.isFetching}
            onClick={() => setShowAll(true)}
          >
            Show all {estimate.eventCount}
          </Button>
        </Group>
      )}
      {all.isError && (
        <Alert color="red" mb="md">
          The older entries could not be loaded. Try again in a moment.
        </Alert>
      )}
      <EventList events={events} />
    </>
  );
}

function EventList({ events }: { events: EstimateEventView[] }) {
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
