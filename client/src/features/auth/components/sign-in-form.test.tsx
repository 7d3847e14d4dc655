import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { getAccessToken } from '@/lib/api-client';
import { buildCurrentUser } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

describe('SignInForm', () => {
  it('shows field errors as the user types, and clears them once the value is valid', async () => {
    const { user } = renderWithProviders(<SignInForm />);
    const email = screen.getByLabelText(/^E-mail/);

    await user.type(email, 'olive@');
    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(email).toHaveAttribute('aria-invalid', 'true');

    await user.type(email, 'example.test');
    await waitFor(() =>
      expect(screen.queryByText('Enter a valid e-mail address')).not.toBeInTheDocument(),
    );

    await user.click(screen.getByLabelText(/^Password/));
    await user.tab();
    expect(await screen.findByText('Enter your password')).toBeInTheDocument();
  });

  it('does not call the API while the form is invalid', async () => {
    const server = mockApi({});
    const { user } = renderWithProviders(<SignInForm />);

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(server.requests).toHaveLength(0);
  });

  it('submits the trimmed e-mail and password, then loads the signed-in user', async () => {
    const server = mockApi({
      'POST /api/auth/login': json({ accessToken: 'token-1' }),
      'GET /api/auth/me': json(buildCurrentUser()),
    });
    const { user } = renderWithProviders(<SignInForm />);

    await user.type(screen.getByLabelText(/^E-mail/), '  olive@example.test ');
    await user.type(screen.getByLabelText(/^Password/), 'moss and stone');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(server.callsTo('GET /api/auth/me')).toHaveLength(1));
    expect(server.callsTo('POST /api/auth/login')[0]?.body).toEqual({
      email: 'olive@example.test',
      password: 'moss and stone',
    });
    expect(server.callsTo('GET /api/auth/me')[0]?.headers.authorization).toBe('Bearer token-1');
    expect(getAccessToken()).toBe('token-1');
  });

  it('shows the server message when the credentials are wrong', async () => {
    mockApi({ 'POST /api/auth/login': apiError(401, 'Wrong e-mail or password') });
    const { user } = renderWithProviders(<SignInForm />);

    await user.type(screen.getByLabelText(/^E-mail/), 'olive@example.test');
    await user.type(screen.getByLabelText(/^Password/), 'not it');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Wrong e-mail or password')).toBeInTheDocument();
    expect(screen.getByText('Could not sign you in')).toBeInTheDocument();
    expect(getAccessToken()).toBeNull();
  });

  it('puts validation details from the server on the matching field', async () => {
    mockApi({
      'POST /api/auth/login': apiError(400, 'Check the highlighted fields', [
        { field: 'email', message: 'This e-mail address is not accepted' },
      ]),
    });
    const { user } = renderWithProviders(<SignInForm />);

    await user.type(screen.getByLabelText(/^E-mail/), 'olive@example.test');
    await user.type(screen.getByLabelText(/^Password/), 'long enough');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('This e-mail address is not accepted')).toBeInTheDocument();
    expect(screen.getByLabelText(/^E-mail/)).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Check the highlighted fields')).toBeInTheDocument();
  });
});
