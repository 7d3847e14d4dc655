import { configure, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser, buildPriceBookVersion } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// The first visit to a route loads its chunk, which takes a while under test.
configure({ asyncUtilTimeout: 4000 });

const owner = buildCurrentUser({ role: 'owner' });

describe('the pricing policy form', () => {
  it('shows each markup as its margin and turns a typed margin back into markup', async () => {
    const version = buildPriceBookVersion();
    const server = mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(owner),
      'GET /api/price-book': json(version),
      'PUT /api/price-book/policy': json({ ...version, versionNumber: 4 }, 201),
    });
    const { user } = renderApp('/price-book/policy');

    expect(await screen.findByLabelText('Materials markup %')).toHaveValue('25');
    expect(screen.getByLabelText('Materials margin %')).toHaveValue('20.00');

    const laborMargin = screen.getByLabelText('Labor margin %');
    await user.clear(laborMargin);
    await user.type(laborMargin, '20');
    expect(screen.getByLabelText('Labor markup %')).toHaveValue('25.00');

    await user.clear(laborMargin);
    await user.type(laborMargin, '100');
    expect(laborMargin).toHaveAttribute('aria-invalid', 'true');
    await user.clear(laborMargin);
    await user.type(laborMargin, '20');

    const equipmentMarkup = screen.getByLabelText('Equipment markup %');
    await user.clear(equipmentMarkup);
    await user.type(equipmentMarkup, '50');
    expect(screen.getByLabelText('Equipment margin %')).toHaveValue('33.33');

    await user.click(screen.getByRole('button', { name: 'Save policy as new version' }));
    expect(await screen.findByText(/saved as a new version/)).toBeInTheDocument();
    expect(server.callsTo('PUT /api/price-book/policy')[0]?.body).toEqual({
      policy: {
        ...version.book.policy,
        markupPct: { ...version.book.policy.markupPct, labor: '25.00', equipment: '50' },
      },
    });
  });

  it('asks before leaving the policy tab with unsaved policy edits', async () => {
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(owner),
      'GET /api/price-book': json(buildPriceBookVersion()),
    });
    const { user, router } = renderApp('/price-book/policy');

    const floor = await screen.findByLabelText('Margin floor %');
    await user.clear(floor);
    await user.type(floor, '30');
    await user.click(screen.getByRole('tab', { name: 'Materials' }));

    expect(
      await screen.findByText(/The policy has changes that are not saved/),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/price-book/policy');
  }, 15_000);
});
