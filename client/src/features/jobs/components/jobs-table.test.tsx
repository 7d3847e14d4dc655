import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildJobListItem } from '../testing/build-job';
import { JobsTable } from './jobs-table';

const scheduled = buildJobListItem();
const waiting = buildJobListItem({
  id: 'job-2',
  number: 13,
  title: 'Wildlife pond',
  customerName: 'Wren Hollowell',
  crewId: null,
  crewName: null,
  plannedStart: null,
  plannedEnd: null,
  status: 'scheduled',
});
const underway = buildJobListItem({
  id: 'job-3',
  number: 14,
  title: 'Stream',
  status: 'in_progress',
});

/** The query string of the last call to `GET /api/jobs`. */
function lastJobsQuery(server: ReturnType<typeof mockApi>) {
  const call = server.fetch.mock.calls
    .filter(([input]) => String(input).includes('/api/jobs'))
    .at(-1);
  return new URL(String(call?.[0]), 'http://localhost').searchParams;
}

describe('Jobs list', () => {
  it('lists the jobs with crew, status and planned days, and asks the server for a status', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/jobs': () => {
        const status = lastJobsQuery(server).get('status');
        return json(status === 'in_progress' ? [underway] : [scheduled, waiting, underway]);
      },
    });
    const { user } = renderWithProviders(<JobsTable jobHref={(id) => `/j/${id}`} />);

    const table = await screen.findByRole('table', { name: 'Jobs' });
    expect(
      await within(table).findByRole('link', { name: 'Koi pond with waterfall' }),
    ).toHaveAttribute('href', `/j/${scheduled.id}`);
    const row = within(table).getByRole('link', { name: 'Koi pond with waterfall' }).closest('tr')!;
    expect(within(row).getByText('#12')).toBeInTheDocument();
    expect(within(row).getByText('Bram Thistlewood')).toBeInTheDocument();
    expect(within(row).getByText('Heron crew')).toBeInTheDocument();
    expect(within(row).getByText('Scheduled')).toBeInTheDocument();
    expect(within(row).getByText(/Mar 3.*–.*Mar 5, 2026/)).toBeInTheDocument();
    const waitingRow = within(table).getByRole('link', { name: 'Wildlife pond' }).closest('tr')!;
    expect(within(waitingRow).getByText('No crew')).toBeInTheDocument();
    expect(within(waitingRow).getByText('Not scheduled')).toBeInTheDocument();
    expect(lastJobsQuery(server).get('status')).toBeNull();

    await user.click(screen.getByPlaceholderText('Any status'));
    await user.click(await screen.findByRole('option', { name: 'In progress' }));

    await waitFor(() =>
      expect(within(table).queryByRole('link', { name: 'Koi pond with waterfall' })).toBeNull(),
    );
    expect(lastJobsQuery(server).get('status')).toBe('in_progress');
    expect(within(table).getByRole('link', { name: 'Stream' })).toBeInTheDocument();
    expect(screen.getByText('1 job')).toBeInTheDocument();
  });

  it('says so when no job has the status', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/jobs': [json([scheduled]), json([])] });
    const { user } = renderWithProviders(<JobsTable jobHref={(id) => `/j/${id}`} />);

    await screen.findByRole('link', { name: 'Koi pond with waterfall' });
    await user.click(screen.getByPlaceholderText('Any status'));
    await user.click(await screen.findByRole('option', { name: 'Closed' }));
    expect(await screen.findByText('No jobs are closed.')).toBeInTheDocument();
  });
});
