import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildMember } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { MembersTable } from './members-table';

const owner = buildMember({ name: 'Olive Owner', role: 'owner', email: 'olive@example.test' });
const estimator = buildMember({ name: 'Esme Estimator', role: 'estimator' });
const formerCrew = buildMember({ name: 'Cal Crew', role: 'crew_lead', active: false });

describe('MembersTable', () => {
  it('lists members with their role, status, and marks the signed-in owner', async () => {
    setAccessToken('t');
    mockApi({ 'GET /api/users': json([owner, estimator, formerCrew]) });

    renderWithProviders(<MembersTable currentUserId={owner.id} />);

    const table = await screen.findByRole('table', { name: 'Team members' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(4);
    expect(within(rows[1]!).getByText('You')).toBeInTheDocument();
    expect(screen.getByLabelText('Role for Esme Estimator')).toHaveValue('estimator');
    expect(within(rows[3]!).getByText('Deactivated')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reactivate Cal Crew' })).toBeInTheDocument();
  });

  it('shows a loading state, then an error with a retry when the list fails', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/users': [apiError(403, 'Only owners can manage the team'), json([owner])],
    });
    const { user } = renderWithProviders(<MembersTable currentUserId={owner.id} />);

    expect(screen.getByRole('status', { name: 'Loading members' })).toBeInTheDocument();
    expect(await screen.findByText('Only owners can manage the team')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByRole('table', { name: 'Team members' })).toBeInTheDocument();
    expect(server.callsTo('GET /api/users')).toHaveLength(2);
  });

  it('changes a role straight from the select', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/users': [
        json([owner, estimator]),
        json([owner, { ...estimator, role: 'crew_lead' }]),
      ],
      [`PATCH /api/users/${estimator.id}`]: json({ ...estimator, role: 'crew_lead' }),
    });
    const { user } = renderWithProviders(<MembersTable currentUserId={owner.id} />);

    await user.selectOptions(await screen.findByLabelText('Role for Esme Estimator'), 'crew_lead');

    await waitFor(() =>
      expect(screen.getByLabelText('Role for Esme Estimator')).toHaveValue('crew_lead'),
    );
    expect(server.callsTo(`PATCH /api/users/${estimator.id}`)[0]?.body).toEqual({
      role: 'crew_lead',
    });
  });

  it('asks before deactivating, and shows the last-owner refusal inside the dialog', async () => {
    setAccessToken('t');
    const server = mockApi({
      'GET /api/users': json([owner, estimator]),
      [`PATCH /api/users/${owner.id}`]: apiError(
        409,
        'The company must keep at least one active owner',
      ),
    });
    const { user } = renderWithProviders(<MembersTable currentUserId={owner.id} />);

    await user.click(await screen.findByRole('button', { name: 'Deactivate Olive Owner' }));
    const dialog = await screen.findByRole('dialog', { name: 'Deactivate Olive Owner?' });
    expect(server.callsTo(`PATCH /api/users/${owner.id}`)).toHaveLength(0);

    await user.click(within(dialog).getByRole('button', { name: 'Deactivate' }));

    expect(
      await within(dialog).findByText('The company must keep at least one active owner'),
    ).toBeInTheDocument();
    expect(screen.getByText('The company needs an active owner')).toBeInTheDocument();
    expect(server.callsTo(`PATCH /api/users/${owner.id}`)[0]?.body).toEqual({ active: false });
  });

  it('asks before an owner demotes themselves, and keeps the role when the server refuses', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/users': json([owner]),
      [`PATCH /api/users/${owner.id}`]: apiError(
        409,
        'The company must keep at least one active owner',
      ),
    });
    const { user } = renderWithProviders(<MembersTable currentUserId={owner.id} />);

    await user.selectOptions(await screen.findByLabelText('Role for Olive Owner'), 'estimator');
    const dialog = await screen.findByRole('dialog', {
      name: 'Change your own role to Estimator?',
    });
    await user.click(within(dialog).getByRole('button', { name: 'Change my role' }));

    expect(
      await within(dialog).findByText('The company must keep at least one active owner'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Role for Olive Owner')).toHaveValue('owner');
  });

  it('shows a refused role change for someone else above the table', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/users': json([owner, estimator]),
      [`PATCH /api/users/${estimator.id}`]: apiError(404, 'This member no longer exists'),
    });
    const { user } = renderWithProviders(<MembersTable currentUserId={owner.id} />);

    await user.selectOptions(await screen.findByLabelText('Role for Esme Estimator'), 'owner');

    const alert = await screen.findByRole('alert', { name: 'Could not update this member' });
    expect(alert).toHaveTextContent('This member no longer exists');
    expect(screen.getByLabelText('Role for Esme Estimator')).toHaveValue('estimator');
  });
});
