import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCrewLeadJob, buildCrews, buildJobListItem } from '@/features/jobs/testing/build-job';
import { buildCurrentUser } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const owner = buildCurrentUser({ name: 'Olive Owner', role: 'owner' });
const estimator = buildCurrentUser({ name: 'Esme Estimator', role: 'estimator' });
const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });

function signedInAs(user: typeof owner, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(user),
    ...extra,
  });
}

describe('job routes', () => {
  it('shows Jobs in the navigation to every role and opens the list', async () => {
    signedInAs(crewLead, { 'GET /api/jobs': json([buildJobListItem()]) });
    const { user } = renderApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    await user.click(within(nav).getByRole('link', { name: 'Jobs' }));
    expect(await screen.findByRole('heading', { name: 'Jobs', level: 1 })).toBeInTheDocument();
    expect(await screen.findByRole('link', { name: 'Koi pond with waterfall' })).toHaveAttribute(
      'href',
      `/jobs/${buildJobListItem().id}`,
    );
  });

  it('opens a job for a crew lead without money, its logs linking to the day’s log', async () => {
    const job = buildCrewLeadJob();
    const server = signedInAs(crewLead, { [`GET /api/jobs/${job.id}`]: json(job) });
    const { user } = renderApp(`/jobs/${job.id}`);

    expect(
      await screen.findByRole('heading', { name: '#12 Koi pond with waterfall' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: 'Cost report' })).toBeNull();
    expect(document.querySelector('main')).not.toHaveTextContent('$');
    await user.click(screen.getByRole('tab', { name: 'Daily logs (1)' }));
    expect(await screen.findByRole('link', { name: 'Mar 3, 2026' })).toHaveAttribute(
      'href',
      `/jobs/${job.id}/log/2026-03-03`,
    );
    expect(server.callsTo(`GET /api/jobs/${job.id}/report`)).toHaveLength(0);
  });

  it('shows the crews beside the schedule to owners only', async () => {
    const routes = {
      'GET /api/jobs': json([]),
      'GET /api/crews': json(buildCrews()),
    };
    signedInAs(owner, routes);
    const first = renderApp('/jobs/schedule?week=2026-03-02');
    expect(await screen.findByRole('heading', { name: /Week of Mar 2/ })).toBeInTheDocument();
    expect(await screen.findByRole('table', { name: 'Crews' })).toBeInTheDocument();
    first.unmount();

    signedInAs(estimator, routes);
    renderApp('/jobs/schedule?week=2026-03-02');
    expect(await screen.findByRole('region', { name: 'Heron crew' })).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Crews' })).toBeNull();
  });
});
