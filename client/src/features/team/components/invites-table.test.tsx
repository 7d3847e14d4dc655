import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildInvite } from '@/testing/factories';
import { json, mockApi, noContent } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { InvitesTable } from './invites-table';

describe('InvitesTable', () => {
  it('says so when there are no pending invites', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/invites': json([]) });

    renderWithProviders(<InvitesTable />);

    expect(await screen.findByText('No pending invites')).toBeInTheDocument();
  });

  it('lists pending invites and revokes one after confirmation', async () => {
    setAccessToken('t');
    const invite = buildInvite({ email: 'sam@example.test', role: 'estimator' });
    const expired = buildInvite({ email: 'late@example.test', expiresAt: '2020-01-01T00:00:00Z' });
    const server = mockApi({
      'GET /api/invites': [json([invite, expired]), json([expired])],
      [`DELETE /api/invites/${invite.id}`]: noContent(),
    });
    const { user } = renderWithProviders(<InvitesTable />);

    const table = await screen.findByRole('table', { name: 'Pending invites' });
    expect(within(table).getByText('sam@example.test')).toBeInTheDocument();
    expect(within(table).getByText('Estimator')).toBeInTheDocument();
    expect(within(table).getByText('Expired')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Revoke invite for sam@example.test' }));
    const dialog = await screen.findByRole('dialog', { name: 'Revoke this invite?' });
    await user.click(within(dialog).getByRole('button', { name: 'Revoke invite' }));

    await waitFor(() => expect(screen.queryByText('sam@example.test')).not.toBeInTheDocument());
    expect(server.callsTo(`DELETE /api/invites/${invite.id}`)).toHaveLength(1);
    expect(server.callsTo('GET /api/invites')).toHaveLength(2);
  });
});
