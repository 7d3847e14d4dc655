import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildCreatedInvite } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { InviteForm } from './invite-form';

describe('InviteForm', () => {
  it('sends the invite and shows the link to pass on, with a copy button', async () => {
    setAccessToken('t');
    const server = mockApi({
      'POST /api/invites': json(
        buildCreatedInvite({
          email: 'sam@example.test',
          role: 'crew_lead',
          inviteUrl: '/accept-invite/abc',
        }),
        201,
      ),
    });
    const { user } = renderWithProviders(<InviteForm />);

    await user.type(screen.getByLabelText(/^E-mail/), 'sam@example.test');
    await user.selectOptions(screen.getByLabelText(/^Role/), 'crew_lead');
    await user.click(screen.getByRole('button', { name: 'Send invite' }));

    const link = await screen.findByLabelText('Invite link');
    expect(link).toHaveValue(`${window.location.origin}/accept-invite/abc`);
    expect(screen.getByRole('button', { name: 'Copy link' })).toBeInTheDocument();
    expect(screen.getByText(/e-mail delivery is coming later/i)).toBeInTheDocument();
    expect(server.callsTo('POST /api/invites')[0]?.body).toEqual({
      email: 'sam@example.test',
      role: 'crew_lead',
    });
    await waitFor(() => expect(screen.getByLabelText(/^E-mail/)).toHaveValue(''));
  });

  it('validates the e-mail as it is typed', async () => {
    const { user } = renderWithProviders(<InviteForm />);

    await user.type(screen.getByLabelText(/^E-mail/), 'sam');

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
  });

  it('shows why the server refused the invite', async () => {
    setAccessToken('t');
    mockApi({
      'POST /api/invites': apiError(409, 'This person is already on your team', [
        { field: 'email', message: 'Already a member' },
      ]),
    });
    const { user } = renderWithProviders(<InviteForm />);

    await user.type(screen.getByLabelText(/^E-mail/), 'esme@example.test');
    await user.click(screen.getByRole('button', { name: 'Send invite' }));

    expect(await screen.findByText('Already a member')).toBeInTheDocument();
    expect(screen.getByText('This person is already on your team')).toBeInTheDocument();
    expect(screen.queryByLabelText('Invite link')).not.toBeInTheDocument();
  });
});
