import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { EstimateView } from '@pondwright/shared';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildEstimate } from '../testing/build-estimate';
import { buildAcceptedQuote } from '../testing/build-quote';
import { EstimateQuotePanel } from './quote-panel';

const JOB_ID = '00000000-0000-4000-8000-0000000000j1';
const CREW_ID = '00000000-0000-4000-8000-00000000c0a1';
const accepted = (overrides: Partial<EstimateView> = {}) =>
  buildEstimate({ status: 'accepted', jobId: null, ...overrides });

function renderPanel(estimate: EstimateView) {
  return renderWithProviders(<EstimateQuotePanel estimate={estimate} />, {
    route: `/estimates/${estimate.id}`,
    path: '/estimates/:id',
  });
}

describe('Make it a job', () => {
  it('makes the job of an accepted estimate with a crew and start, then opens it', async () => {
    setAccessToken('t');
    const estimate = accepted();
    const server = mockApi({
      [`GET /api/estimates/${estimate.id}/quote`]: json(buildAcceptedQuote(true)),
      'GET /api/crews': json([
        { id: CREW_ID, name: 'Heron crew', leadUserId: null, leadName: null },
      ]),
      'POST /api/jobs': json({ id: JOB_ID, number: 12 }, 201),
    });
    const { user } = renderPanel(estimate);

    // The crews are asked for only once the dialog opens.
    expect(server.callsTo('GET /api/crews')).toHaveLength(0);
    await user.click(await screen.findByRole('button', { name: 'Make it a job' }));
    const dialog = await screen.findByRole('dialog', { name: 'Make it a job' });
    await user.click(within(dialog).getByRole('combobox', { name: 'Crew' }));
    await user.click(await screen.findByRole('option', { name: 'Heron crew' }));
    await user.type(within(dialog).getByLabelText(/^Planned start/), '2026-03-02');
    await user.click(within(dialog).getByRole('button', { name: 'Make the job' }));

    expect(await screen.findByTestId('elsewhere')).toBeInTheDocument();
    expect(server.callsTo('POST /api/jobs')[0]?.body).toEqual({
      estimateId: estimate.id,
      crewId: CREW_ID,
      plannedStart: '2026-03-02',
    });
  });

  it('sends only the estimate when no crew or start is chosen', async () => {
    setAccessToken('t');
    const estimate = accepted();
    const server = mockApi({
      [`GET /api/estimates/${estimate.id}/quote`]: json(buildAcceptedQuote(false)),
      'GET /api/crews': json([]),
      'POST /api/jobs': json({ id: JOB_ID, number: 12 }, 201),
    });
    const { user } = renderPanel(estimate);

    await user.click(await screen.findByRole('button', { name: 'Make it a job' }));
    const dialog = await screen.findByRole('dialog', { name: 'Make it a job' });
    await user.click(within(dialog).getByRole('button', { name: 'Make the job' }));

    await waitFor(() => expect(server.callsTo('POST /api/jobs')).toHaveLength(1));
    expect(server.callsTo('POST /api/jobs')[0]?.body).toEqual({ estimateId: estimate.id });
  });

  it('links to the job once the estimate has one, and offers nothing before acceptance', async () => {
    setAccessToken('t');
    const estimate = accepted({ jobId: JOB_ID });
    mockApi({
      [`GET /api/estimates/${estimate.id}/quote`]: json(buildAcceptedQuote(true)),
    });
    const first = renderPanel(estimate);

    expect(await screen.findByRole('link', { name: 'Open the job' })).toHaveAttribute(
      'href',
      `/jobs/${JOB_ID}`,
    );
    expect(screen.queryByRole('button', { name: 'Make it a job' })).toBeNull();
    first.unmount();

    renderPanel(buildEstimate({ status: 'approved', jobId: null }));
    expect(await screen.findByRole('button', { name: 'Download PDF' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Make it a job' })).toBeNull();
  });
});
