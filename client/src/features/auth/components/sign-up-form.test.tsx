import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SignUpForm } from './sign-up-form';

async function fillIn(user: ReturnType<typeof renderWithProviders>['user']) {
  await user.type(screen.getByLabelText(/^Company name/), 'Example Ponds Co');
  await user.type(screen.getByLabelText(/^Your name/), 'Olive Owner');
  await user.type(screen.getByLabelText(/^E-mail/), 'olive@example.test');
  await user.type(screen.getByLabelText(/^Password/), 'reeds by the water');
}

describe('SignUpForm', () => {
  it('warns about a short password while it is typed', async () => {
    const { user } = renderWithProviders(<SignUpForm />);

    await user.type(screen.getByLabelText(/^Password/), 'short');

    expect(await screen.findByText('Use at least 8 characters')).toBeInTheDocument();
  });

  it('creates the company account with all four fields', async () => {
    const server = mockApi({
      'POST /api/auth/signup': json({ accessToken: 'new-token' }, 201),
      'GET /api/auth/me': json(buildCurrentUser()),
    });
    const { user } = renderWithProviders(<SignUpForm />);

    await fillIn(user);
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    await waitFor(() => expect(server.callsTo('GET /api/auth/me')).toHaveLength(1));
    expect(server.callsTo('POST /api/auth/signup')[0]?.body).toEqual({
      companyName: 'Example Ponds Co',
      name: 'Olive Owner',
      email: 'olive@example.test',
      password: 'reeds by the water',
    });
  });

  it('explains a taken e-mail address', async () => {
    mockApi({
      'POST /api/auth/signup': apiError(409, 'An account with this e-mail already exists', [
        { field: 'email', message: 'Already registered' },
      ]),
    });
    const { user } = renderWithProviders(<SignUpForm />);

    await fillIn(user);
    await user.click(screen.getByRole('button', { name: 'Create account' }));

    expect(await screen.findByText('Already registered')).toBeInTheDocument();
    expect(screen.getByText('An account with this e-mail already exists')).toBeInTheDocument();
  });
});
