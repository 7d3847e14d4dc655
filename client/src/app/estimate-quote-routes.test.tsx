import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildEstimate } from '@/features/estimates/testing/build-estimate';
import { buildAcceptedQuote } from '@/features/estimates/testing/build-quote';
import { buildCompany, buildCurrentUser } from '@/testing/factories';
import { json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const estimator = buildCurrentUser({ role: 'estimator', name: 'Esme Estimator' });

describe('estimate page with the homeowner’s answer', () => {
  it('locks an accepted estimate everywhere, and shows the deposit paid beside the status', async () => {
    const estimate = buildEstimate({ status: 'accepted' });
    mockApi({
      'POST /api/auth/refresh': json({ accessToken: 'restored' }),
      'GET /api/auth/me': json(estimator),
      'GET /api/company': json(buildCompany()),
      [`GET /api/estimates/${estimate.id}`]: json(estimate),
      [`GET /api/estimates/${estimate.id}/quote`]: json(buildAcceptedQuote(true)),
    });
    renderApp(`/estimates/${estimate.id}`);

    expect(
      await screen.findByText(
        'Accepted quotes are locked. The accepted version is kept as the homeowner saw it.',
      ),
    ).toBeInTheDocument();
    const heading = screen.getByRole('heading', { level: 1 });
    const header = heading.parentElement as HTMLElement;
    expect(within(header).getByText('Accepted')).toBeInTheDocument();
    expect(await within(header).findByText('Deposit paid')).toBeInTheDocument();
    expect(screen.getByText('Save draft').closest('button')).toBeDisabled();
    expect(screen.getByText('Homeowner’s quote')).toBeInTheDocument();

    // Every input of the estimate and of its takeoff (mounted in its tab) is disabled. The page is
    // large, so the inputs are counted directly rather than found one by one by their labels.
    const main = document.querySelector('main') as HTMLElement;
    expect(main.querySelectorAll('input, textarea').length).toBeGreaterThan(10);
    expect(main.querySelectorAll('input:enabled, textarea:enabled')).toHaveLength(0);
  });
});
