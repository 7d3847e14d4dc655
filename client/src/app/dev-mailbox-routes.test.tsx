import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCurrentUser } from '@/testing/factories';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const owner = buildCurrentUser({ role: 'owner' });
const estimator = buildCurrentUser({ role: 'estimator', name: 'Esme Estimator' });
const QUOTE_LINK = 'http://localhost:5173/q/tok_4b1d9e2a7c';

const message = {
  id: 'm1',
  receivedAt: '2026-12-03T09:00:00.000Z',
  from: 'Pondwright <no-reply@pondwright.example>',
  to: ['bram@example.test'],
  subject: 'Your pond quote',
  text: `Open your quote: ${QUOTE_LINK}`,
  html: null,
  attachments: [],
};

function signedInAs(user: typeof owner, mailbox: Response) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(user),
    'GET /api/approvals': json([]),
    'GET /api/dev/mailbox': mailbox,
  });
}

describe('developer mailbox route', () => {
  it('is in an owner’s navigation when the server has a mailbox, and opens its messages', async () => {
    signedInAs(owner, json([message]));
    const { user } = renderApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    const item = await within(nav).findByRole('link', { name: 'Mailbox (dev)' });
    expect(item).toHaveAttribute('href', '/dev/mailbox');
    await user.click(item);

    expect(await screen.findByRole('heading', { name: 'Mailbox (dev)' })).toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Your pond quote' }));
    expect(await screen.findByRole('link', { name: QUOTE_LINK })).toHaveAttribute(
      'href',
      QUOTE_LINK,
    );
  });

  it('is hidden, and the address is not found, when the server answers 404 (production)', async () => {
    const server = signedInAs(owner, apiError(404, 'Not found'));
    const first = renderApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(await within(nav).findByRole('link', { name: 'Company' })).toBeInTheDocument();
    await expect.poll(() => server.callsTo('GET /api/dev/mailbox').length).toBe(1);
    expect(within(nav).queryByRole('link', { name: 'Mailbox (dev)' })).not.toBeInTheDocument();
    first.unmount();

    signedInAs(owner, apiError(404, 'Not found'));
    renderApp('/dev/mailbox');
    expect(await screen.findByText('Page not found')).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Mailbox (dev)' })).not.toBeInTheDocument();
  });

  it('is for owners only, and estimators never ask for it', async () => {
    const server = signedInAs(estimator, json([message]));
    renderApp('/dev/mailbox');

    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    expect(within(nav).queryByRole('link', { name: 'Mailbox (dev)' })).not.toBeInTheDocument();
    expect(server.callsTo('GET /api/dev/mailbox')).toHaveLength(0);
  });
});
