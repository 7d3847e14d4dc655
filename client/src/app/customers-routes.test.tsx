import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const emptyPage = { items: [], total: 0, page: 1, pageSize: 25 };

function signedInAs(role: 'owner' | 'estimator' | 'crew_lead') {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(buildCurrentUser({ role })),
    'GET /api/customers': json(emptyPage),
  });
}

describe('customers routes', () => {
  it('list Customers in the navigation for every role, read-only for crew leads', async () => {
    signedInAs('crew_lead');
    renderApp('/customers');
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Customers' })).toHaveAttribute(
      'href',
      '/customers',
    );
    expect(await screen.findByRole('heading', { name: 'Customers' })).toBeInTheDocument();
    expect(await screen.findByText(/No customers yet/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New customer' })).not.toBeInTheDocument();
  });

  it('let estimators open the new-customer form', async () => {
    signedInAs('estimator');
    const { user } = renderApp('/customers');
    await user.click(await screen.findByRole('button', { name: 'New customer' }));
    expect(await screen.findByRole('dialog', { name: 'New customer' })).toBeInTheDocument();
  });
});
