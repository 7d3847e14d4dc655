import { screen } from '@testing-library/react';
import type { EstimateEventView } from '@pondwright/shared';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { EstimateTimeline } from './estimate-timeline';

const ESTIMATE_ID = '00000000-0000-4000-8000-0000000000e7';

function saved(revision: number): EstimateEventView {
  return {
    id: String(revision),
    action: revision === 1 ? 'created' : 'draft-saved',
    actorName: 'Tomas Reedley',
    detail: { revision },
    createdAt: `2026-11-0${revision}T09:00:00.000Z`,
  };
}

const log = [1, 2, 3, 4, 5].map(saved);

describe('the estimate history', () => {
  it('shows the latest entries it was sent and fetches the rest only when asked', async () => {
    setAccessToken('t');
    const server = mockApi({ [`GET /api/estimates/${ESTIMATE_ID}/events`]: json(log) });
    const { user } = renderWithProviders(
      <EstimateTimeline estimate={{ id: ESTIMATE_ID, events: log.slice(-2), eventCount: 5 }} />,
    );

    expect(screen.getByText('Showing the latest 2 of 5 entries.')).toBeInTheDocument();
    expect(screen.getAllByText(/^revision /)).toHaveLength(2);
    expect(server.callsTo(`GET /api/estimates/${ESTIMATE_ID}/events`)).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Show all 5' }));
    expect(await screen.findByText('Started the estimate')).toBeInTheDocument();
    expect(screen.getAllByText(/^revision /)).toHaveLength(5);
    expect(screen.queryByText(/Showing the latest/)).not.toBeInTheDocument();
  });

  it('offers nothing more when it was sent the whole log', () => {
    setAccessToken('t');
    mockApi({});
    renderWithProviders(
      <EstimateTimeline estimate={{ id: ESTIMATE_ID, events: log, eventCount: 5 }} />,
    );
    expect(screen.getAllByText(/^revision /)).toHaveLength(5);
    expect(screen.queryByRole('button', { name: /Show all/ })).not.toBeInTheDocument();
  });
});
