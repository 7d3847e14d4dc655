import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { AcceptInviteForm } from './accept-invite-form';

const preview = { email: 'esme@example.test', role: 'crew_lead', companyName: 'Example Ponds Co' };

describe('AcceptInviteForm', () => {
  it('shows the company and role from the invite, then joins with name and password', async () => {
    const server = mockApi({
      'GET /api/auth/invites/tok-1': json(preview),
      'POST /api/auth/accept-invite': json({ accessToken: 'joined' }, 201),
      'GET /api/auth/me': json(buildCurrentUser({ role: 'crew_lead' })),
    });
    const onAccepted = vi.fn();
    const { user } = renderWithProviders(
      <AcceptInviteForm token="tok-1" onAccepted={onAccepted} />,
    );

    expect(await screen.findByText('Example Ponds Co')).toBeInTheDocument();
    expect(screen.getByText('Crew lead')).toBeInTheDocument();
    expect(screen.getByText(/esme@example\.test/)).toBeInTheDocument();

    await user.type(screen.getByLabelText(/^Your name/), 'Esme Estimator');
    await user.type(screen.getByLabelText(/^Password/), 'gravel and liner');
    await user.click(screen.getByRole('button', { name: 'Join team' }));

    await waitFor(() => expect(onAccepted).toHaveBeenCalled());
    expect(server.callsTo('POST /api/auth/accept-invite')[0]?.body).toEqual({
      token: 'tok-1',
      name: 'Esme Estimator',
      password: 'gravel and liner',
    });
  });

  it('says plainly when the invite has expired or was used', async () => {
    mockApi({ 'GET /api/auth/invites/old': apiError(410, 'This invite has expired') });

    renderWithProviders(<AcceptInviteForm token="old" onAccepted={vi.fn()} />);

    expect(await screen.findByText('This invite can no longer be used')).toBeInTheDocument();
    expect(screen.getByText('This invite has expired')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Join team' })).not.toBeInTheDocument();
  });
});
