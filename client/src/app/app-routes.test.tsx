import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildCompany, buildCurrentUser, buildInvite, buildMember } from '@/testing/factories';
import { apiError, json, mockApi, noContent } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const owner = buildCurrentUser({ name: 'Olive Owner', role: 'owner' });
const estimator = buildCurrentUser({ name: 'Esme Estimator', role: 'estimator' });
const crewLead = buildCurrentUser({ name: 'Cal Crewlead', role: 'crew_lead' });

function signedInAs(user: typeof owner, extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'POST /api/auth/refresh': json({ accessToken: 'restored' }),
    'GET /api/auth/me': json(user),
    ...extra,
  });
}

describe('app routes', () => {
  it('restores the session from the refresh cookie on load and shows Home', async () => {
    const server = signedInAs(owner);
    renderApp('/');

    expect(screen.getByRole('status')).toHaveTextContent(/opening pondwright/i);
    expect(await screen.findByRole('heading', { name: /Olive/ })).toBeInTheDocument();
    expect(screen.getAllByText(/Example Ponds Co/).length).toBeGreaterThan(0);
    expect(screen.getByRole('heading', { name: 'What you can do here' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Electricity near water' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Before you dig' })).toBeInTheDocument();
    expect(server.callsTo('POST /api/auth/refresh')).toHaveLength(1);
    expect(server.callsTo('GET /api/auth/me')[0]?.headers.authorization).toBe('Bearer restored');
  });

  it('shows Team and Company in the navigation only to owners', async () => {
    signedInAs(owner);
    const first = renderApp('/');
    const ownerNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(ownerNav).getByRole('link', { name: 'Home' })).toBeInTheDocument();
    expect(within(ownerNav).getByRole('link', { name: 'Team' })).toBeInTheDocument();
    expect(within(ownerNav).getByRole('link', { name: 'Company' })).toHaveAttribute(
      'href',
      '/company',
    );
    first.unmount();

    signedInAs(estimator);
    renderApp('/');
    const estimatorNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(estimatorNav).getByRole('link', { name: 'Home' })).toBeInTheDocument();
    expect(within(estimatorNav).queryByRole('link', { name: 'Team' })).not.toBeInTheDocument();
    expect(within(estimatorNav).queryByRole('link', { name: 'Company' })).not.toBeInTheDocument();
  });

  it('shows Takeoff in the navigation to owners and estimators, not to crew leads', async () => {
    signedInAs(estimator);
    const first = renderApp('/');
    const estimatorNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(estimatorNav).getByRole('link', { name: 'Takeoff' })).toHaveAttribute(
      'href',
      '/takeoff',
    );
    first.unmount();

    signedInAs(owner);
    const second = renderApp('/');
    const ownerNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(ownerNav).getByRole('link', { name: 'Takeoff' })).toBeInTheDocument();
    second.unmount();

    signedInAs(crewLead);
    renderApp('/');
    const crewNav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(crewNav).getByRole('link', { name: 'Home' })).toBeInTheDocument();
    expect(within(crewNav).queryByRole('link', { name: 'Takeoff' })).not.toBeInTheDocument();
  });

  it('opens the takeoff screen for an estimator with the default pond computed', async () => {
    signedInAs(estimator, { 'GET /api/company': json(buildCompany({ unitSystem: 'us' })) });
    renderApp('/takeoff');

    expect(await screen.findByRole('heading', { name: 'Takeoff' })).toBeInTheDocument();
    expect(await screen.findByRole('article', { name: 'Water volume' })).toHaveTextContent(
      '1,326 gal',
    );
    expect(screen.getByRole('radio', { name: 'US units' })).toBeChecked();
  });

  it('starts the takeoff in metric when the company works in metric', async () => {
    signedInAs(estimator, { 'GET /api/company': json(buildCompany({ unitSystem: 'metric' })) });
    renderApp('/takeoff');

    expect(await screen.findByRole('article', { name: 'Water volume' })).toHaveTextContent(
      '5,018 L',
    );
    expect(screen.getByRole('radio', { name: 'Metric' })).toBeChecked();
    expect(screen.getByLabelText('Max depth (m)')).toHaveValue('0.61');
  });

  it('starts the takeoff in US units when the company cannot be loaded', async () => {
    signedInAs(estimator, { 'GET /api/company': apiError(404, 'No such company') });
    renderApp('/takeoff');

    expect(await screen.findByRole('article', { name: 'Water volume' })).toHaveTextContent(
      '1,326 gal',
    );
    expect(screen.getByText(/default units could not be loaded/)).toBeInTheDocument();
  });

  it('shows a not-allowed state when a crew lead opens /takeoff', async () => {
    signedInAs(crewLead);
    renderApp('/takeoff');

    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(screen.getByText(/does not include takeoffs/)).toBeInTheDocument();
    expect(screen.queryByLabelText('Max depth (ft)')).not.toBeInTheDocument();
  });

  it('shows a not-allowed state, and loads no team data, when an estimator opens /team', async () => {
    const server = signedInAs(estimator);
    renderApp('/team');

    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
    expect(server.callsTo('GET /api/users')).toHaveLength(0);
    expect(server.callsTo('GET /api/invites')).toHaveLength(0);
  });

  it('shows a not-allowed state, and loads no company, when an estimator opens /company', async () => {
    const server = signedInAs(estimator);
    renderApp('/company');

    expect(await screen.findByText('Not available for your role')).toBeInTheDocument();
    expect(screen.getByText(/does not include company settings/)).toBeInTheDocument();
    expect(screen.queryByLabelText(/^Company name/)).not.toBeInTheDocument();
    expect(server.callsTo('GET /api/company')).toHaveLength(0);
  });

  it('lets an owner rename the company, and the header follows', async () => {
    const renamed = { ...owner, companyName: 'Lily Pad Works' };
    const server = signedInAs(owner, {
      'GET /api/auth/me': [json(owner), json(renamed)],
      'GET /api/company': [json(buildCompany()), json(buildCompany({ name: 'Lily Pad Works' }))],
      'PATCH /api/company': json(buildCompany({ name: 'Lily Pad Works' })),
    });
    const { user } = renderApp('/company');

    const name = await screen.findByLabelText(/^Company name/);
    expect(name).toHaveValue('Example Ponds Co');
    expect(screen.getByRole('radio', { name: 'US customary (ft, gal)' })).toBeChecked();
    await user.clear(name);
    await user.type(name, 'Lily Pad Works');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText(/Owner · Lily Pad Works/)).toBeInTheDocument();
    expect(server.callsTo('PATCH /api/company')[0]?.body).toEqual({
      name: 'Lily Pad Works',
      unitSystem: 'us',
    });
  });

  it('offers a retry when the company cannot be loaded on its page', async () => {
    signedInAs(owner, {
      'GET /api/company': [apiError(404, 'No such company'), json(buildCompany())],
    });
    const { user } = renderApp('/company');

    expect(await screen.findByText('Could not load the company')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByLabelText(/^Company name/)).toHaveValue('Example Ponds Co');
  });

  it('shows the team page to an owner', async () => {
    signedInAs(owner, {
      'GET /api/users': json([buildMember({ id: owner.id, name: 'Olive Owner', role: 'owner' })]),
      'GET /api/invites': json([buildInvite({ email: 'sam@example.test' })]),
    });
    renderApp('/team');

    expect(await screen.findByRole('table', { name: 'Team members' })).toBeInTheDocument();
    expect(await screen.findByText('sam@example.test')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Send invite' })).toBeInTheDocument();
  });

  it('sends a signed-out visitor to sign in, then back to the page they asked for', async () => {
    const server = mockApi({
      'POST /api/auth/refresh': apiError(401, 'No session'),
      'POST /api/auth/login': json({ accessToken: 'fresh' }),
      'GET /api/auth/me': json(owner),
      'GET /api/users': json([]),
      'GET /api/invites': json([]),
    });
    const { router, user } = renderApp('/team');

    await screen.findByRole('button', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fteam');

    await user.type(screen.getByLabelText(/^E-mail/), 'olive@example.test');
    await user.type(screen.getByLabelText(/^Password/), 'moss and stone');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/team'));
    expect(await screen.findByRole('heading', { name: 'Team' })).toBeInTheDocument();
    expect(server.callsTo('POST /api/auth/login')).toHaveLength(1);
  });

  it('ignores a `next` that points to another site', async () => {
    mockApi({
      'POST /api/auth/refresh': apiError(401, 'No session'),
      'POST /api/auth/login': json({ accessToken: 'fresh' }),
      'GET /api/auth/me': json(owner),
    });
    const { router, user } = renderApp('/sign-in?next=//elsewhere.example');

    await user.type(await screen.findByLabelText(/^E-mail/), 'olive@example.test');
    await user.type(screen.getByLabelText(/^Password/), 'moss and stone');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });

  it('redirects to sign in with `next` when the session expires mid-visit', async () => {
    const server = mockApi({
      'POST /api/auth/refresh': [json({ accessToken: 'first' }), apiError(401, 'Session ended')],
      'GET /api/auth/me': json(owner),
      'GET /api/users': apiError(401, 'Token expired'),
      'GET /api/invites': apiError(401, 'Token expired'),
    });
    const { router } = renderApp('/team?tab=members');

    await screen.findByRole('button', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe('/team?tab=members');
    expect(await screen.findByText(/your session has ended/i)).toBeInTheDocument();
    expect(server.callsTo('POST /api/auth/refresh')).toHaveLength(2);
  });

  it('signs out through the user menu', async () => {
    const server = signedInAs(owner, { 'POST /api/auth/logout': noContent() });
    const { router, user } = renderApp('/');

    await user.click(await screen.findByRole('button', { name: 'Account menu for Olive Owner' }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));

    await screen.findByRole('button', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(server.callsTo('POST /api/auth/logout')).toHaveLength(1);
  });

  it('shows a not-found page for unknown addresses', async () => {
    signedInAs(owner);
    renderApp('/no-such-page');

    expect(await screen.findByText('Page not found')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to Home' })).toHaveAttribute('href', '/');
  });

  it('offers a retry when the server cannot be reached on load', async () => {
    mockApi({
      'POST /api/auth/refresh': () => Promise.reject(new TypeError('Failed to fetch')),
    });
    renderApp('/');

    expect(await screen.findByText('Pondwright could not start')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
