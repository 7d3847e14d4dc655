import type { LearnedRate } from '@pondwright/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser, buildPriceBookVersion } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const owner = buildCurrentUser({ name: 'Olive Owner', role: 'owner' });
const estimator = buildCurrentUser({ name: 'Esme Estimator', role: 'estimator' });
const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });

const RATES: LearnedRate[] = [
  {
    parameter: 'pipeLaborHoursPerFt',
    label: 'Pipe run',
    unit: 'labor-hours per ft',
    task: 'plumbingEquipment',
    bookValue: 0.05,
    learnedValue: 0.06,
    jobs: 2,
    estimatedHours: 10,
    actualHours: 12,
    hoursRatio: 1.2,
  },
];

function signedInAs(user: typeof owner, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(user),
    ...extra,
  });
}

describe('crew rates route', () => {
  it('is linked from the price book and lets an owner use a rate', async () => {
    signedInAs(owner, {
      'GET /api/price-book': json(buildPriceBookVersion()),
      'GET /api/learned-rates': json(RATES),
    });
    const { user, router } = renderApp('/price-book');

    await user.click(await screen.findByRole('link', { name: 'Crew rates from closed jobs' }));
    expect(await screen.findByRole('heading', { name: 'Crew rates', level: 1 })).toBeVisible();
    expect(router.state.location.pathname).toBe('/price-book/learned-rates');
    const table = await screen.findByRole('table', { name: 'Crew rates' });
    expect(within(table).getByText('+20 % hours')).toBeInTheDocument();
    expect(within(table).getByRole('button', { name: 'Use in the price book' })).toBeVisible();
  });

  it('shows an estimator the rates without the button, and keeps crew leads out', async () => {
    signedInAs(estimator, { 'GET /api/learned-rates': json(RATES) });
    const first = renderApp('/price-book/learned-rates');
    const table = await screen.findByRole('table', { name: 'Crew rates' });
    expect(within(table).getByText('0.06 labor-hours per ft')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Use in the price book' })).toBeNull();
    first.unmount();

    const server = signedInAs(crewLead);
    renderApp('/price-book/learned-rates');
    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(server.callsTo('GET /api/learned-rates')).toHaveLength(0);
  });
});
