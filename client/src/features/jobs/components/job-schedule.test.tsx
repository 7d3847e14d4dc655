import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildMember } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildCrews, buildJobListItem, CREW_A } from '../testing/build-job';
import { CrewsPanel } from './crews-panel';
import { JobSchedule } from './job-schedule';
import { UnscheduledJobs } from './unscheduled-jobs';

// Week of Monday 2 March 2026. The koi pond runs Tuesday to Thursday with the Heron crew; the
// stream has no crew and runs Thursday to the next Tuesday, across the weekend.
const koi = buildJobListItem();
const stream = buildJobListItem({
  id: 'job-stream',
  number: 15,
  title: 'Stream and bog garden',
  crewId: null,
  crewName: null,
  plannedStart: '2026-03-05',
  plannedEnd: '2026-03-10',
});
const waiting = buildJobListItem({
  id: 'job-waiting',
  number: 16,
  title: 'Patio fountain',
  crewId: null,
  crewName: null,
  plannedStart: null,
  plannedEnd: null,
});

/** Answers `GET /api/jobs` by its range: the week asked for, or every job when no range is sent. */
function jobsServer() {
  const server = mockApi({
    'GET /api/crews': json(buildCrews()),
    'GET /api/jobs': () => {
      const url = new URL(String(server.fetch.mock.calls.at(-1)?.[0]), 'http://localhost');
      const from = url.searchParams.get('from');
      if (from === null) return json([koi, stream, waiting]);
      if (from === '2026-03-02') return json([koi, stream]);
      if (from === '2026-03-09') return json([stream]);
      return json([]);
    },
  });
  return server;
}

function jobsRanges(server: ReturnType<typeof mockApi>) {
  return server.fetch.mock.calls
    .map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname === '/api/jobs' && url.searchParams.has('from'))
    .map((url) => `${url.searchParams.get('from')}..${url.searchParams.get('to')}`);
}

function renderSchedule() {
  return renderWithProviders(
    <>
      <JobSchedule jobHref={(id) => `/jobs/${id}`} />
      <UnscheduledJobs jobHref={(id) => `/jobs/${id}`} />
    </>,
    // Any day of the week shows its Monday to Friday.
    { route: '/jobs/schedule?week=2026-03-04', path: '/jobs/schedule' },
  );
}

describe('Schedule', () => {
  it('draws each job across its planned days in its crew’s row, and moves by week', async () => {
    setAccessToken('t');
    const server = jobsServer();
    const { user } = renderSchedule();

    expect(
      await screen.findByRole('heading', { name: /Week of Mar 2 – Mar 6, 2026/ }),
    ).toBeInTheDocument();
    const heron = await screen.findByRole('region', { name: 'Heron crew' });
    const koiBar = await within(heron).findByRole('link', { name: /#12 Koi pond with waterfall/ });
    // Tuesday is the second day column; Tuesday to Thursday is three days.
    expect(koiBar.style.gridColumn).toBe('2 / span 3');
    expect(
      within(screen.getByRole('region', { name: 'Otter crew' })).queryByRole('link'),
    ).toBeNull();

    const noCrew = screen.getByRole('region', { name: 'No crew' });
    const streamBar = within(noCrew).getByRole('link', { name: /#15 Stream and bog garden/ });
    expect(streamBar.style.gridColumn).toBe('4 / span 2');
    expect(streamBar).toHaveTextContent('›');
    expect(jobsRanges(server)).toEqual(['2026-03-02..2026-03-06']);

    // Beside the calendar: only the job with no start.
    const unscheduled = screen.getByRole('region', { name: 'Not scheduled yet' });
    expect(
      await within(unscheduled).findByRole('link', { name: /Patio fountain/ }),
    ).toBeInTheDocument();
    expect(within(unscheduled).queryByRole('link', { name: /Koi pond/ })).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Next week' }));
    expect(
      await screen.findByRole('heading', { name: /Week of Mar 9 – Mar 13, 2026/ }),
    ).toBeInTheDocument();
    await waitFor(() => expect(jobsRanges(server).at(-1)).toBe('2026-03-09..2026-03-13'));
    await waitFor(() =>
      expect(
        within(screen.getByRole('region', { name: 'Heron crew' })).queryByRole('link'),
      ).toBeNull(),
    );
    const carriedOver = within(screen.getByRole('region', { name: 'No crew' })).getByRole('link', {
      name: /#15 Stream/,
    });
    // Monday and Tuesday of the second week; it began the week before.
    expect(carriedOver.style.gridColumn).toBe('1 / span 2');
    expect(carriedOver).toHaveTextContent('‹');

    await user.click(screen.getByRole('button', { name: 'Previous week' }));
    await user.click(screen.getByRole('button', { name: 'Previous week' }));
    await waitFor(() => expect(jobsRanges(server).at(-1)).toBe('2026-02-23..2026-02-27'));
  });

  it('opens the job when its bar is clicked', async () => {
    setAccessToken('t');
    jobsServer();
    const { user } = renderSchedule();

    const heron = await screen.findByRole('region', { name: 'Heron crew' });
    await user.click(await within(heron).findByRole('link', { name: /#12 Koi pond/ }));
    expect(await screen.findByTestId('elsewhere')).toBeInTheDocument();
  });
});

describe('Crews', () => {
  it('adds a crew with a crew lead chosen from the team', async () => {
    setAccessToken('t');
    const cal = buildMember({
      id: '00000000-0000-4000-8000-0000000000ca',
      name: 'Cal Crewlead',
      role: 'crew_lead',
    });
    const gone = buildMember({ name: 'Former Hand', role: 'crew_lead', active: false });
    const added = { id: CREW_A, name: 'Kingfisher crew', leadUserId: cal.id, leadName: cal.name };
    const server = mockApi({
      'GET /api/crews': [json([]), json([added])],
      'GET /api/users': json([buildMember({ name: 'Olive Owner', role: 'owner' }), cal, gone]),
      'POST /api/crews': json(added, 201),
    });
    const { user } = renderWithProviders(<CrewsPanel />);

    expect(await screen.findByText(/No crews yet/)).toBeInTheDocument();
    expect(server.callsTo('GET /api/users')).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Add crew' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a crew' });
    await user.click(within(dialog).getByRole('button', { name: 'Add crew' }));
    expect(await within(dialog).findByText('Name the crew')).toBeInTheDocument();
    expect(server.callsTo('POST /api/crews')).toHaveLength(0);

    await user.type(within(dialog).getByLabelText(/^Crew name/), 'Kingfisher crew');
    await user.click(within(dialog).getByRole('combobox', { name: 'Crew lead' }));
    expect(screen.queryByRole('option', { name: /Former Hand/ })).toBeNull();
    await user.click(await screen.findByRole('option', { name: 'Cal Crewlead (Crew lead)' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add crew' }));

    const crews = await screen.findByRole('table', { name: 'Crews' });
    expect(within(crews).getByText('Kingfisher crew')).toBeInTheDocument();
    expect(within(crews).getByText('Cal Crewlead')).toBeInTheDocument();
    expect(server.callsTo('POST /api/crews')[0]?.body).toEqual({
      name: 'Kingfisher crew',
      leadUserId: cal.id,
    });
  });
});
